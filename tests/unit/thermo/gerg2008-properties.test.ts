import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MixtureError } from '@/lib/thermo';
import { GERG_COMPONENT_IDS, compileGerg2008, type GergComponentId } from '@/lib/thermo/eos/gerg2008';
import { newResidualDerivatives, type ResidualDerivatives } from '@/lib/thermo/eos/types';

/*
 * Property tests: the analytic derivatives of the residual Helmholtz energy against central differences,
 * the ideal-gas limit, and the consistency of the ideal part, for random compositions and states. These
 * catch derivative slips that a single verification point cannot.
 */

const composition = fc
  .uniqueArray(fc.constantFrom(...GERG_COMPONENT_IDS), { minLength: 1, maxLength: 8 })
  .chain((ids) =>
    fc
      .array(fc.double({ min: 0.01, max: 1, noNaN: true }), { minLength: ids.length, maxLength: ids.length })
      .map((weights) => {
        const total = weights.reduce((a, b) => a + b, 0);
        return Object.fromEntries(ids.map((id, i) => [id, weights[i]! / total])) as Record<GergComponentId, number>;
      }),
  );

function evaluateAt(eos: ReturnType<typeof compileGerg2008>, t: number, rho: number): ResidualDerivatives {
  const out = newResidualDerivatives();
  eos.residual.evaluate(t, rho, out);
  return out;
}

const close = (actual: number, expected: number, scale: number) =>
  Math.abs(actual - expected) <= 1e-6 * (Math.abs(expected) + scale);

describe('GERG-2008 residual derivatives', () => {
  it('agree with central differences in ln rho and ln T', () => {
    fc.assert(
      fc.property(
        composition,
        fc.double({ min: 150, max: 700, noNaN: true }),
        fc.double({ min: 0.002, max: 0.6, noNaN: true }),
        (x, t, fraction) => {
          const eos = compileGerg2008(x);
          const rho = fraction * eos.residual.maxDensityMolPerM3;
          const h = 1e-5;
          const r = evaluateAt(eos, t, rho);
          const rUp = evaluateAt(eos, t, rho * Math.exp(h));
          const rDown = evaluateAt(eos, t, rho * Math.exp(-h));
          const tUp = evaluateAt(eos, t * Math.exp(h), rho);
          const tDown = evaluateAt(eos, t * Math.exp(-h), rho);
          const scale = 1e-3 + Math.abs(r.a) + Math.abs(r.aD) + Math.abs(r.aDD) + Math.abs(r.aT) + Math.abs(r.aTT);
          // rho dA/drho = dA/dln(rho); rho^2 A_rho,rho = d(aD)/dln(rho) - aD; likewise in T.
          expect(close(r.aD, (rUp.a - rDown.a) / (2 * h), scale)).toBe(true);
          expect(close(r.aDD, (rUp.aD - rDown.aD) / (2 * h) - r.aD, scale)).toBe(true);
          expect(close(r.aT, (tUp.a - tDown.a) / (2 * h), scale)).toBe(true);
          expect(close(r.aTT, (tUp.aT - tDown.aT) / (2 * h) - r.aT, scale)).toBe(true);
          expect(close(r.aDT, (tUp.aD - tDown.aD) / (2 * h), scale)).toBe(true);
          expect(close(r.aDT, (rUp.aT - rDown.aT) / (2 * h), scale)).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('vanish linearly as rho -> 0 (Z -> 1, second-virial limit)', () => {
    fc.assert(
      fc.property(composition, fc.double({ min: 100, max: 1000, noNaN: true }), (x, t) => {
        const eos = compileGerg2008(x);
        const [rho1, rho2] = [1e-3, 1e-6];
        const low = evaluateAt(eos, t, rho1);
        const lower = evaluateAt(eos, t, rho2);
        const keys = Object.keys(low) as (keyof ResidualDerivatives)[];
        // Each derivative divided by rho tends to a limit (B, T dB/dT, ... or 0 for aDD): the change
        // between the two densities is the O(rho) remainder, tiny against the largest limit.
        const scale = Math.max(...keys.map((key) => Math.abs(low[key]) / rho1)) + 1e-12;
        for (const key of keys) {
          expect(Math.abs(lower[key] / rho2 - low[key] / rho1)).toBeLessThan(1e-2 * scale);
        }
        // a/rho and rho dA/drho / rho both tend to the second virial coefficient; Z = 1 + aD -> 1.
        expect(Math.abs(lower.a / rho2 - lower.aD / rho2)).toBeLessThan(1e-2 * scale);
        expect(Math.abs(lower.aD)).toBeLessThan(1e-6);
      }),
      { numRuns: 200 },
    );
  });
});

describe('GERG-2008 ideal part', () => {
  it('has dh0/dT = cp0 and T ds0/dT = cp0', () => {
    fc.assert(
      fc.property(composition, fc.double({ min: 60, max: 1000, noNaN: true }), (x, t) => {
        const { ideal } = compileGerg2008(x);
        const h = 1e-3 * t;
        const dh = (ideal.h0(t + h) - ideal.h0(t - h)) / (2 * h);
        const ds = (t * (ideal.s0(t + h) - ideal.s0(t - h))) / (2 * h);
        expect(Math.abs(dh / ideal.cp0(t) - 1)).toBeLessThan(1e-6);
        expect(Math.abs(ds / ideal.cp0(t) - 1)).toBeLessThan(1e-6);
      }),
      { numRuns: 200 },
    );
  });

  it('puts h0 = 0 and s0(101.325 kPa) = 0 at 298.15 K for every component (the reference state)', () => {
    for (const id of GERG_COMPONENT_IDS) {
      const { ideal, gasConstantJPerMolK } = compileGerg2008({ [id]: 1 });
      expect(Math.abs(ideal.h0(298.15))).toBeLessThan(1e-3);
      // s0 is at 100 kPa: + R ln(101.325/100) relative to the 101.325 kPa reference.
      expect(Math.abs(ideal.s0(298.15) - gasConstantJPerMolK * Math.log(1.01325))).toBeLessThan(1e-6);
    }
  });
});

describe('GERG-2008 composition input', () => {
  it('names the field and the reason for bad mole fractions', () => {
    const fail = (x: Record<string, number>) => {
      try {
        compileGerg2008(x);
      } catch (error) {
        return error as MixtureError;
      }
      throw new Error('expected a MixtureError');
    };
    expect(fail({ CH4: 0.5, NH3: 0.5 })).toMatchObject({ path: 'NH3', message: expect.stringMatching(/no component/) });
    expect(fail({ CH4: 1.2, N2: -0.2 }).path).toBe('CH4');
    expect(fail({ CH4: 0.9, N2: 0.05 }).message).toMatch(/sum to 0\.95/);
    expect(fail({ CH4: 0 }).message).toMatch(/at least one/);
    expect(fail({ CH4: Number.NaN }).path).toBe('CH4');
  });

  it('normalises fractions that sum to 1 within 1e-4 and drops zero ones', () => {
    const a = compileGerg2008({ CH4: 0.90005, N2: 0.1, CO2: 0 });
    const b = compileGerg2008({ CH4: 0.90005 / 1.00005, N2: 0.1 / 1.00005 });
    expect(evaluateAt(a, 300, 5000)).toEqual(evaluateAt(b, 300, 5000));
  });

  it('rejects a non-physical state when asked for a starting density', () => {
    const eos = compileGerg2008({ CH4: 1 });
    expect(() => eos.residual.densityGuess(-5, 1e5, 'vapour')).toThrow(/temperature/);
    expect(() => eos.residual.densityGuess(300, 0, 'vapour')).toThrow(/pressure/);
  });
});
