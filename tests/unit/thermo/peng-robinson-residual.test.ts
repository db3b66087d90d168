import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GAS_CONSTANT_J_PER_MOL_K as R, presetGas } from '@/lib/thermo';
import {
  compilePengRobinson,
  EosInputError,
  idealGasFromGasModel,
  INTERACTION_ROWS,
  interactionParameter,
  interactionParameterSource,
  kappaOf,
  lnFugacityCoefficients,
  mixtureAttraction,
  newFugacityState,
} from '@/lib/thermo/eos/peng-robinson';
import { newResidualDerivatives, type ResidualDerivatives } from '@/lib/thermo/eos/types';

const GAS = { CH4: 0.82, C2H6: 0.06, C3H8: 0.03, CO2: 0.04, N2: 0.03, H2O: 0.02 };
const eos = compilePengRobinson(GAS);

function at(T: number, rho: number): ResidualDerivatives {
  const d = newResidualDerivatives();
  eos.residual.evaluate(T, rho, d);
  return d;
}

describe('residual Helmholtz derivatives [calc: central differences of A(T, rho) itself]', () => {
  it('rho dA/drho, rho² d²A/drho², T dA/dT, T² d²A/dT², rho T d²A/drho dT match numeric derivatives', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 150, max: 2500, noNaN: true }),
        fc.double({ min: 0.001, max: 0.9, noNaN: true }),
        (T, fraction) => {
          const rho = fraction * eos.residual.maxDensityMolPerM3;
          const d = at(T, rho);
          const hr = 1e-5 * rho;
          const hT = 1e-5 * T;
          const aD = (rho * (at(T, rho + hr).a - at(T, rho - hr).a)) / (2 * hr);
          const aDD = (rho * rho * (at(T, rho + hr).a - 2 * d.a + at(T, rho - hr).a)) / (hr * hr);
          const aT = (T * (at(T + hT, rho).a - at(T - hT, rho).a)) / (2 * hT);
          const aTT = (T * T * (at(T + hT, rho).a - 2 * d.a + at(T - hT, rho).a)) / (hT * hT);
          const aDT = (T * (at(T + hT, rho).aD - at(T - hT, rho).aD)) / (2 * hT);
          const close = (analytic: number, numeric: number, tol: number) =>
            expect(Math.abs(analytic - numeric)).toBeLessThan(tol * (1 + Math.abs(analytic)));
          close(d.aD, aD, 1e-7);
          close(d.aDD, aDD, 1e-4);
          close(d.aT, aT, 1e-7);
          close(d.aTT, aTT, 1e-4);
          close(d.aDT, aDT, 1e-7);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('pressure from aD equals the Peng-Robinson pressure equation', () => {
    const T = 280;
    const rho = 3000;
    const att = eos.attraction(T, { a: 0, dadT: 0, d2adT2: 0 });
    const v = 1 / rho;
    const b = eos.covolume;
    const pEquation = (R * T) / (v - b) - att.a / (v * v + 2 * b * v - b * b);
    expect((rho * R * T * (1 + at(T, rho).aD)) / pEquation).toBeCloseTo(1, 12);
  });

  it('a(T) from the sqrt(T) quadratic equals the term-by-term sum, with derivatives, up to and past its limit', () => {
    const general = { a: 0, dadT: 0, d2adT2: 0 };
    const fast = { a: 0, dadT: 0, d2adT2: 0 };
    for (const T of [150, 250, 400, 800, 1200, 1380]) {
      mixtureAttraction(eos.components, eos.moleFractions, T, general);
      eos.attraction(T, fast);
      expect(fast.a / general.a).toBeCloseTo(1, 12);
      expect(fast.dadT / general.dadT).toBeCloseTo(1, 10);
      expect(fast.d2adT2 / general.d2adT2).toBeCloseTo(1, 10);
    }
  });

  it('densityGuess returns the cubic root of the requested phase; 1/b bounds every root', () => {
    const butaneLike = compilePengRobinson({ C3H8: 1 });
    const T = 300;
    const p = 5e5; // below propane's 0.99 MPa vapour pressure at 300 K: both roots exist
    const r = butaneLike.cubicRoots(T, p);
    expect(r.count).toBe(3);
    expect(butaneLike.residual.densityGuess(T, p, 'vapour')).toBeCloseTo(p / (r.zVapour * R * T), 8);
    expect(butaneLike.residual.densityGuess(T, p, 'liquid')).toBeCloseTo(p / (r.zLiquid * R * T), 8);
    expect(butaneLike.residual.densityGuess(T, p, 'liquid')).toBeLessThan(butaneLike.residual.maxDensityMolPerM3);
  });
});

describe('fugacity coefficients', () => {
  // ln φ_i = ∂(n A_r)/∂n_i at T, V - ln Z [pub: Michelsen & Mollerup, Thermodynamic Models (2007), ch. 2].
  it('equal the numeric composition derivative of n A_r at fixed T and V', () => {
    const T = 260;
    const p = 4e6;
    const ids = eos.componentIds;
    const out = new Float64Array(ids.length);
    const z = eos.lnFugacityCoefficients(T, p, 'vapour', out);
    const V = (z * R * T) / p; // for 1 mol
    const nAr = (n: number[]) => {
      const total = n.reduce((s, v) => s + v, 0);
      const fractions = Object.fromEntries(ids.map((id, i) => [id, n[i]! / total]));
      const d = newResidualDerivatives();
      compilePengRobinson(fractions).residual.evaluate(T, total / V, d);
      return total * d.a;
    };
    const base = Array.from(eos.moleFractions);
    ids.forEach((_, i) => {
      const h = 1e-6;
      const up = base.slice();
      const down = base.slice();
      up[i]! += h;
      down[i]! -= h;
      expect(out[i]).toBeCloseTo((nAr(up) - nAr(down)) / (2 * h) - Math.log(z), 6);
    });
  });

  it('∂ln φ/∂ln p and ∂ln φ/∂T match finite differences, on both roots', () => {
    const sys = eos.components;
    const x = eos.moleFractions;
    const n = sys.n;
    const st = newFugacityState();
    for (const [T, p, phase] of [
      [250, 5e6, 'vapour'],
      [200, 3e6, 'liquid'],
    ] as const) {
      const dP = new Float64Array(n);
      const dT = new Float64Array(n);
      lnFugacityCoefficients(sys, T, p, x, phase, new Float64Array(n), st, dP, dT);
      const plus = new Float64Array(n);
      const minus = new Float64Array(n);
      lnFugacityCoefficients(sys, T, p * (1 + 1e-6), x, phase, plus, st);
      lnFugacityCoefficients(sys, T, p * (1 - 1e-6), x, phase, minus, st);
      for (let i = 0; i < n; i++) expect(dP[i]).toBeCloseTo((plus[i]! - minus[i]!) / 2e-6, 5);
      lnFugacityCoefficients(sys, T + 1e-4, p, x, phase, plus, st);
      lnFugacityCoefficients(sys, T - 1e-4, p, x, phase, minus, st);
      for (let i = 0; i < n; i++) expect(dT[i]).toBeCloseTo((plus[i]! - minus[i]!) / 2e-4, 6);
    }
  });
});

describe('parameters', () => {
  it('κ: the 1976 quadratic up to ω = 0.49, the 1978 cubic above, meeting within 0.5 %', () => {
    expect(kappaOf(0.011)).toBeCloseTo(0.37464 + 1.54226 * 0.011 - 0.26992 * 0.011 ** 2, 12);
    expect(kappaOf(0.6)).toBeCloseTo(0.379642 + 1.48503 * 0.6 - 0.164423 * 0.36 + 0.016666 * 0.216, 12);
    expect(Math.abs(kappaOf(0.4900001) / kappaOf(0.49) - 1)).toBeLessThan(0.005);
  });

  it('k_ij is symmetric, zero on the diagonal and for unlisted pairs; natural-gas pairs from DECHEMA', () => {
    expect(interactionParameter('CH4', 'CO2')).toBe(interactionParameter('CO2', 'CH4'));
    expect(interactionParameter('CH4', 'CO2')).toBe(0.0978); // [pub: DECHEMA Vol. VI p. 399]
    expect(interactionParameter('N2', 'CH4')).toBe(0.0289); // [pub: DECHEMA Vol. VI p. 285]
    expect(interactionParameter('N2', 'CO2')).toBe(-0.0122); // [pub: DECHEMA Vol. VI p. 312]
    expect(interactionParameterSource('CH4', 'C3H8')).toBe('DECHEMA p. 413');
    expect(interactionParameter('H2O', 'CH4')).toBeGreaterThan(0.4); // water-hydrocarbon: large
    expect(interactionParameter('CH4', 'CH4')).toBe(0);
    expect(interactionParameter('He', 'Ar')).toBe(0);
    const seen = new Set<string>();
    for (const [a, b, k] of INTERACTION_ROWS) {
      const key = [a, b].sort().join('|');
      expect(seen.has(key), `duplicate pair ${key}`).toBe(false);
      seen.add(key);
      expect(Math.abs(k)).toBeLessThan(0.6);
    }
  });

  it('a_i(T) and b_i follow the published definitions', () => {
    const co2 = compilePengRobinson({ CO2: 1 });
    const tc = 304.13;
    const pc = 73.77e5;
    const kappa = 0.37464 + 1.54226 * 0.224 - 0.26992 * 0.224 ** 2;
    const alpha = (1 + kappa * (1 - Math.sqrt(300 / tc))) ** 2;
    // The code uses the unrounded Ωa, Ωb; the published 5-decimal values differ by less than 1e-4 relative.
    const a = co2.componentAttraction(300, new Float64Array(1))[0]!;
    expect(Math.abs(a / ((0.45724 * (R * tc) ** 2 * alpha) / pc) - 1)).toBeLessThan(1e-4);
    expect(Math.abs(co2.componentCovolume[0]! / ((0.0778 * R * tc) / pc) - 1)).toBeLessThan(1e-4);
  });

  it('the ideal part adapts the engine GasModel to molar units', () => {
    const ideal = idealGasFromGasModel(presetGas('nitrogen')!);
    expect(ideal.cp0(300)).toBeCloseTo(29.1, 1); // N2 cp0 at 300 K ≈ 29.12 J/(mol K) [pub: NIST-JANAF]
    // H(400) - H(298.15) = 2.971 kJ/mol, H(300) - H(298.15) = 0.054 kJ/mol [pub: NIST-JANAF, nitrogen N2 table]
    expect(Math.abs(ideal.h0(400) - ideal.h0(300) - 2917)).toBeLessThan(5);
  });
});

describe('input checks', () => {
  it.each([
    [{ CH4: 0.5 }, 'components'],
    [{ CH4: 1.2 }, 'components.CH4'],
    [{ CH4: Number.NaN }, 'components.CH4'],
    [{ Kr: 1 }, 'components.Kr'],
    [{}, 'components'],
  ])('%j is refused with the field named', (fractions, path) => {
    expect(() => compilePengRobinson(fractions)).toThrow(EosInputError);
    try {
      compilePengRobinson(fractions);
    } catch (e) {
      expect((e as EosInputError).path).toBe(path);
    }
  });

  it('a species with critical constants but no ideal-gas data needs options.ideal', () => {
    // Benzene (Tc 562.0 K, pc 48.9 bar, omega 0.210 [mem: Poling et al., App. A]) has no NASA set here.
    const constants = { C6H6: { tcK: 562.0, pcBar: 48.9, omega: 0.21 } };
    expect(() => compilePengRobinson({ C6H6: 1 }, { criticalConstants: constants })).toThrow(/ideal/);
    const eosButane = compilePengRobinson(
      { C6H6: 1 },
      {
        criticalConstants: constants,
        ideal: { cp0: () => 98, h0: (T) => 98 * T, s0: () => 0 },
        molarMassKgPerKmol: 78.11,
      },
    );
    expect(eosButane.cubicRoots(300, 1e5).zVapour).toBeLessThan(1);
  });
});
