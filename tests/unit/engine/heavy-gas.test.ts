import { describe, expect, it } from 'vitest';
import { enthalpyMass, mixtureGas, presetGas } from '@/lib/thermo';
import { SizingInputError, calculate, type HeaterResult, type SizingResult } from '@/lib/engine';
import { heaterRequest, q } from './requests';

const heater = (overrides: Record<string, unknown>) => calculate(heaterRequest(overrides)) as HeaterResult;
const codes = (r: SizingResult) => r.warnings.map((w) => w.code);

function allNumbersFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allNumbersFinite);
  if (value && typeof value === 'object') return Object.values(value).every(allNumbersFinite);
  return true;
}

// An invented sour condensate-rich gas carrying every added species, n-decane included.
const HEAVY_GAS = {
  CH4: 0.8,
  C2H6: 0.06,
  C3H8: 0.03,
  'n-C4H10': 0.012,
  'i-C4H10': 0.008,
  'n-C5H12': 0.005,
  'i-C5H12': 0.004,
  'n-C6H14': 0.003,
  'n-C7H16': 0.002,
  'n-C8H18': 0.0015,
  'n-C9H20': 0.001,
  'n-C10H22': 0.0005,
  H2S: 0.01,
  N2: 0.04,
  CO2: 0.023,
};

describe('heaters for gases with the heavier alkanes and H2S', () => {
  // 60 °C keeps the gas above its dew point (about 43 °C at 6 bar by Peng-Robinson): a gas inlet.
  const duty = { flow: q(5000, 'kg/h'), inlet: { temperature: q(60, 'degC'), pressure: q(5, 'barg') } };

  it('sizes a gas carrying n-C10H22 with finite figures and duty = m (h2 - h1)', () => {
    const r = heater({ ...duty, gas: { components: HEAVY_GAS }, outletTemperature: q(120, 'degC') });
    expect(allNumbersFinite(r)).toBe(true);
    expect(r.gas.moleFractions['n-C10H22']).toBeCloseTo(0.0005, 12);
    const gas = mixtureGas(r.gas.moleFractions);
    const dhKw = ((5000 / 3600) * (enthalpyMass(gas, 393.15) - enthalpyMass(gas, 333.15))) / 1000;
    expect(r.heater.absorbedDutyKw).toBeCloseTo(dhKw, 6);
    expect(r.gas.molarMassKgPerKmol).toBeGreaterThan(19);
  });

  // n-decane vapour, 1 bar, 200 -> 400 °C: h(673.15 K) - h(473.15 K) = 78.39 kJ/mol from the GERG-2008
  // ideal-gas equation [calc from Kunz & Wagner 2012 coefficients, see tests/unit/thermo/heavy-species.test.ts].
  it('n-decane vapour duty agrees with the GERG-2008 ideal-gas enthalpy within 1 %', () => {
    const r = heater({
      gas: { components: { 'n-decane': 1 } },
      flow: q(142.286, 'kg/h'), // 1 kmol/h
      inlet: { temperature: q(200, 'degC'), pressure: q(100, 'kPa') },
      outletTemperature: q(400, 'degC'),
    });
    const kwPerKmolH = (gergDecaneH(673.15) - gergDecaneH(473.15)) / 3600;
    expect(Math.abs(r.heater.absorbedDutyKw / kwPerKmolH - 1)).toBeLessThan(0.01);
  });

  it('flags the heavier alkanes and H2S as flammable and H2S as toxic', () => {
    const r = heater({ ...duty, gas: { components: { N2: 0.97, 'n-C5H12': 0.02, H2S: 0.01 } } });
    expect(codes(r)).toEqual(expect.arrayContaining(['flammable-gas', 'toxic-gas']));
    const toxic = r.warnings.find((w) => w.code === 'toxic-gas')!;
    expect(toxic.message).toContain('H2S 1.00 %');
  });

  it('the rich natural-gas preset sizes, sums to 1 and is flagged flammable', () => {
    const gas = presetGas('natural-gas-rich')!;
    expect(Object.values(gas.moleFractions).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
    const r = heater({ ...duty, gas: { preset: 'natural-gas-rich' } });
    expect(allNumbersFinite(r)).toBe(true);
    expect(codes(r)).toContain('flammable-gas');
  });
});

describe('component names through the API', () => {
  it('common names size exactly like ids', () => {
    const byName = heater({ gas: { components: { methane: 0.9, 'n-butane': 0.05, 'hydrogen sulfide': 0.05 } } });
    const byId = heater({ gas: { components: { CH4: 0.9, 'n-C4H10': 0.05, H2S: 0.05 } } });
    expect(byName.heater).toEqual(byId.heater);
    expect(byName.gas.moleFractions).toEqual(byId.gas.moleFractions);
  });

  it.each([
    [{ CH4: 0.5, methane: 0.5 }, 'gas.components.methane', /both name CH4/],
    [{ CH4: 0.9, C4H10: 0.1 }, 'gas.components.C4H10', /n-C4H10 \(n-butane\) or i-C4H10 \(isobutane\)/],
  ])('refuses %j at the key that is wrong', (components, path, message) => {
    try {
      calculate(heaterRequest({ gas: { components } }));
      expect.unreachable('should have been refused');
    } catch (err) {
      expect(err).toBeInstanceOf(SizingInputError);
      expect((err as SizingInputError).issues).toEqual([{ path, message: expect.stringMatching(message) }]);
    }
  });
});

/** GERG-2008 ideal-gas enthalpy of n-decane, J/mol, up to a constant [pub: Kunz & Wagner 2012, n-decane row]. */
function gergDecaneH(t: number): number {
  const [n3, n4, t4, n5, t5, n6, t6] = [4, 21.0069, 164.947, 43.4931, 836.264, 58.3657, 1750.24];
  return (
    8.31451 * (n3 * t + (n4 * t4) / Math.tanh(t4 / t) - n5 * t5 * Math.tanh(t5 / t) + (n6 * t6) / Math.tanh(t6 / t))
  );
}
