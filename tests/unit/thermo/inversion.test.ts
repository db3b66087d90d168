import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  GAS_PRESETS,
  ThermoRangeError,
  cpMass,
  enthalpyMass,
  presetGas,
  standardEntropyMass,
  temperatureFromEnthalpy,
  temperatureFromEntropy,
} from '@/lib/thermo';

const ids = GAS_PRESETS.filter((p) => p.moleFractions).map((p) => p.id);
const gasArb = fc.constantFrom(...ids);
const tArb = fc.double({ min: 200, max: 6000, noNaN: true });

describe('Newton inversions of h(T) and s°(T)', () => {
  it('h inversion round-trips to 1e-6 K from any starting guess', () => {
    fc.assert(
      fc.property(gasArb, tArb, fc.double({ min: -1e4, max: 1e4, noNaN: true }), (id, t, guess) => {
        const gas = presetGas(id)!;
        expect(Math.abs(temperatureFromEnthalpy(gas, enthalpyMass(gas, t), guess) - t)).toBeLessThan(1e-6);
      }),
    );
  });

  it('s° inversion round-trips to 1e-6 K from any starting guess', () => {
    fc.assert(
      fc.property(gasArb, tArb, fc.double({ min: 200, max: 6000, noNaN: true }), (id, t, guess) => {
        const gas = presetGas(id)!;
        expect(Math.abs(temperatureFromEntropy(gas, standardEntropyMass(gas, t), guess) - t)).toBeLessThan(1e-6);
      }),
    );
  });

  it('h is strictly increasing (cp > 0) across the whole range for every preset', () => {
    for (const id of ids) {
      const gas = presetGas(id)!;
      for (let t = 200; t <= 6000; t += 25) expect(cpMass(gas, t)).toBeGreaterThan(0);
    }
  });
});

describe('range refusal (200-6000 K, never extrapolated)', () => {
  const air = presetGas('air')!;
  it.each([199.99, 6000.01, Number.NaN, -10, Infinity])('cp, h and s° refuse %s K', (t) => {
    expect(() => cpMass(air, t)).toThrow(ThermoRangeError);
    expect(() => enthalpyMass(air, t)).toThrow(ThermoRangeError);
    expect(() => standardEntropyMass(air, t)).toThrow(ThermoRangeError);
  });

  it('accepts the end points exactly', () => {
    expect(() => cpMass(air, 200)).not.toThrow();
    expect(() => cpMass(air, 6000)).not.toThrow();
  });

  it('inversions refuse targets beyond the range with a clear message', () => {
    expect(() => temperatureFromEnthalpy(air, enthalpyMass(air, 6000) + 1)).toThrow(/above 6000 K/);
    expect(() => temperatureFromEntropy(air, standardEntropyMass(air, 200) - 1)).toThrow(/below 200 K/);
  });
});
