import { heaterRequestSchema } from '@/lib/engine/schema';
import { parseNumeric } from '@/lib/engine/schema-fields';
import {
  MAX_TEMPERATURE_K,
  MIN_TEMPERATURE_K,
  checkComposition,
  findPreset,
  humidAirGas,
  mixtureGas,
  presetGas,
} from '@/lib/thermo';
import { STANDARD_ATMOSPHERE_PA, pressureToPa, temperatureToK, type FlowContext } from '@/lib/units';
import type { DeskValues, QtyText } from './form-types';
import { toRequest } from './to-request';

function numberOf(q: QtyText): number {
  return parseNumeric(q.value);
}

/** Site barometric pressure, Pa absolute, as the form states it (the standard atmosphere while it is not a number). */
export function barometricPaOf(values: DeskValues): number {
  const q = values.site.barometricPressure;
  const n = numberOf(q);
  if (!Number.isFinite(n)) return STANDARD_ATMOSPHERE_PA;
  try {
    return pressureToPa(n, q.unit);
  } catch {
    return STANDARD_ATMOSPHERE_PA;
  }
}

function molarMassOf(values: DeskValues, temperatureK: number, pressurePa: number): number | null {
  const g = toRequest(values).gas;
  // Reuse the engine's checks on the gas alone; the rest of the form may still be half typed.
  const gas = heaterRequestSchema.shape.gas.safeParse(g);
  if (!gas.success) return null;
  const v = gas.data;
  if (v.components) {
    const check = checkComposition(v.components, v.basis ?? 'mole');
    return check.ok ? mixtureGas(check.moleFractions).molarMassKgPerKmol : null;
  }
  const preset = findPreset(v.preset ?? '');
  if (!preset) return null;
  if (preset.moleFractions) return presetGas(preset.id)?.molarMassKgPerKmol ?? null;
  const spec = v.dewPoint
    ? { dewPointK: temperatureToK(v.dewPoint.value, v.dewPoint.unit) }
    : { relativeHumidityPercent: v.relativeHumidityPercent ?? 0 };
  const humid = humidAirGas(spec, temperatureK, pressurePa);
  return humid.ok ? humid.gas.molarMassKgPerKmol : null;
}

/** Gas and inlet state a volumetric flow converts with, or null while any of them is not valid. */
export function flowContextOf(values: DeskValues): FlowContext | null {
  const t = numberOf(values.inlet.temperature);
  const p = numberOf(values.inlet.pressure);
  if (!Number.isFinite(t) || !Number.isFinite(p)) return null;
  try {
    const temperatureK = temperatureToK(t, values.inlet.temperature.unit);
    const pressurePa = pressureToPa(p, values.inlet.pressure.unit, barometricPaOf(values));
    if (!(temperatureK >= MIN_TEMPERATURE_K && temperatureK <= MAX_TEMPERATURE_K && pressurePa > 0)) return null;
    const molarMassKgPerKmol = molarMassOf(values, temperatureK, pressurePa);
    return molarMassKgPerKmol === null ? null : { molarMassKgPerKmol, temperatureK, pressurePa };
  } catch {
    return null;
  }
}
