import type { UnitSystem } from '@/lib/units';
import { switchUnitValue, type ExactValue, type SwitchContext } from './convert';
import { barometricPaOf, flowContextOf } from './flow-context';
import { QUANTITY_FIELDS, type DeskValues, type QtyText, type QuantityPath } from './form-types';
import { systemUnitFor } from './unit-pickers';

/** The quantity at a dotted path of the form values. */
export function quantityAt(values: DeskValues, path: QuantityPath): QtyText {
  let node: unknown = values;
  for (const part of path.split('.')) node = (node as Record<string, unknown>)[part];
  return node as QtyText;
}

function withQuantity(values: DeskValues, path: QuantityPath, q: QtyText): DeskValues {
  const next = structuredClone(values);
  const parts = path.split('.');
  let node = next as unknown as Record<string, unknown>;
  for (const part of parts.slice(0, -1)) node = node[part] as Record<string, unknown>;
  node[parts[parts.length - 1]!] = q;
  return next;
}

/** The switching context the form states now: site pressure and the gas and inlet state for flows. */
export function switchContextOf(values: DeskValues): SwitchContext {
  return { barometricPressurePa: barometricPaOf(values), flow: flowContextOf(values) };
}

/**
 * Every quantity field in the other system's unit of the same family (kg/h <-> lb/h, Nm³/h <-> SCFM,
 * bar g <-> psig), keeping each physical value. Fields that cannot be converted keep their unit.
 */
export type ExactValues = Partial<Record<QuantityPath, ExactValue>>;

export function switchUnitSystem(
  values: DeskValues,
  system: UnitSystem,
  exact: ExactValues = {},
): { values: DeskValues; skipped: QuantityPath[]; exact: ExactValues } {
  const ctx = switchContextOf(values);
  let next = values;
  const skipped: QuantityPath[] = [];
  const nextExact: ExactValues = { ...exact };
  for (const [path, kind] of Object.entries(QUANTITY_FIELDS) as [
    QuantityPath,
    (typeof QUANTITY_FIELDS)[QuantityPath],
  ][]) {
    const q = quantityAt(values, path);
    const unit = systemUnitFor(kind, q.unit, system);
    const r = switchUnitValue(kind, q.value, q.unit, unit, ctx, exact[path]);
    if (!r.ok) {
      skipped.push(path);
      continue;
    }
    next = withQuantity(next, path, { value: r.value, unit });
    if (r.exact) nextExact[path] = r.exact;
  }
  return { values: next, skipped, exact: nextExact };
}
