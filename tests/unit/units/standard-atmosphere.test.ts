import psychrolib from 'psychrolib';
import { describe, expect, it } from 'vitest';
import { geopotentialAltitudeM, standardAtmospherePressurePa, standardAtmosphereTemperatureK } from '@/lib/units';

psychrolib.SetUnitSystem(psychrolib.SI);

describe('ISO 2533 standard atmosphere (troposphere)', () => {
  it('is 101.325 kPa and 15 °C at sea level [pub: ISO 2533]', () => {
    expect(standardAtmospherePressurePa(0)).toBe(101_325);
    expect(standardAtmosphereTemperatureK(0)).toBe(288.15);
  });

  // ISO 2533 / U.S. Standard Atmosphere 1976 tables: 89.875 kPa at 1000 m geopotential, 89.876 kPa at 1000 m
  // geometric; 79.50 kPa at 2000 m; 54.05 kPa at 5000 m [mem].
  it.each([
    [1000, 89_876],
    [2000, 79_501],
    [5000, 54_048],
  ])('at %i m elevation is %i Pa within 10 Pa', (z, pa) => {
    expect(Math.abs(standardAtmospherePressurePa(z) - pa)).toBeLessThan(10);
  });

  it('gives 89.875 kPa at 1000 m (the issue check value, geopotential vs geometric within 2 Pa)', () => {
    expect(standardAtmospherePressurePa(1000) / 1000).toBeCloseTo(89.875, 2);
  });

  // ASHRAE's simplified form (ASHRAE Handbook Fundamentals 2017 ch. 1 eq. 3, as in psychrolib) drops the
  // geopotential correction, so it drifts by a few parts in 1e4 at altitude.
  it('agrees with the ASHRAE standard-atmosphere formula in psychrolib within 0.05 %', () => {
    for (const z of [-400, 500, 1500, 3000, 4500]) {
      expect(Math.abs(standardAtmospherePressurePa(z) / psychrolib.GetStandardAtmPressure(z) - 1)).toBeLessThan(5e-4);
    }
  });

  it('converts geometric to geopotential altitude with the ISO 2533 radius', () => {
    expect(geopotentialAltitudeM(1000)).toBeCloseTo(999.8427, 3);
  });

  it('refuses altitudes outside the layer', () => {
    expect(() => standardAtmospherePressurePa(12_000)).toThrow(/altitude/);
  });
});
