import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { presetGas } from '@/lib/thermo';
import { FLOW_UNITS, STANDARD_FLOW_BASES, flowFromKgPerS, flowToKgPerS, type FlowContext } from '@/lib/units';

const air = presetGas('air')!;
const atInlet = (temperatureK: number, pressurePa: number): FlowContext => ({
  molarMassKgPerKmol: air.molarMassKgPerKmol,
  temperatureK,
  pressurePa,
});

describe('standard and actual volume flow', () => {
  // 1 SCFM (60 °F, 14.696 psia) = 1.6075 Nm3/h (0 °C, 101.325 kPa) [calc: ideal gas; 1 ft3 = 0.028316846592 m3
  // and 1 psi = 6894.757 Pa (NIST SP 811); normal conditions 0 °C, 101.325 kPa (DIN 1343, ISO 13443);
  // 60 °F, 14.696 psia the US gas-industry standard condition [cp]].
  it('1 SCFM is 1.6075 Nm3/h', () => {
    const kgPerS = flowToKgPerS(1, 'SCFM', atInlet(300, 1e5));
    expect(flowFromKgPerS(kgPerS, 'Nm3/h', atInlet(300, 1e5))).toBeCloseTo(1.6075, 4);
  });

  // Molar volume of an ideal gas at 0 °C and 101.325 kPa: 22.41397 L/mol [pub: CODATA 2018].
  it('1 kmol/h is 22.41397 Nm3/h for any gas', () => {
    const ctx = { molarMassKgPerKmol: 44.009, temperatureK: 300, pressurePa: 1e5 };
    expect(flowFromKgPerS(44.009 / 3600, 'Nm3/h', ctx)).toBeCloseTo(22.41397, 4);
  });

  // ISO 2533 sea-level air density 1.2250 kg/m3 at 15 °C and 101.325 kPa [pub].
  it('actual flow uses the ideal-gas density at inlet: air at 15 °C, 1 atm is 1.2250 kg/m3', () => {
    expect(flowToKgPerS(3600, 'm3/h', atInlet(288.15, 101_325))).toBeCloseTo(1.225, 4);
  });

  it('Sm3/h and Nm3/h differ by the temperature ratio 288.15/273.15 [ISO 13443, DIN 1343]', () => {
    const ctx = atInlet(300, 1e5);
    expect(flowToKgPerS(288.15, 'Sm3/h', ctx)).toBeCloseTo(flowToKgPerS(273.15, 'Nm3/h', ctx), 12);
  });

  it('SCFH, SCFM and MMSCFD are one basis: 1 MMSCFD = 1e6/1440 SCFM', () => {
    const ctx = atInlet(300, 1e5);
    expect(flowToKgPerS(1, 'MMSCFD', ctx)).toBeCloseTo(flowToKgPerS(1e6 / 1440, 'SCFM', ctx), 12);
    expect(flowToKgPerS(60, 'SCFH', ctx)).toBeCloseTo(flowToKgPerS(1, 'SCFM', ctx), 12);
  });

  it('states the bases it uses', () => {
    expect(STANDARD_FLOW_BASES['Nm3/h']).toMatchObject({ temperatureK: 273.15, pressurePa: 101_325 });
    expect(STANDARD_FLOW_BASES['Sm3/h']).toMatchObject({ temperatureK: 288.15, pressurePa: 101_325 });
    expect(STANDARD_FLOW_BASES.SCFM.temperatureK).toBeCloseTo(288.705556, 5);
    expect(STANDARD_FLOW_BASES.SCFM.pressurePa / 1000).toBeCloseTo(101.32535, 4);
  });
});

describe('mass flow [NIST SP 811: 1 lb = 0.45359237 kg]', () => {
  it.each([
    ['kg/s', 1],
    ['kg/h', 1 / 3600],
    ['t/h', 1000 / 3600],
    ['lb/h', 0.45359237 / 3600],
    ['lb/s', 0.45359237],
  ] as const)('1 %s = %f kg/s', (unit, kgPerS) => expect(flowToKgPerS(1, unit)).toBeCloseTo(kgPerS, 14));
});

describe('round trips', () => {
  it('every flow unit converts to kg/s and back unchanged', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...FLOW_UNITS),
        fc.double({ min: 1e-6, max: 1e9, noNaN: true }),
        fc.double({ min: 200, max: 2000, noNaN: true }),
        fc.double({ min: 1e3, max: 1e8, noNaN: true }),
        (unit, value, t, p) => {
          const ctx = atInlet(t, p);
          expect(flowFromKgPerS(flowToKgPerS(value, unit, ctx), unit, ctx) / value).toBeCloseTo(1, 12);
        },
      ),
    );
  });

  it('volume units need the gas and state and say so', () => {
    expect(() => flowToKgPerS(1, 'Nm3/h')).toThrow(/molar mass/);
    expect(() => flowToKgPerS(1, 'ACFM')).toThrow(/inlet state/);
    expect(() => flowToKgPerS(1, 'gpm')).toThrow(/unknown flow unit/);
  });
});
