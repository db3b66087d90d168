import { parseNumeric } from '@/lib/engine/schema-fields';
import { UnitError, convertQuantity, type FlowContext, type QuantityKind } from '@/lib/units';
import type { FieldKind } from './form-types';

export type SwitchContext = { barometricPressurePa: number; flow: FlowContext | null };
/**
 * The unrounded number behind a converted field's text. Converting again from it (while the text is
 * unchanged) makes kg/h -> lb/h -> kg/h return exactly what was typed instead of accumulating rounding.
 */
export type ExactValue = { text: string; unit: string; value: number };
export type SwitchResult = { ok: true; value: string; exact: ExactValue | null } | { ok: false; reason: string };

const KIND: Readonly<Record<FieldKind, QuantityKind>> = {
  flow: 'flow',
  temperature: 'temperature',
  pressure: 'pressure',
  barometric: 'pressure',
};

/** Seven significant figures: a round trip through any two units returns the typed value. */
export function roundForField(value: number): string {
  const r = Number(value.toPrecision(7));
  return Object.is(r, -0) ? '0' : String(r);
}

/**
 * Re-expresses the typed value in another unit with the same physical value (gauge against the site
 * barometric pressure, volumetric flows through the gas and inlet state). Blank stays blank.
 */
export function switchUnitValue(
  kind: FieldKind,
  valueText: string,
  fromUnit: string,
  toUnit: string,
  ctx: SwitchContext,
  exact?: ExactValue | null,
): SwitchResult {
  if (fromUnit === toUnit || valueText.trim() === '') return { ok: true, value: valueText, exact: null };
  const value = exact && exact.text === valueText && exact.unit === fromUnit ? exact.value : parseNumeric(valueText);
  if (!Number.isFinite(value))
    return { ok: false, reason: 'enter a number before changing the unit, so it can be converted' };
  try {
    const converted = convertQuantity(KIND[kind], value, fromUnit, toUnit, {
      barometricPressurePa: ctx.barometricPressurePa,
      flow: ctx.flow ?? undefined,
    });
    if (!Number.isFinite(converted)) return { ok: false, reason: `${valueText} ${fromUnit} has no value in ${toUnit}` };
    const text = roundForField(converted);
    return { ok: true, value: text, exact: { text, unit: toUnit, value: converted } };
  } catch (err) {
    if (err instanceof UnitError) {
      return {
        ok: false,
        reason: 'converting between mass and volume flow needs a valid gas and inlet state; fix those first',
      };
    }
    throw err;
  }
}
