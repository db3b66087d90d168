import { KELVIN_MAPS } from './factors';
import { UnitError } from './unit-error';
import type { TemperatureUnit } from './unit-strings';

// Imports used per call, re-bound to module constants once: under tsx's CommonJS output every use of an
// imported binding is a getter call, which shows on these hot paths (tests/bench/engine.bench.mts).
const MAPS = KELVIN_MAPS;

function mapOf(unit: string): { slope: number; offset: number } {
  const map = MAPS[unit as TemperatureUnit];
  if (!map) throw new UnitError(`unknown temperature unit "${unit}"`);
  return map;
}

/** Temperature in kelvin from a value in degC, degF, K or degR. */
export function temperatureToK(value: number, unit: string): number {
  const map = mapOf(unit);
  return map.slope * value + map.offset;
}

/** A temperature in kelvin expressed in degC, degF, K or degR. */
export function temperatureFromK(temperatureK: number, unit: string): number {
  const map = mapOf(unit);
  return (temperatureK - map.offset) / map.slope;
}
