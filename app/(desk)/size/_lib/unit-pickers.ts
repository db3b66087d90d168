import {
  ABSOLUTE_PRESSURE_UNITS,
  ACTUAL_FLOW_UNITS,
  GAUGE_PRESSURE_UNITS,
  MASS_FLOW_UNITS,
  STANDARD_FLOW_UNITS,
  SYSTEM_UNITS,
  TEMPERATURE_UNITS,
  isUnitOf,
  type UnitFamily,
  type UnitSystem,
} from '@/lib/units';
import type { FieldKind } from './form-types';

// The desk's unit pickers: which units each kind of quantity field offers, and where a switch of system takes them.

export type UnitGroup = { label: string; units: readonly string[] };

/** The options of each kind of unit picker, grouped so gauge and absolute are never confused. */
export const UNIT_GROUPS: Readonly<Record<FieldKind, readonly UnitGroup[]>> = {
  flow: [
    { label: 'Mass flow', units: MASS_FLOW_UNITS },
    { label: 'Standard volume', units: STANDARD_FLOW_UNITS },
    { label: 'Actual volume at inlet', units: ACTUAL_FLOW_UNITS },
  ],
  temperature: [{ label: 'Temperature', units: TEMPERATURE_UNITS }],
  pressure: [
    { label: 'Gauge (above site barometric)', units: GAUGE_PRESSURE_UNITS },
    { label: 'Absolute', units: ABSOLUTE_PRESSURE_UNITS.filter((u) => u !== 'Pa') },
  ],
  barometric: [{ label: 'Absolute', units: ['kPa', 'bar', 'psia'] }],
};

/** The family of a unit in a picker of `kind`. */
export function unitFamily(kind: FieldKind, unit: string): UnitFamily {
  if (kind === 'temperature') return 'temperature';
  if (kind === 'barometric') return 'barometric';
  if (kind === 'pressure') return isUnitOf(GAUGE_PRESSURE_UNITS, unit) ? 'gaugePressure' : 'absolutePressure';
  if (isUnitOf(STANDARD_FLOW_UNITS, unit)) return 'standardFlow';
  if (isUnitOf(ACTUAL_FLOW_UNITS, unit)) return 'actualFlow';
  return 'massFlow';
}

/** The unit a field of `kind` now in `unit` takes when the whole desk switches to `system`. */
export function systemUnitFor(kind: FieldKind, unit: string, system: UnitSystem): string {
  return SYSTEM_UNITS[system][unitFamily(kind, unit)];
}
