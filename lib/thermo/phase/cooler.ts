import {
  CRITICAL_REDUCED_DENSITY,
  fractionsOf,
  prepareComposition,
  type PengRobinsonOptions,
  type SpeciesFractions,
} from '../eos/peng-robinson';
import { R } from '../eos/peng-robinson/constants';
import { requirePositive } from '../eos/peng-robinson/errors';
import { flash } from './flash';
import { threePhaseFlash } from './three-phase';
import { stabilityTest } from './stability';

/** One liquid phase of a condensate that splits (water and hydrocarbon). */
export type CondensatePhase = { fractionOfCondensate: number; composition: Record<string, number>; z: number };

export type CoolerFlash = {
  /** Moles of vapour leaving per mole of feed (1: nothing condenses). */
  vapourFraction: number;
  vapour: Record<string, number>;
  /** Overall condensate composition (both liquids together), or null when nothing condenses. */
  condensate: Record<string, number> | null;
  zVapour: number;
  /** Z of the condensate when it is one liquid phase. */
  zCondensate: number | null;
  /** When two liquids form (free water beside hydrocarbon condensate): each, from a three-phase flash; else null. */
  condensatePhases: CondensatePhase[] | null;
  /** The flash did not settle (near the critical region): treat the split as indicative only. */
  nearCritical: boolean;
};

/**
 * Phase split at a cooler's outlet (T in K, p in Pa) by Peng-Robinson: the stability test, then a two-phase flash
 * when the feed is unstable, then stability tests of both phases and a three-phase flash when a second liquid
 * appears. The engine turns the phase compositions into condensate mass flow and latent heat
 * with the property layer. A stable feed leaves as one phase (vapourFraction 1, or 0 for a liquid-like feed).
 */
export function flashCooler(
  moleFractions: SpeciesFractions,
  temperatureK: number,
  pressurePa: number,
  options?: PengRobinsonOptions,
): CoolerFlash {
  requirePositive('temperatureK', temperatureK, 'K');
  requirePositive('pressurePa', pressurePa, 'Pa');
  const { sys, x: z } = prepareComposition(moleFractions, options);
  const T = temperatureK;
  const p = pressurePa;
  const feed = fractionsOf(sys.ids, z);
  const stability = stabilityTest(sys, z, T, p);
  if (stability.stable) {
    let b = 0;
    for (let i = 0; i < sys.n; i++) b += z[i]! * sys.b[i]!;
    const liquid = (b * p) / (stability.feedZ * R * T) > CRITICAL_REDUCED_DENSITY;
    return {
      vapourFraction: liquid ? 0 : 1,
      vapour: liquid ? {} : feed,
      condensate: liquid ? feed : null,
      zVapour: liquid ? NaN : stability.feedZ,
      zCondensate: liquid ? stability.feedZ : null,
      condensatePhases: null,
      nearCritical: false,
    };
  }
  const f = flash(sys, z, T, p, stability);
  const twoPhase: CoolerFlash = {
    vapourFraction: f.vapourFraction,
    vapour: fractionsOf(sys.ids, f.vapour),
    condensate: fractionsOf(sys.ids, f.liquid),
    zVapour: f.zVapour,
    zCondensate: f.zLiquid,
    condensatePhases: null,
    nearCritical: !f.converged,
  };
  // A second liquid (free water beside hydrocarbon condensate) shows as an unstable vapour or liquid.
  const vapourTest = stabilityTest(sys, f.vapour, T, p);
  const liquidTest = vapourTest.stable ? stabilityTest(sys, f.liquid, T, p) : vapourTest;
  if (liquidTest.stable) return twoPhase;
  const r = threePhaseFlash(sys, z, T, p, { vapour: f.vapour, liquid1: f.liquid, liquid2: liquidTest.trial! });
  const [b1, b2] = r.liquidFractions;
  if (!r.converged || !(b1 > 0 && b2 > 0 && r.vapourFraction >= 0)) return { ...twoPhase, nearCritical: true };
  const condensate = new Float64Array(sys.n);
  for (let i = 0; i < sys.n; i++) condensate[i] = (b1 * r.liquids[0][i]! + b2 * r.liquids[1][i]!) / (b1 + b2);
  return {
    vapourFraction: r.vapourFraction,
    vapour: fractionsOf(sys.ids, r.vapour),
    condensate: fractionsOf(sys.ids, condensate),
    zVapour: r.zVapour,
    zCondensate: null,
    condensatePhases: [0, 1].map((k) => ({
      fractionOfCondensate: r.liquidFractions[k]! / (b1 + b2),
      composition: fractionsOf(sys.ids, r.liquids[k]!),
      z: r.zLiquids[k]!,
    })),
    nearCritical: false,
  };
}
