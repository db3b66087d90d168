import { headlineMethod, type CompressorResult } from '@/lib/engine';
import { SYSTEM_UNITS, temperatureFromK, unitLabel, type UnitSystem } from '@/lib/units';

export type StageBar = { label: string; stage: number; dischargeT: number; powerKw: number; overLimit: boolean };

export type StageChartData = { bars: StageBar[]; limitT: number; temperatureUnit: string; basis: string };

/** Per-stage discharge temperature (against the limit) and gas power, by the headline method. */
export function stageChart(r: CompressorResult, system: UnitSystem): StageChartData {
  const c = r.compressor;
  const unit = SYSTEM_UNITS[system].temperature;
  const toT = (celsius: number) => temperatureFromK(celsius + 273.15, unit);
  const method = headlineMethod(c);
  return {
    bars: method.stages.map((s) => ({
      label: `Stage ${s.stage}`,
      stage: s.stage,
      dischargeT: toT(s.dischargeTemperatureC),
      powerKw: s.gasPowerKw,
      overLimit: s.dischargeTemperatureC > c.dischargeTemperatureLimitC + 1e-9,
    })),
    limitT: toT(c.dischargeTemperatureLimitC),
    temperatureUnit: unitLabel(unit),
    basis: c.basis,
  };
}
