import { describe, expect, it } from 'vitest';
import { saturationPressureWagnerPrussPa } from '@/lib/thermo';
import { lnFugacityCoefficients, newFugacityState, prepareComposition } from '@/lib/thermo/eos/peng-robinson';
import { flashCooler, vapourPressure } from '@/lib/thermo/phase';

// [mem: Poling, Prausnitz & O'Connell, 5th ed., Appendix A] until the engine's species data has these.
const HEAVY = {
  criticalConstants: {
    'n-C4H10': { tcK: 425.12, pcBar: 37.96, omega: 0.2 },
    'n-C5H12': { tcK: 469.7, pcBar: 33.7, omega: 0.252 },
    'n-C6H14': { tcK: 507.6, pcBar: 30.25, omega: 0.3 },
  },
};
const RICH_DRY = { CH4: 0.8, C2H6: 0.08, C3H8: 0.05, 'n-C4H10': 0.03, 'n-C5H12': 0.02, 'n-C6H14': 0.01, CO2: 0.01 };

function closesBalance(feed: Record<string, number>, r: ReturnType<typeof flashCooler>): void {
  for (const [id, z] of Object.entries(feed)) {
    const back = r.vapourFraction * (r.vapour[id] ?? 0) + (1 - r.vapourFraction) * (r.condensate?.[id] ?? 0);
    expect(back).toBeCloseTo(z, 10);
  }
}

describe('cooler condensation', () => {
  it('humid air cooled to 20 °C at 8 bar: nearly pure water condenses; the vapour keeps PR water saturation', () => {
    const feed = { N2: 0.78 * 0.97, O2: 0.21 * 0.97, Ar: 0.01 * 0.97, H2O: 0.03 };
    const r = flashCooler(feed, 293.15, 8e5);
    expect(r.vapourFraction).toBeGreaterThan(0.97);
    expect(r.vapourFraction).toBeLessThan(0.98);
    expect(r.condensate!.H2O).toBeGreaterThan(0.99999);
    expect(r.condensatePhases).toBeNull();
    closesBalance(feed, r);
    // Partial pressure of water left in the gas: PR's own p_sat (15 % under Wagner-Pruss here, see the
    // vapour-pressure tests) times a small enhancement from the compressed air.
    const partial = r.vapour.H2O! * 8e5;
    expect(partial / vapourPressure('H2O', 293.15)!).toBeGreaterThan(1);
    expect(partial / vapourPressure('H2O', 293.15)!).toBeLessThan(1.05);
    expect(partial / saturationPressureWagnerPrussPa(293.15)).toBeGreaterThan(0.8);
  });

  it('a dry gas above its dew point passes through: vapour fraction 1, no condensate', () => {
    const r = flashCooler({ CH4: 0.9, C2H6: 0.05, C3H8: 0.05 }, 300, 50e5);
    expect(r).toMatchObject({ vapourFraction: 1, condensate: null, condensatePhases: null });
  });

  it('a rich gas cooled to 0 °C at 50 bar condenses hydrocarbons; material balances close', () => {
    const r = flashCooler(RICH_DRY, 273.15, 50e5, HEAVY);
    expect(r.vapourFraction).toBeGreaterThan(0.8);
    expect(r.vapourFraction).toBeLessThan(1);
    expect(r.condensate!['n-C6H14']!).toBeGreaterThan(RICH_DRY['n-C6H14']);
    closesBalance(RICH_DRY, r);
  });

  it('a wet rich gas forms free water beside hydrocarbon condensate: three phases with equal fugacities', () => {
    const feed: Record<string, number> = { H2O: 0.01 };
    for (const [id, x] of Object.entries(RICH_DRY)) feed[id] = x * 0.99;
    const T = 300;
    const p = 50e5;
    const r = flashCooler(feed, T, p, HEAVY);
    expect(r.nearCritical).toBe(false);
    expect(r.condensatePhases).not.toBeNull();
    const [a, b] = r.condensatePhases!;
    const water = a!.composition.H2O! > b!.composition.H2O! ? a! : b!;
    const oil = water === a ? b! : a!;
    expect(water.composition.H2O).toBeGreaterThan(0.999);
    expect(oil.composition.H2O).toBeLessThan(0.01);
    closesBalance(feed, r);
    // Equal fugacities of every component in the vapour and both liquids.
    const { sys } = prepareComposition(feed, HEAVY);
    const phases = [r.vapour, water.composition, oil.composition].map((c) =>
      Float64Array.from(sys.ids, (id) => c[id]!),
    );
    const st = newFugacityState();
    const lnF = phases.map((x, k) => {
      const out = new Float64Array(sys.n);
      lnFugacityCoefficients(sys, T, p, x, k === 0 ? 'stable' : 'liquid', out, st);
      return out.map((v, i) => v + Math.log(x[i]!));
    });
    for (let i = 0; i < sys.n; i++) {
      expect(lnF[1]![i]).toBeCloseTo(lnF[0]![i]!, 7);
      expect(lnF[2]![i]).toBeCloseTo(lnF[0]![i]!, 7);
    }
  });
});
