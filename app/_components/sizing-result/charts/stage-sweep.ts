import { SizingInputError, calculateCore, type CompressorInput, headlineMethod } from '@/lib/engine';
import { SYSTEM_UNITS, temperatureFromK, unitLabel, type UnitSystem } from '@/lib/units';

export const SWEEP_STAGES = [1, 2, 3, 4, 5, 6] as const;

/** One stage count of the sweep; figures null where the engine refuses that count. */
export type SweepPoint = {
  stages: number;
  shaftPowerKw: number | null;
  maxDischargeT: number | null;
  refused: string | null;
};

export type SweepData = {
  points: SweepPoint[];
  limitT: number | null;
  temperatureUnit: string;
  selected: number;
  suggested: number | null;
};

/**
 * Shaft power and hottest discharge for 1 to 6 stages of the same duty. Runs the engine in the browser
 * (pure code, microseconds per sizing) on the already validated input.
 */
export function stageSweep(input: CompressorInput, system: UnitSystem): SweepData {
  const unit = SYSTEM_UNITS[system].temperature;
  const toT = (celsius: number) => temperatureFromK(celsius + 273.15, unit);
  let limitT: number | null = null;
  let suggested: number | null = null;
  const points = SWEEP_STAGES.map((n): SweepPoint => {
    try {
      const r = calculateCore({ ...input, stages: n });
      if (r.service !== 'compressor') throw new Error('expected a compressor result');
      const c = r.compressor;
      const method = headlineMethod(c);
      limitT = toT(c.dischargeTemperatureLimitC);
      suggested = c.suggestedStages;
      const hottest = Math.max(...method.stages.map((s) => s.dischargeTemperatureC));
      return { stages: n, shaftPowerKw: c.shaftPowerKw, maxDischargeT: toT(hottest), refused: null };
    } catch (err) {
      if (!(err instanceof SizingInputError)) throw err;
      return { stages: n, shaftPowerKw: null, maxDischargeT: null, refused: err.issues[0]?.message ?? 'refused' };
    }
  });
  return { points, limitT, temperatureUnit: unitLabel(unit), selected: input.stages, suggested };
}
