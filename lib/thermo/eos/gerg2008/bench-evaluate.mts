/*
 * Speed of the compiled GERG-2008 residual on one core: `npx tsx lib/thermo/eos/gerg2008/bench-evaluate.mts`.
 * Reports microseconds per evaluate() for a 5-component natural gas and the 21-component check mixture,
 * with the temperature changing on every call
 * (best of 5 rounds of process CPU time) (every tau^t recomputed) and at fixed temperature (as in a
 * density iteration), plus compile time and a full density solve. A measurement, not a test.
 */
import { newResidualDerivatives } from '../types';
import { compileGerg2008, type GergMoleFractions } from './compile';
import { densityAt } from './verify-properties';

const MIXTURES: [string, GergMoleFractions][] = [
  ['5-component natural gas', { CH4: 0.9, C2H6: 0.05, C3H8: 0.02, N2: 0.02, CO2: 0.01 }],
  [
    '21-component check mixture',
    {
      CH4: 0.77824,
      N2: 0.02,
      CO2: 0.06,
      C2H6: 0.08,
      C3H8: 0.03,
      'i-C4H10': 0.0015,
      'n-C4H10': 0.003,
      'i-C5H12': 0.0005,
      'n-C5H12': 0.00165,
      'n-C6H14': 0.00215,
      'n-C7H16': 0.00088,
      'n-C8H18': 0.00024,
      'n-C9H20': 0.00015,
      'n-C10H22': 0.00009,
      H2: 0.004,
      O2: 0.005,
      CO: 0.002,
      H2O: 0.0001,
      H2S: 0.0025,
      He: 0.007,
      Ar: 0.001,
    },
  ],
];

// CPU time of this process (user + system), so that other work on a shared machine does not count.
function cpuMicroseconds(): number {
  const { user, system } = process.cpuUsage();
  return user + system;
}

function timePerCall(label: string, calls: number, body: (i: number) => void): void {
  for (let i = 0; i < calls; i++) body(i); // warm-up: let the JIT settle
  let best = Infinity;
  for (let round = 0; round < 5; round++) {
    const start = cpuMicroseconds();
    for (let i = 0; i < calls; i++) body(i);
    best = Math.min(best, (cpuMicroseconds() - start) / calls);
  }
  process.stdout.write(`  ${label.padEnd(44)} ${best.toFixed(3)} us\n`);
}

let sink = 0;
for (const [name, x] of MIXTURES) {
  process.stdout.write(`${name}\n`);
  const eos = compileGerg2008(x);
  const out = newResidualDerivatives();
  const temperatures = Float64Array.from({ length: 1024 }, (_, i) => 250 + (i * 250) / 1024);
  const densities = Float64Array.from({ length: 1024 }, (_, i) => 50 + i * 10);
  timePerCall('evaluate, new T every call', 200_000, (i) => {
    eos.residual.evaluate(temperatures[i & 1023]!, densities[(i * 7) & 1023]!, out);
    sink += out.aDD;
  });
  timePerCall('evaluate, same T (density iteration)', 200_000, (i) => {
    eos.residual.evaluate(320, densities[i & 1023]!, out);
    sink += out.aDD;
  });
  timePerCall('compileGerg2008', 2_000, () => {
    sink += compileGerg2008(x).molarMassKgPerKmol;
  });
  timePerCall('density from (T, p), vapour', 20_000, (i) => {
    sink += densityAt(eos, temperatures[i & 1023]!, 1e6 + (i & 1023) * 5e3);
  });
}
process.stdout.write(`(checksum ${sink.toExponential(3)})\n`);
