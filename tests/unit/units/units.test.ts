import convert from 'convert-units';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  KG_PER_LB,
  M3_PER_FT3,
  PA_PER_PSI,
  POWER_UNITS,
  PRESSURE_UNITS,
  TEMPERATURE_UNITS,
  UNITS_BY_KIND,
  W_PER_BTU_PER_H,
  W_PER_HP,
  convertQuantity,
  fromSi,
  isGaugePressureUnit,
  normalizeUnit,
  powerToW,
  pressureFromPa,
  pressureToPa,
  temperatureFromK,
  temperatureToK,
  toSi,
} from '@/lib/units';

describe('accepted unit strings', () => {
  it('lists exactly the documented spellings per kind', () => {
    expect(UNITS_BY_KIND.massFlow).toEqual(['kg/s', 'kg/h', 't/h', 'lb/h', 'lb/s']);
    expect(UNITS_BY_KIND.standardFlow).toEqual([
      'Nm3/h',
      'Sm3/h',
      'SCFM',
      'SCFH',
      'MMSCFD',
      'SCFM@14.65',
      'MMSCFD@14.65',
      'SCFM@14.73',
      'MMSCFD@14.73',
      'SCFM@68F',
      'FAD m3/min',
      'FAD m3/h',
    ]);
    expect(UNITS_BY_KIND.actualFlow).toEqual(['m3/h', 'ACFM']);
    expect(UNITS_BY_KIND.temperature).toEqual(['degC', 'degF', 'K', 'degR']);
    expect(UNITS_BY_KIND.absolutePressure).toEqual(['kPa', 'MPa', 'Pa', 'bar', 'psia']);
    expect(UNITS_BY_KIND.gaugePressure).toEqual(['kPag', 'barg', 'psig']);
    expect(UNITS_BY_KIND.power).toEqual(['kW', 'W', 'MW', 'hp', 'Btu/h']);
  });

  it('accepts superscript and degree-sign spellings as aliases', () => {
    expect(normalizeUnit('Nm³/h')).toBe('Nm3/h');
    expect(normalizeUnit(' m³/h ')).toBe('m3/h');
    expect(normalizeUnit('°C')).toBe('degC');
    expect(normalizeUnit('°F')).toBe('degF');
    expect(normalizeUnit('mPa')).toBe('mPa'); // case is significant: not MPa
  });
});

describe('temperature', () => {
  it.each([
    [0, 'degC', 273.15],
    [32, 'degF', 273.15],
    [-40, 'degF', 233.15],
    [491.67, 'degR', 273.15],
    [212, 'degF', 373.15],
    [300, 'K', 300],
  ] as const)('%f %s = %f K [definitions, NIST SP 811]', (v, unit, k) =>
    expect(temperatureToK(v, unit)).toBeCloseTo(k, 9),
  );
  it('round-trips every unit', () => {
    fc.assert(
      fc.property(fc.constantFrom(...TEMPERATURE_UNITS), fc.double({ min: -500, max: 1e4, noNaN: true }), (unit, v) => {
        expect(temperatureFromK(temperatureToK(v, unit), unit)).toBeCloseTo(v, 8);
      }),
    );
  });
});

describe('pressure', () => {
  it('14.696 psia is one standard atmosphere within 0.0004 % [NIST SP 811: 1 psi = 6.894757 kPa]', () => {
    expect(PA_PER_PSI).toBeCloseTo(6894.757, 3);
    expect(pressureToPa(14.696, 'psia') / 101_325).toBeCloseTo(1, 5);
  });
  it('gauge units are relative to the site barometric pressure', () => {
    expect(pressureToPa(0, 'barg')).toBe(101_325);
    expect(pressureToPa(2, 'barg', 89_875)).toBeCloseTo(289_875, 9);
    expect(pressureToPa(10, 'psig', 95_000)).toBeCloseTo(95_000 + 10 * PA_PER_PSI, 9);
    expect(isGaugePressureUnit('kPag')).toBe(true);
    expect(isGaugePressureUnit('kPa')).toBe(false);
  });
  it('round-trips every unit at any site pressure', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...PRESSURE_UNITS),
        fc.double({ min: -50, max: 1e5, noNaN: true }),
        fc.double({ min: 5e4, max: 1.1e5, noNaN: true }),
        (unit, v, baro) => {
          expect(pressureFromPa(pressureToPa(v, unit, baro), unit, baro)).toBeCloseTo(v, 6);
        },
      ),
    );
  });
});

describe('power [NIST SP 811: 1 hp = 745.6999 W, 1 Btu_IT/h = 0.2930711 W]', () => {
  it('has the NIST factors', () => {
    expect(W_PER_HP).toBeCloseTo(745.6999, 4);
    expect(W_PER_BTU_PER_H).toBeCloseTo(0.2930711, 7);
    expect(powerToW(1, 'MW')).toBe(1e6);
    expect(powerToW(1, 'kW')).toBe(1000);
  });
  it('round-trips every unit', () => {
    fc.assert(
      fc.property(fc.constantFrom(...POWER_UNITS), fc.double({ min: 1e-6, max: 1e9, noNaN: true }), (unit, v) => {
        expect(fromSi('power', toSi('power', v, unit), unit) / v).toBeCloseTo(1, 12);
      }),
    );
  });
});

describe('factors taken from convert-units', () => {
  // convert-units rounds its imperial factors (1 lb = 0.453592 kg); NIST exact values are used instead, and the two agree to 1e-6.
  it('agree with the library within 1e-6 where the library is rounded', () => {
    const within = (a: number, b: number) => expect(Math.abs(a / b - 1)).toBeLessThan(1e-6);
    within(convert(1).from('lb').to('kg'), KG_PER_LB);
    within(convert(1).from('psi').to('Pa'), PA_PER_PSI);
    within(convert(1).from('ft3').to('m3'), M3_PER_FT3);
    expect(pressureToPa(1, 'bar')).toBe(convert(1).from('bar').to('Pa'));
    expect(temperatureToK(100, 'degF')).toBeCloseTo(convert(100).from('F').to('K'), 9);
  });
});

describe('switching units keeps the physical value', () => {
  it('converts between any two units of a kind', () => {
    expect(convertQuantity('pressure', 1, 'barg', 'kPa')).toBeCloseTo(201.325, 9);
    expect(convertQuantity('temperature', 100, 'degC', 'degF')).toBeCloseTo(212, 9);
    const ctx = { flow: { molarMassKgPerKmol: 28.014, temperatureK: 293.15, pressurePa: 101_325 } };
    expect(convertQuantity('flow', 1000, 'kg/h', 't/h', ctx)).toBeCloseTo(1, 12);
    expect(convertQuantity('flow', convertQuantity('flow', 500, 'SCFM', 'ACFM', ctx), 'ACFM', 'SCFM', ctx)).toBeCloseTo(
      500,
      9,
    );
  });
});
