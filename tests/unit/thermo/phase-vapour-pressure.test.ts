import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { saturationPressureWagnerPrussPa } from '@/lib/thermo';
import { componentsFor, lnFugacityCoefficients, newFugacityState } from '@/lib/thermo/eos/peng-robinson';
import { saturationTemperature, vapourPressure } from '@/lib/thermo/phase';

// n-butane until the species data lands: Tc 425.12 K, pc 37.96 bar, ω 0.200 [mem: Poling, Prausnitz & O'Connell,
// The Properties of Gases and Liquids, 5th ed., Appendix A].
const BUTANE = { criticalConstants: { 'n-C4H10': { tcK: 425.12, pcBar: 37.96, omega: 0.2 } } };

describe('pure-fluid vapour pressure by equal fugacity', () => {
  // [calc: each fluid's reference equation of state as implemented in CoolProp 8.0]. Peng-Robinson gets (this code):
  // NH3 861.7 (+0.55 %),
  // C3H8 836.1 (-0.05 %), CO2 5095 (+0.16 %), n-C4H10 207.3 (-0.13 %), C2H6 2400 (+0.57 %) kPa.
  it.each([
    ['NH3', 293.15, 857.0],
    ['C3H8', 293.15, 836.5],
    ['CO2', 288.15, 5087],
    ['n-C4H10', 293.15, 207.6],
    ['C2H6', 273.15, 2386.7],
  ])('%s at %d K within 1 % of %d kPa', (id, T, kPa) => {
    const p = vapourPressure(id, T, BUTANE)!;
    expect(Math.abs(p / 1000 / kPa - 1)).toBeLessThan(0.01);
  });

  it('liquid and vapour fugacities are equal at the computed vapour pressure; the roots differ', () => {
    for (const [id, T] of [
      ['NH3', 293.15],
      ['CO2', 288.15],
      ['C3H8', 250],
      ['H2O', 300],
    ] as const) {
      const sys = componentsFor([id]);
      const p = vapourPressure(id, T)!;
      const liquid = new Float64Array(1);
      const vapour = new Float64Array(1);
      const sl = newFugacityState();
      const sv = newFugacityState();
      lnFugacityCoefficients(sys, T, p, [1], 'liquid', liquid, sl);
      lnFugacityCoefficients(sys, T, p, [1], 'vapour', vapour, sv);
      expect(liquid[0]).toBeCloseTo(vapour[0]!, 11);
      expect(sv.z - sl.z).toBeGreaterThan(0.1);
    }
  });

  it('is null at and above the critical temperature, and for the saturation temperature at and above pc', () => {
    expect(vapourPressure('CO2', 304.13)).toBeNull();
    expect(vapourPressure('CH4', 300)).toBeNull();
    expect(saturationTemperature('CO2', 73.77e5)).toBeNull();
  });

  it('rises with temperature, reaches pc at Tc, and inverts to the same temperature', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('CH4', 'C2H6', 'C3H8', 'CO2', 'NH3', 'H2O', 'N2'),
        fc.double({ min: 0.45, max: 0.995, noNaN: true }),
        (id, tr) => {
          const sys = componentsFor([id]);
          const T = tr * sys.tcK[0]!;
          const p = vapourPressure(id, T)!;
          expect(p).toBeLessThan(sys.pcPa[0]!);
          expect(vapourPressure(id, T * 1.001)!).toBeGreaterThan(p);
          expect(saturationTemperature(id, p)!).toBeCloseTo(T, 6);
        },
      ),
      { numRuns: 150 },
    );
    const sys = componentsFor(['CO2']);
    expect(vapourPressure('CO2', sys.tcK[0]! * (1 - 1e-7))! / sys.pcPa[0]!).toBeCloseTo(1, 5);
  });

  // Standard PR (ω = 0.345) is known to under-predict the vapour pressure of water at low reduced temperature;
  // against Wagner-Pruss [pub: J. Phys. Chem. Ref. Data 31 (2002), eq. 2.5] this code gets -15.6 % at 300 K,
  // -5.3 % at 373.15 K. This error sets the bias of every water dew point below (about +2.5 K near ambient).
  it('water: below the Wagner-Pruss vapour pressure by 3 to 17 % from 300 to 373 K', () => {
    for (const T of [300, 330, 373.15]) {
      const ratio = vapourPressure('H2O', T)! / saturationPressureWagnerPrussPa(T);
      expect(ratio).toBeLessThan(0.97);
      expect(ratio).toBeGreaterThan(0.83);
    }
  });
});
