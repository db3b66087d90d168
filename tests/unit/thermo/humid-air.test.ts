import psychrolib from 'psychrolib';
import { describe, expect, it } from 'vitest';
import { humidAirAt, humidAirGas, saturationPressureAshraePa, saturationPressureWagnerPrussPa } from '@/lib/thermo';

// psychrolib (npm) implements ASHRAE Handbook Fundamentals 2017 ch. 1; used here as the reference, SI mode.
psychrolib.SetUnitSystem(psychrolib.SI);
const M_WATER = 18.015; // CIAAW 2021 atomic weights
const M_DRY_AIR = 28.96507; // the preset's composition

function humidityRatio(xw: number): number {
  return (M_WATER / M_DRY_AIR) * (xw / (1 - xw));
}

describe('saturation pressure of water', () => {
  it.each([-60, -20, -0.5, 0.01, 5, 20, 50, 99.97, 150, 200])('ASHRAE formulation at %f °C equals psychrolib', (c) => {
    expect(saturationPressureAshraePa(c + 273.15) / psychrolib.GetSatVapPres(c)).toBeCloseTo(1, 12);
  });

  // Saturation pressures [mem: IAPWS-IF97 steam tables]: 100 °C 101.418 kPa, 250 °C 3.9762 MPa, 300 °C 8.5879 MPa.
  it.each([
    [100, 101_418],
    [250, 3_976_200],
    [300, 8_587_900],
  ])('Wagner-Pruss at %i °C gives %i Pa within 0.02 %%', (c, pa) => {
    expect(Math.abs(saturationPressureWagnerPrussPa(c + 273.15) / pa - 1)).toBeLessThan(2e-4);
  });

  it('the two formulations agree within 0.1 % where they overlap', () => {
    for (const c of [20, 80, 150, 199]) {
      expect(
        Math.abs(saturationPressureWagnerPrussPa(c + 273.15) / saturationPressureAshraePa(c + 273.15) - 1),
      ).toBeLessThan(1e-3);
    }
  });

  it('refuses temperatures outside -100..200 °C', () => {
    expect(() => saturationPressureAshraePa(273.15 - 101)).toThrow(/-100 to 200/);
    expect(() => saturationPressureAshraePa(273.15 + 201)).toThrow(/-100 to 200/);
  });
});

describe('humid air from relative humidity or dew point', () => {
  it.each([
    [20, 60, 101_325],
    [35, 90, 101_325],
    [5, 30, 89_875],
    [60, 20, 500_000],
  ])('at %i °C, %i %% RH, %i Pa the humidity ratio matches psychrolib within 0.01 %%', (c, rh, p) => {
    const state = humidAirAt({ relativeHumidityPercent: rh }, c + 273.15, p);
    expect(state.ok).toBe(true);
    if (state.ok) {
      const reference = psychrolib.GetHumRatioFromRelHum(c, rh / 100, p);
      expect(Math.abs(humidityRatio(state.waterMoleFraction) / reference - 1)).toBeLessThan(1e-4);
    }
  });

  it.each([
    [10, 101_325],
    [-10, 101_325],
    [25, 300_000],
  ])('dew point %i °C at %i Pa matches psychrolib', (dp, p) => {
    const state = humidAirAt({ dewPointK: dp + 273.15 }, 30 + 273.15, p);
    expect(state.ok).toBe(true);
    if (state.ok) {
      expect(
        Math.abs(humidityRatio(state.waterMoleFraction) / psychrolib.GetHumRatioFromTDewPoint(dp, p) - 1),
      ).toBeLessThan(1e-4);
    }
  });

  it('fractions of humid air sum to 1 and dry air keeps its proportions', () => {
    const humid = humidAirGas({ relativeHumidityPercent: 80 }, 303.15, 101_325);
    expect(humid.ok).toBe(true);
    if (humid.ok) {
      const x = humid.gas.moleFractions;
      expect(Object.values(x).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
      expect(x.N2! / x.O2!).toBeCloseTo(0.78084 / 0.209476, 10);
    }
  });

  it('refuses a dew point above the inlet temperature', () => {
    const state = humidAirAt({ dewPointK: 303.15 }, 293.15, 101_325);
    expect(state.ok).toBe(false);
    if (!state.ok) expect(state.field).toBe('dewPoint');
  });

  it('refuses a relative humidity whose vapour pressure would exceed the total pressure', () => {
    const state = humidAirAt({ relativeHumidityPercent: 60 }, 150 + 273.15, 101_325);
    expect(state.ok).toBe(false);
    if (!state.ok) expect(state.message).toMatch(/below 21\.\d %/);
  });
});
