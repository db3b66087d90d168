import type { HeaterResult } from '@/lib/engine';
import { MIN_TEMPERATURE_K, cpMass, mixtureGas } from '@/lib/thermo';
import { J_PER_KG_K_PER_BTU_PER_LB_F, SYSTEM_UNITS, temperatureFromK, unitLabel, type UnitSystem } from '@/lib/units';

/**
 * Temperature span the mean-temperature cp shortcut is trusted over [cp]: across 300 -> 500 K it stays within
 * 0.5 % of the integrated duty for air, O2, CO2, methane and propane [calc from NASA polynomials].
 */
export const AVERAGE_CP_SPAN_K = 200;

export type CpPoint = { t: number; cp: number };

export type HeaterCpChartData = {
  points: CpPoint[];
  temperatureUnit: string;
  cpUnit: string;
  inletT: number;
  outletT: number;
  meanT: number;
  /** cp at the mean temperature (the hand-check shortcut). */
  meanCp: number;
  /** Δh/ΔT: the cp that reproduces the integrated duty exactly. */
  integratedCp: number;
  /** The 200 K span centred on the mean temperature. */
  band: { from: number; to: number };
  riseK: number;
  beyondBand: boolean;
};

/** cp across the heater's temperature range (and the 200 K band about its mean), in the system's units. */
export function heaterCpChart(r: HeaterResult, system: UnitSystem, samples = 48): HeaterCpChartData {
  const h = r.heater;
  const gas = mixtureGas(r.gas.moleFractions, r.gas.label);
  const tUnit = SYSTEM_UNITS[system].temperature;
  const toT = (k: number) => temperatureFromK(k, tUnit);
  const toCp = (j: number) => (system === 'us' ? j / J_PER_KG_K_PER_BTU_PER_LB_F : j / 1000);
  const inK = h.inletTemperatureC + 273.15;
  const outK = h.outletTemperatureC + 273.15;
  const meanK = 0.5 * (inK + outK);
  const lo = Math.max(MIN_TEMPERATURE_K, Math.min(inK, meanK - AVERAGE_CP_SPAN_K / 2));
  const hi = Math.max(outK, meanK + AVERAGE_CP_SPAN_K / 2);
  const points: CpPoint[] = [];
  for (let i = 0; i <= samples; i++) {
    const k = lo + ((hi - lo) * i) / samples;
    points.push({ t: toT(k), cp: toCp(cpMass(gas, k)) });
  }
  const integrated = (h.absorbedDutyKw * 1000) / (r.massFlowKgPerS * h.temperatureRiseK);
  return {
    points,
    temperatureUnit: unitLabel(tUnit),
    cpUnit: system === 'us' ? 'Btu/(lb·°F)' : 'kJ/(kg·K)',
    inletT: toT(inK),
    outletT: toT(outK),
    meanT: toT(meanK),
    meanCp: toCp(h.cpMeanJPerKgK),
    integratedCp: toCp(integrated),
    band: {
      from: toT(Math.max(MIN_TEMPERATURE_K, meanK - AVERAGE_CP_SPAN_K / 2)),
      to: toT(meanK + AVERAGE_CP_SPAN_K / 2),
    },
    riseK: h.temperatureRiseK,
    beyondBand: Math.abs(h.temperatureRiseK) > AVERAGE_CP_SPAN_K,
  };
}
