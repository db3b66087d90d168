import {
  CRITICAL_REDUCED_DENSITY,
  CRITICAL_Z,
  fractionsOf,
  prepareComposition,
  type PengRobinsonComponents,
  type PengRobinsonOptions,
  type SpeciesFractions,
} from '../eos/peng-robinson';
import { R } from '../eos/peng-robinson/constants';
import { requirePositive } from '../eos/peng-robinson/errors';
import { dewTemperatureByStability, dewTemperatureOf, lowerDewPressureOf } from './dew-point';
import { flash } from './flash';
import { pseudoCritical } from './pseudo-critical';
import { stabilityTest } from './stability';
import { pureSaturation } from './vapour-pressure';

/** Where the dew-point numbers stop being trustworthy the result says so instead of giving a number. */
export type InletClassification =
  | {
      phase: 'gas';
      /** Dew temperature at the inlet pressure, K (absent above the critical temperature or cricondenbar). */
      dewPointK?: number;
      /** Inlet temperature minus dew temperature, K. */
      dewMarginK?: number;
      /** Pure fluid: its vapour pressure at the inlet temperature, Pa (mixtures: see dewPointPressures). */
      dewPressurePa?: number;
      /** A pure fluid above its critical temperature (but below pc): it cannot condense at this temperature. */
      aboveCriticalTemperature?: boolean;
      /**
       * Near the critical region (cricondenbar or cricondentherm) the dew iteration cannot be trusted; the dew
       * temperature was then found by stability tests along the cooling path (to 0.05 K).
       */
      nearCritical?: boolean;
      compressibility: number;
    }
  | {
      phase: 'supercritical';
      /** Density above the (pseudo-)critical density: a dense phase; sizing as a gas still holds with a real-gas equation. */
      dense: boolean;
      detail: {
        compressibility: number;
        criticalTemperatureK: number;
        criticalPressurePa: number;
        pseudoCritical: boolean;
      };
    }
  | {
      phase: 'liquid';
      detail: {
        compressibility: number;
        /** Pure fluid: vapour pressure at the inlet temperature, Pa. */
        saturationPressurePa?: number;
        /** Mixture: dew temperature at the inlet pressure, K, when one was found. */
        dewPointK?: number;
      };
    }
  | {
      phase: 'two-phase';
      detail: {
        /** Moles of vapour per mole of feed. */
        vapourFraction: number;
        vapour: Record<string, number>;
        liquid: Record<string, number>;
        zVapour: number;
        zLiquid: number;
        /** Dew temperature at the inlet pressure, K: the gas would need heating above this. */
        dewPointK?: number;
        /** Ordinary dew pressure at the inlet temperature, Pa: the pressure would need lowering below this. */
        dewPressurePa?: number;
        /** The flash or a dew-point iteration did not settle: near the critical region. */
        nearCritical: boolean;
      };
    };

function classifyPure(sys: PengRobinsonComponents, z: Float64Array, T: number, p: number): InletClassification {
  const tc = sys.tcK[0]!;
  const pc = sys.pcPa[0]!;
  const stable = stabilityTest(sys, z, T, p);
  if (T >= tc) {
    if (p < pc) return { phase: 'gas', aboveCriticalTemperature: true, compressibility: stable.feedZ };
    const dense = p / (stable.feedZ * T) > pc / (CRITICAL_Z * tc); // rho > rho_c of the equation
    return {
      phase: 'supercritical',
      dense,
      detail: {
        compressibility: stable.feedZ,
        criticalTemperatureK: tc,
        criticalPressurePa: pc,
        pseudoCritical: false,
      },
    };
  }
  const sat = pureSaturation(sys, T);
  if (!sat) {
    // Within rounding of Tc the two roots merge: report the critical state itself.
    return {
      phase: 'supercritical',
      dense: p / (stable.feedZ * T) > pc / (CRITICAL_Z * tc),
      detail: {
        compressibility: stable.feedZ,
        criticalTemperatureK: tc,
        criticalPressurePa: pc,
        pseudoCritical: false,
      },
    };
  }
  if (p > sat.pressurePa) {
    return { phase: 'liquid', detail: { compressibility: sat.zLiquid, saturationPressurePa: sat.pressurePa } };
  }
  const dew = dewTemperatureOf(sys, z, p);
  const dewK = 'temperatureK' in dew ? dew.temperatureK : undefined;
  return {
    phase: 'gas',
    dewPointK: dewK,
    dewMarginK: dewK === undefined ? undefined : T - dewK,
    dewPressurePa: sat.pressurePa,
    compressibility: stable.feedZ,
  };
}

function classifyMixture(sys: PengRobinsonComponents, z: Float64Array, T: number, p: number): InletClassification {
  const stability = stabilityTest(sys, z, T, p);
  const dew = dewTemperatureOf(sys, z, p);
  const dewK = 'temperatureK' in dew ? dew.temperatureK : undefined;
  if (!stability.stable) {
    const f = flash(sys, z, T, p, stability);
    const dewP = lowerDewPressureOf(sys, z, T);
    return {
      phase: 'two-phase',
      detail: {
        vapourFraction: f.vapourFraction,
        vapour: fractionsOf(sys.ids, f.vapour),
        liquid: fractionsOf(sys.ids, f.liquid),
        zVapour: f.zVapour,
        zLiquid: f.zLiquid,
        dewPointK: dewK,
        dewPressurePa: 'pressurePa' in dewP ? dewP.pressurePa : undefined,
        nearCritical: !f.converged || dewK === undefined,
      },
    };
  }
  if (dewK !== undefined && dewK <= T) {
    // For a gas the margin is in temperature; the dew pressure at T is left to dewPointPressures (compression
    // heats the gas, so an isothermal pressure margin would mislead).
    return { phase: 'gas', dewPointK: dewK, dewMarginK: T - dewK, compressibility: stability.feedZ };
  }
  let b = 0;
  for (let i = 0; i < sys.n; i++) b += z[i]! * sys.b[i]!;
  const liquidLike = (b * p) / (stability.feedZ * R * T) > CRITICAL_REDUCED_DENSITY;
  if (dewK === undefined && !liquidLike) {
    // The dew iteration failed (cricondenbar or cricondentherm region, or no dew point at this pressure):
    // fall back to stability tests along the cooling path.
    const fallback = dewTemperatureByStability(sys, z, p, T);
    if (fallback !== null) {
      return {
        phase: 'gas',
        dewPointK: fallback,
        dewMarginK: T - fallback,
        nearCritical: true,
        compressibility: stability.feedZ,
      };
    }
  }
  // Stable, and not on the vapour side of a dew curve at this pressure: a liquid, or a fluid above the
  // cricondenbar (no condensation on cooling), told apart by density and the one-fluid pseudo-critical point.
  const pc = pseudoCritical(sys, z);
  if (liquidLike && T < pc.temperatureK) {
    return { phase: 'liquid', detail: { compressibility: stability.feedZ, dewPointK: dewK } };
  }
  if (liquidLike || (T >= pc.temperatureK && p >= pc.pressurePa)) {
    return {
      phase: 'supercritical',
      dense: liquidLike,
      detail: {
        compressibility: stability.feedZ,
        criticalTemperatureK: pc.temperatureK,
        criticalPressurePa: pc.pressurePa,
        pseudoCritical: true,
      },
    };
  }
  return { phase: 'gas', compressibility: stability.feedZ };
}

/**
 * What the inlet of a heater or compressor is, by Peng-Robinson: gas (with its dew point and margin), liquid,
 * two-phase (with the split), or supercritical (dense or not). A pure fluid is judged by its vapour pressure, a
 * mixture by Michelsen's stability test, then a flash or a dew-point calculation for the message.
 */
export function classifyInlet(
  moleFractions: SpeciesFractions,
  temperatureK: number,
  pressurePa: number,
  options?: PengRobinsonOptions,
): InletClassification {
  requirePositive('temperatureK', temperatureK, 'K');
  requirePositive('pressurePa', pressurePa, 'Pa');
  const { sys, x } = prepareComposition(moleFractions, options);
  return sys.n === 1
    ? classifyPure(sys, x, temperatureK, pressurePa)
    : classifyMixture(sys, x, temperatureK, pressurePa);
}
