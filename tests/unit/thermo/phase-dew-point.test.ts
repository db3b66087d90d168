import { describe, expect, it } from 'vitest';
import { saturationPressureWagnerPrussPa } from '@/lib/thermo';
import { prepareComposition } from '@/lib/thermo/eos/peng-robinson';
import { classifyInlet, dewPointPressures, dewPointTemperature, stabilityTest } from '@/lib/thermo/phase';

// [mem: Poling, Prausnitz & O'Connell, 5th ed., Appendix A] until the engine's species data has these.
const HEAVY = {
  criticalConstants: {
    'n-C4H10': { tcK: 425.12, pcBar: 37.96, omega: 0.2 },
    'n-C5H12': { tcK: 469.7, pcBar: 33.7, omega: 0.252 },
    'n-C6H14': { tcK: 507.6, pcBar: 30.25, omega: 0.3 },
  },
};
const NATURAL_GAS = { CH4: 0.9, C2H6: 0.05, C3H8: 0.03, 'n-C4H10': 0.01, N2: 0.01 };
const RICH_GAS = { CH4: 0.8, C2H6: 0.08, C3H8: 0.05, 'n-C4H10': 0.03, 'n-C5H12': 0.02, 'n-C6H14': 0.01, CO2: 0.01 };

function humidAir(waterFraction: number): Record<string, number> {
  const dry = 1 - waterFraction;
  return { N2: 0.78084 * dry, O2: 0.209476 * dry, Ar: 0.009684 * dry, H2O: waterFraction };
}

/** Dew temperature where x_H2O p = p_sat(T) [pub: Wagner & Pruss 2002, eq. 2.5], by bisection. */
function idealDewPoint(waterFraction: number, p: number): number {
  let lo = 273.16;
  let hi = 640;
  for (let k = 0; k < 80; k++) {
    const mid = (lo + hi) / 2;
    if (saturationPressureWagnerPrussPa(mid) > waterFraction * p) hi = mid;
    else lo = mid;
  }
  return (lo + hi) / 2;
}

function stableAt(fractions: Record<string, number>, T: number, p: number): boolean {
  const { sys, x } = prepareComposition(fractions, HEAVY);
  return stabilityTest(sys, x, T, p).stable;
}

describe('water dew point of humid air', () => {
  // PR (with DECHEMA/USGS k_ij) against the saturation-pressure estimate: PR's own water vapour pressure is 5-15 %
  // low near ambient, so its dew points sit 1.5 to 3.2 K above; the band below is that bias plus 1 K.
  it.each([
    [0.03, 1e5],
    [0.01, 1e5],
    [0.005, 5e5],
    [0.01, 10e5],
    [0.002, 10e5],
  ])('y_H2O = %d at %d Pa: within +0.5 to +3.5 K of x p = p_sat(T)', (y, p) => {
    const dew = dewPointTemperature(humidAir(y), p);
    expect('temperatureK' in dew).toBe(true);
    if (!('temperatureK' in dew)) return;
    const bias = dew.temperatureK - idealDewPoint(y, p);
    expect(bias).toBeGreaterThan(0.5);
    expect(bias).toBeLessThan(3.5);
    expect(dew.firstDrop.H2O).toBeGreaterThan(0.9999);
  });
});

describe('dew points of hydrocarbon gases', () => {
  it('every dew temperature given is a real phase boundary: stable 0.2 K above, unstable 0.2 K below', () => {
    for (const fractions of [NATURAL_GAS, RICH_GAS]) {
      for (const bar of [5, 20, 40, 60, 80, 100, 120]) {
        const p = bar * 1e5;
        const dew = dewPointTemperature(fractions, p, HEAVY);
        if (!('temperatureK' in dew)) {
          expect(['near-critical', 'none']).toContain(dew.reason);
          continue;
        }
        expect(stableAt(fractions, dew.temperatureK + 0.2, p)).toBe(true);
        expect(stableAt(fractions, dew.temperatureK - 0.2, p)).toBe(false);
      }
    }
  });

  it('a retrograde rich gas at 0 °C has a lower and an upper dew pressure; two phases only between them', () => {
    const { lower, upper } = dewPointPressures(RICH_GAS, 273.15, HEAVY);
    expect('pressurePa' in lower && 'pressurePa' in upper).toBe(true);
    if (!('pressurePa' in lower) || !('pressurePa' in upper)) return;
    expect(lower.pressurePa).toBeLessThan(upper.pressurePa);
    expect(stableAt(RICH_GAS, 273.15, lower.pressurePa * 0.98)).toBe(true);
    expect(stableAt(RICH_GAS, 273.15, lower.pressurePa * 1.02)).toBe(false);
    expect(stableAt(RICH_GAS, 273.15, upper.pressurePa * 0.98)).toBe(false);
    expect(stableAt(RICH_GAS, 273.15, upper.pressurePa * 1.02)).toBe(true);
    // The first drop at the upper dew point is far lighter than at the lower one (it nears the critical point).
    expect(upper.firstDrop.CH4!).toBeGreaterThan(lower.firstDrop.CH4! + 0.3);
  });

  it('natural gas at 20 °C is above its cricondentherm: no dew pressure at any pressure', () => {
    const { lower, upper } = dewPointPressures(NATURAL_GAS, 293.15, HEAVY);
    expect(lower).toEqual({ reason: 'none' });
    expect(upper).toEqual({ reason: 'none' });
  });

  // Propane's vapour pressure at 20 °C is 836.5 kPa [calc: Lemmon propane equation, CoolProp 8.0].
  it('a pure fluid dew point is its saturation state', () => {
    const { lower } = dewPointPressures({ C3H8: 1 }, 293.15);
    expect('pressurePa' in lower && Math.abs(lower.pressurePa / 836.5e3 - 1)).toBeLessThan(0.01);
  });

  it('near the cricondenbar the inlet dew point falls back to stability tests and says so', () => {
    const p = 120e5; // the rich gas's dew iteration does not settle here (see the boundary test above)
    expect('reason' in dewPointTemperature(RICH_GAS, p, HEAVY)).toBe(true);
    const r = classifyInlet(RICH_GAS, 330, p, HEAVY);
    expect(r).toMatchObject({ phase: 'gas', nearCritical: true });
    if (r.phase !== 'gas') return;
    expect(stableAt(RICH_GAS, r.dewPointK! + 0.1, p)).toBe(true);
    expect(stableAt(RICH_GAS, r.dewPointK! - 0.1, p)).toBe(false);
  });

  it('natural gas above its cricondenbar cannot condense on cooling: supercritical, gas-like', () => {
    expect(classifyInlet(NATURAL_GAS, 293.15, 100e5, HEAVY)).toMatchObject({ phase: 'supercritical', dense: false });
  });

  it('the inlet margin follows the dew temperature: cooling the gas to it makes the inlet two-phase', () => {
    const r = classifyInlet(NATURAL_GAS, 293.15, 40e5, HEAVY);
    expect(r.phase).toBe('gas');
    if (r.phase !== 'gas') return;
    expect(classifyInlet(NATURAL_GAS, r.dewPointK! - 1, 40e5, HEAVY).phase).toBe('two-phase');
    expect(classifyInlet(NATURAL_GAS, r.dewPointK! + 1, 40e5, HEAVY).phase).toBe('gas');
  });
});
