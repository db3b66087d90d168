import { describe, expect, it } from 'vitest';
import {
  GAS_CONSTANT_J_PER_MOL_K,
  SPECIES,
  SPECIES_IDS,
  compileGas,
  cpMolar,
  enthalpyMolar,
  standardEntropyMolar,
  type SpeciesId,
} from '@/lib/thermo';

const pure = (id: SpeciesId) => compileGas(`test:${id}`, id, { [id]: 1 });

// Direct evaluation of one range's raw coefficients, independent of the compiled mass-basis polynomial.
function rawCp(a: readonly number[], t: number): number {
  return GAS_CONSTANT_J_PER_MOL_K * (a[0]! + a[1]! * t + a[2]! * t ** 2 + a[3]! * t ** 3 + a[4]! * t ** 4);
}
function rawH(a: readonly number[], t: number): number {
  return (
    GAS_CONSTANT_J_PER_MOL_K *
    t *
    (a[0]! + (a[1]! * t) / 2 + (a[2]! * t ** 2) / 3 + (a[3]! * t ** 3) / 4 + (a[4]! * t ** 4) / 5 + a[5]! / t)
  );
}
function rawS(a: readonly number[], t: number): number {
  return (
    GAS_CONSTANT_J_PER_MOL_K *
    (a[0]! * Math.log(t) + a[1]! * t + (a[2]! * t ** 2) / 2 + (a[3]! * t ** 3) / 3 + (a[4]! * t ** 4) / 4 + a[6]!)
  );
}

describe('NASA 7-coefficient transcription', () => {
  it('reproduces cp(N2, 300 K) = 29.125 J/(mol K) [pub: NIST-JANAF, Chase 1998]', () => {
    expect(cpMolar(pure('N2'), 300)).toBeCloseTo(29.125, 2);
  });

  // NIST-JANAF Thermochemical Tables (Chase 1998) [mem; the N2 rows agree to 0.02 % with the NIST Chemistry WebBook's
  // Shomate fit of those tables [pub]], tolerance 0.3 %.
  const janaf: [SpeciesId, number, number][] = [
    ['N2', 300, 29.125],
    ['N2', 500, 29.58],
    ['N2', 1000, 32.697],
    ['O2', 300, 29.385],
    ['O2', 500, 31.091],
    ['O2', 1000, 34.87],
    ['CO2', 300, 37.221],
    ['CO2', 500, 44.627],
    ['CO2', 1000, 54.308],
    ['H2O', 300, 33.596],
    ['H2O', 500, 35.226],
    ['H2O', 1000, 41.268],
  ];
  it.each(janaf)('cp(%s, %i K) within 0.3 %% of NIST-JANAF %f J/(mol K)', (id, t, expected) => {
    expect(Math.abs(cpMolar(pure(id), t) / expected - 1)).toBeLessThan(0.003);
  });

  it.each(['Ar', 'He'] as const)(
    '%s has cp = 5/2 R = 20.786 J/(mol K) at every temperature [kinetic theory; NASA data]',
    (id) => {
      for (const t of [200, 300, 999, 1000, 3000, 6000]) {
        expect(cpMolar(pure(id), t)).toBeCloseTo(2.5 * GAS_CONSTANT_J_PER_MOL_K, 9);
      }
    },
  );

  it.each([...SPECIES_IDS])(
    '%s: cp, h and s° are continuous at Tmid = 1000 K [NASA 7-term fits are constrained so]',
    (id) => {
      const { low, high } = SPECIES[id];
      expect(Math.abs(rawCp(low, 1000) - rawCp(high, 1000)) / rawCp(low, 1000)).toBeLessThan(1e-6);
      expect(Math.abs(rawH(low, 1000) - rawH(high, 1000))).toBeLessThan(0.05); // J/mol, on |h| up to 4e5
      expect(Math.abs(rawS(low, 1000) - rawS(high, 1000))).toBeLessThan(1e-4); // J/(mol K)
    },
  );

  it.each([...SPECIES_IDS])('%s: the compiled polynomial equals the raw coefficients on both ranges', (id) => {
    const gas = pure(id);
    for (const t of [250, 700, 1500, 4000]) {
      const a = t < 1000 ? SPECIES[id].low : SPECIES[id].high;
      expect(cpMolar(gas, t)).toBeCloseTo(rawCp(a, t), 8);
      expect(enthalpyMolar(gas, t)).toBeCloseTo(rawH(a, t), 5);
      expect(standardEntropyMolar(gas, t)).toBeCloseTo(rawS(a, t), 8);
    }
  });

  // Standard enthalpies of formation at 298.15 K [mem: NIST-JANAF / CODATA key values]: a check on a6.
  it.each([
    ['H2O', -241826],
    ['CO2', -393510],
    ['CH4', -74873],
    ['CO', -110527],
    ['N2', 0],
    ['NH3', -45898],
  ] as const)('%s: h(298.15 K) = enthalpy of formation %d J/mol within 300 J/mol', (id, hf) => {
    expect(Math.abs(enthalpyMolar(pure(id), 298.15) - hf)).toBeLessThan(300);
  });

  // CIAAW 2021 standard atomic weights (H 1.008, C 12.011, N 14.007, O 15.999, S 32.06) [pub].
  it.each([
    ['N2', 28.014],
    ['O2', 31.998],
    ['CO2', 44.009],
    ['H2O', 18.015],
    ['CH4', 16.043],
    ['H2', 2.016],
    ['C3H8', 44.097],
    ['NH3', 17.031],
    ['Ar', 39.948],
    ['He', 4.002602],
    ['n-C4H10', 58.124],
    ['i-C5H12', 72.151],
    ['n-C10H22', 142.286],
    ['H2S', 34.076],
  ] as const)('molar mass of %s is %f kg/kmol', (id, m) => {
    expect(SPECIES[id].molarMassKgPerKmol).toBeCloseTo(m, 6);
  });
});
