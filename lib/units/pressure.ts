import { PA_PER_BAR, PA_PER_KPA, PA_PER_MPA, PA_PER_PSI } from './factors';
import { UnitError } from './unit-error';
import type { PressureUnit } from './unit-strings';

/** Standard atmosphere, Pa [pub: ISO 2533; 1 atm exact, NIST SP 811]: the default site barometric pressure. */
export const STANDARD_ATMOSPHERE_PA = 101_325;

type PressureMap = { readonly factor: number; readonly gauge: boolean };

const PRESSURE_MAPS: Readonly<Record<PressureUnit, PressureMap>> = {
  Pa: { factor: 1, gauge: false },
  kPa: { factor: PA_PER_KPA, gauge: false },
  MPa: { factor: PA_PER_MPA, gauge: false },
  bar: { factor: PA_PER_BAR, gauge: false },
  psia: { factor: PA_PER_PSI, gauge: false },
  kPag: { factor: PA_PER_KPA, gauge: true },
  barg: { factor: PA_PER_BAR, gauge: true },
  psig: { factor: PA_PER_PSI, gauge: true },
};

function mapOf(unit: string): PressureMap {
  const map = PRESSURE_MAPS[unit as PressureUnit];
  if (!map) throw new UnitError(`unknown pressure unit "${unit}"`);
  return map;
}

/** True for kPag, barg and psig. */
export function isGaugePressureUnit(unit: string): boolean {
  return mapOf(unit).gauge;
}

/** Absolute pressure, Pa. Gauge units are read relative to `barometricPressurePa` (site pressure). */
export function pressureToPa(value: number, unit: string, barometricPressurePa = STANDARD_ATMOSPHERE_PA): number {
  const map = mapOf(unit);
  return map.gauge ? value * map.factor + barometricPressurePa : value * map.factor;
}

/** An absolute pressure in Pa expressed in any pressure unit (gauge relative to the site pressure). */
export function pressureFromPa(
  pressurePa: number,
  unit: string,
  barometricPressurePa = STANDARD_ATMOSPHERE_PA,
): number {
  const map = mapOf(unit);
  return (map.gauge ? pressurePa - barometricPressurePa : pressurePa) / map.factor;
}
