import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GAS_CONSTANT_J_PER_MOL_K as R } from '@/lib/thermo';
import {
  compilePengRobinson,
  CRITICAL_Z,
  OMEGA_A,
  OMEGA_B,
  type PengRobinsonEquation,
} from '@/lib/thermo/eos/peng-robinson';
import { newResidualDerivatives } from '@/lib/thermo/eos/types';

/**
 * Real-gas properties from an EquationOfState at (T, p) on the vapour root, with the standard Helmholtz relations
 * [pub: Span, Multiparameter Equations of State (2000), table 3.1] — a test helper until the shared property
 * layer lands. Returns Z, cp in J/(kg K) and h - h_ideal in kJ/kg.
 */
function properties(eos: PengRobinsonEquation, T: number, p: number): { z: number; cp: number; hr: number } {
  const z = eos.cubicRoots(T, p).zVapour;
  const d = newResidualDerivatives();
  eos.residual.evaluate(T, p / (z * R * T), d);
  const kgPerMol = eos.molarMassKgPerKmol / 1000;
  const cv = eos.ideal.cp0(T) - R - R * (d.aTT + 2 * d.aT);
  const cp = cv + (R * (1 + d.aD + d.aDT) ** 2) / (1 + 2 * d.aD + d.aDD);
  return { z, cp: cp / kgPerMol, hr: (R * T * (d.aD - d.aT)) / kgPerMol / 1000 };
}

/*
 * Reference values [calc: Setzmann-Wagner methane, Span et al. nitrogen, Span-Wagner CO2, Leachman hydrogen,
 * Bücker-Wagner ethane, Lemmon propane, as implemented in CoolProp 8.0]. Tolerances are what Peng-Robinson
 * achieves (printed beside each case: PR's own value from this code), i.e. they document the equation's known
 * errors: Z a few per cent low for light gases (PR's critical Z is 0.307, real fluids 0.27-0.29), cp within 7 %,
 * h - h_ideal within the absolute band given.
 */
const CASES = [
  // id, T K, p Pa, Z, cp J/(kg K), h-h0 kJ/kg, Z tol, cp tol (rel), h tol (kJ/kg)  // PR: Z, cp, h-h0
  ['CH4', 300, 5e6, 0.91955, 2570.3, -49.63, 0.025, 0.02, 7.5], // 0.9018, 2582, -56.3
  ['CH4', 250, 10e6, 0.6865, 4168.5, -161.64, 0.03, 0.06, 8], // 0.6693, 3974, -168.1
  ['N2', 300, 10e6, 1.00521, 1194.9, -19.48, 0.02, 0.02, 3.5], // 0.9886, 1207, -22.6
  ['CO2', 320, 5e6, 0.77139, 1378.6, -48.6, 0.03, 0.065, 2.5], // 0.7541, 1305, -50.2
  ['C2H6', 300, 3e6, 0.7259, 2657.5, -73.94, 0.03, 0.075, 1.5], // 0.7066, 2480, -73.5
  ['C3H8', 350, 2e6, 0.76928, 2395.0, -50.12, 0.025, 0.065, 2], // 0.7550, 2262, -48.8
] as const;

describe('Peng-Robinson against reference equations of state, pure fluids', () => {
  it.each(CASES)('%s at %d K, %d Pa: Z, cp and h - h_ideal', (id, T, p, zRef, cpRef, hRef, zTol, cpTol, hTol) => {
    const r = properties(compilePengRobinson({ [id]: 1 }), T, p);
    expect(Math.abs(r.z / zRef - 1)).toBeLessThan(zTol);
    expect(Math.abs(r.cp / cpRef - 1)).toBeLessThan(cpTol);
    expect(Math.abs(r.hr - hRef)).toBeLessThan(hTol);
    // Peng-Robinson is known to under-predict Z of these gases; a sign flip would mean a wrong root or constant.
    expect(r.z).toBeLessThan(zRef);
  });

  // H2 300 K, 20 MPa: reference Z 1.12250, cp 14712.4 J/(kg K), h - h0 = +103.22 kJ/kg [calc: Leachman, CoolProp 8.0].
  // PR gets Z 1.081 (-3.7 %), cp 14726 (+0.1 %) but h - h0 only +15 kJ/kg: its attraction term, fitted to
  // vapour pressures, is far too strong for hydrogen at nine times Tc. Tested for direction and documented size.
  it('hydrogen at 300 K, 20 MPa: Z above 1 and h - h_ideal positive, as the reference; error sizes as documented', () => {
    const r = properties(compilePengRobinson({ H2: 1 }), 300, 20e6);
    expect(r.z).toBeGreaterThan(1);
    expect(Math.abs(r.z / 1.1225 - 1)).toBeLessThan(0.045);
    expect(Math.abs(r.cp / 14712.4 - 1)).toBeLessThan(0.01);
    expect(r.hr).toBeGreaterThan(0);
    expect(r.hr).toBeLessThan(103.22);
    expect(r.hr).toBeGreaterThan(10);
  });
});

describe('critical point [pub: Peng & Robinson 1976, eqs. 9-11]', () => {
  it('the exact Ωa, Ωb round to the published 0.45724 and 0.07780, with Zc = 0.3074', () => {
    expect(OMEGA_A).toBeCloseTo(0.45724, 5);
    expect(OMEGA_B).toBeCloseTo(0.0778, 5);
    expect(CRITICAL_Z).toBeCloseTo(0.3074, 4);
  });

  it.each(['CH4', 'N2', 'CO2', 'H2O', 'NH3', 'C3H8'])('%s: p = pc, dp/dv = 0, d²p/dv² = 0 at (Tc, vc)', (id) => {
    const eos = compilePengRobinson({ [id]: 1 });
    const sys = eos.components;
    const tc = sys.tcK[0]!;
    const pc = sys.pcPa[0]!;
    const vc = (CRITICAL_Z * R * tc) / pc;
    const pressure = (v: number) => {
      const d = newResidualDerivatives();
      eos.residual.evaluate(tc, 1 / v, d);
      return ((R * tc) / v) * (1 + d.aD);
    };
    const h = vc * 1e-3;
    expect(pressure(vc) / pc).toBeCloseTo(1, 10);
    expect(((pressure(vc + h) - pressure(vc - h)) / (2 * h)) * (vc / pc)).toBeCloseTo(0, 5);
    expect(((pressure(vc + h) - 2 * pressure(vc) + pressure(vc - h)) / (h * h)) * ((vc * vc) / pc)).toBeCloseTo(0, 4);
    // The cubic has its triple root there.
    const roots = eos.cubicRoots(tc, pc);
    expect(roots.zVapour).toBeCloseTo(CRITICAL_Z, 4);
    expect(roots.zLiquid).toBeCloseTo(CRITICAL_Z, 4);
  });
});

describe('ideal-gas limit', () => {
  it('Z -> 1 and every density derivative -> 0 as p -> 0, for any species and temperature', () => {
    const ids = ['CH4', 'N2', 'CO2', 'H2O', 'NH3', 'C2H6', 'C3H8', 'H2', 'He', 'Ar', 'O2', 'CO'];
    fc.assert(
      fc.property(fc.constantFrom(...ids), fc.double({ min: 200, max: 1500, noNaN: true }), (id, T) => {
        const eos = compilePengRobinson({ [id]: 1 });
        const z = eos.cubicRoots(T, 1).zVapour; // 1 Pa
        expect(Math.abs(z - 1)).toBeLessThan(1e-6);
        const d = newResidualDerivatives();
        eos.residual.evaluate(T, 1e-6, d);
        expect(Math.abs(d.aD)).toBeLessThan(1e-8);
      }),
      { numRuns: 200 },
    );
  });
});
