import type { MoleFractions } from './composition';
import { ZERO_CELSIUS_K } from './constants';
import { DRY_AIR_MOLE_FRACTIONS } from './dry-air';
import { ASHRAE_MAX_TEMPERATURE_K, ASHRAE_MIN_TEMPERATURE_K, saturationPressureAshraePa } from './water-saturation';

export type HumiditySpec = { relativeHumidityPercent: number } | { dewPointK: number };

export type HumidAirState =
  | { ok: true; waterMoleFraction: number; vapourPressurePa: number; moleFractions: MoleFractions }
  | { ok: false; field: 'relativeHumidityPercent' | 'dewPoint' | 'temperature'; message: string };

const RANGE_TEXT = '-100 to 200 °C (range of the ASHRAE saturation-pressure formulation)';

function inAshraeRange(temperatureK: number): boolean {
  return temperatureK >= ASHRAE_MIN_TEMPERATURE_K && temperatureK <= ASHRAE_MAX_TEMPERATURE_K;
}

/**
 * Humid air at the given state: vapour partial pressure from relative humidity (p_w = RH p_ws(T), the
 * ASHRAE definition, no enhancement factor) or from the dew point (p_w = p_ws(T_dp)); x_w = p_w / p,
 * and dry air takes the remainder in its standard proportions [pub: ASHRAE Handbook Fundamentals 2017, ch. 1].
 */
export function humidAirAt(spec: HumiditySpec, temperatureK: number, pressurePa: number): HumidAirState {
  let vapourPressurePa: number;
  if ('relativeHumidityPercent' in spec) {
    if (!inAshraeRange(temperatureK)) {
      return {
        ok: false,
        field: 'temperature',
        message: `humid air by relative humidity needs an inlet temperature of ${RANGE_TEXT}`,
      };
    }
    vapourPressurePa = (spec.relativeHumidityPercent / 100) * saturationPressureAshraePa(temperatureK);
    if (vapourPressurePa >= pressurePa) {
      const maxPercent = (100 * pressurePa) / saturationPressureAshraePa(temperatureK);
      return {
        ok: false,
        field: 'relativeHumidityPercent',
        message: `water vapour would exceed the total pressure; at this inlet state relative humidity must be below ${maxPercent.toFixed(1)} %`,
      };
    }
  } else {
    if (!inAshraeRange(spec.dewPointK)) {
      return { ok: false, field: 'dewPoint', message: `dew point must be within ${RANGE_TEXT}` };
    }
    if (spec.dewPointK > temperatureK + 1e-9) {
      const inletC = (temperatureK - ZERO_CELSIUS_K).toFixed(2);
      return {
        ok: false,
        field: 'dewPoint',
        message: `dew point must not be above the inlet temperature (${inletC} °C)`,
      };
    }
    vapourPressurePa = saturationPressureAshraePa(spec.dewPointK);
    if (vapourPressurePa >= pressurePa) {
      return {
        ok: false,
        field: 'dewPoint',
        message: 'water vapour pressure at this dew point exceeds the inlet pressure',
      };
    }
  }
  const xw = vapourPressurePa / pressurePa;
  const moleFractions: MoleFractions = {};
  for (const [id, x] of Object.entries(DRY_AIR_MOLE_FRACTIONS) as [keyof MoleFractions, number][]) {
    moleFractions[id] = x * (1 - xw);
  }
  if (xw > 0) moleFractions.H2O = xw;
  return { ok: true, waterMoleFraction: xw, vapourPressurePa, moleFractions };
}
