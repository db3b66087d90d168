import * as z from 'zod/mini';
import '@/lib/validation/english-messages';
import { MAX_TEMPERATURE_K, MIN_TEMPERATURE_K } from '../thermo/constants';
import { temperatureFromK, temperatureToK } from '../units/temperature';
import { normalizeUnit } from '../units/unit-strings';

// Leaf fields are single z.transform nodes (type check, coercion and range in one step): about three
// times faster than z.union(...).transform(...) chains, which matters for batch validation. Their JSON
// Schema, which zod cannot derive from a transform, is recorded here for the OpenAPI document.
export const JSON_SCHEMA_HINTS = new WeakMap<object, Record<string, unknown>>();

function hint<T extends object>(schema: T, json: Record<string, unknown>): T {
  JSON_SCHEMA_HINTS.set(schema, json);
  return schema;
}

export type Bounds = {
  min?: number;
  max?: number;
  minExclusive?: boolean;
  integer?: boolean;
  /** Unit text for messages, e.g. "%" or "kW". */
  unit?: string;
  hint?: string;
};

const NUMERIC = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** Parses form text as a number; anything but a plain decimal (empty, hex, "Infinity") gives NaN. */
export function parseNumeric(text: string): number {
  const trimmed = text.trim();
  return NUMERIC.test(trimmed) ? Number(trimmed) : NaN;
}

/** "from 0 to 50 %", "above 0 and at most 1", "at least 1": the allowed range in words. */
export function describeRange(b: Bounds): string {
  const u = b.unit ? ` ${b.unit}` : '';
  const kind = b.integer ? 'a whole number ' : '';
  let text: string;
  if (b.min !== undefined && b.max !== undefined) {
    text = b.minExclusive ? `${kind}above ${b.min} and at most ${b.max}${u}` : `${kind}from ${b.min} to ${b.max}${u}`;
  } else if (b.min !== undefined) {
    text = `${kind}${b.minExclusive ? 'above' : 'at least'} ${b.min}${u}`;
  } else if (b.max !== undefined) {
    text = `${kind}at most ${b.max}${u}`;
  } else {
    text = `${kind}any finite number`;
  }
  return b.hint ? `${text}; ${b.hint}` : text;
}

function inBounds(v: number, b: Bounds): boolean {
  if (b.integer && !Number.isInteger(v)) return false;
  if (b.min !== undefined && (b.minExclusive ? !(v > b.min) : !(v >= b.min))) return false;
  if (b.max !== undefined && !(v <= b.max)) return false;
  return true;
}

type Issues = { issues: unknown[] };

function fail(ctx: Issues, message: string, input: unknown, path?: string[]): void {
  (ctx.issues as object[]).push(path ? { code: 'custom', message, input, path } : { code: 'custom', message, input });
}

/** Reads a number (or numeric form text) within bounds; pushes an issue and returns NaN otherwise. */
function readNumber(raw: unknown, b: Bounds, range: string, ctx: Issues, path?: string[]): number {
  const v = typeof raw === 'number' ? raw : typeof raw === 'string' ? parseNumeric(raw) : NaN;
  if (raw === undefined) fail(ctx, `required (allowed: ${range})`, raw, path);
  else if (typeof raw !== 'number' && typeof raw !== 'string')
    fail(ctx, `must be a number (allowed: ${range})`, raw, path);
  else if (typeof raw === 'string' && raw.trim() === '')
    fail(ctx, `is empty: give a number (allowed: ${range})`, raw, path);
  else if (typeof raw === 'string' && Number.isNaN(v))
    fail(ctx, `"${raw}" is not a number (allowed: ${range})`, raw, path);
  else if (!Number.isFinite(v)) fail(ctx, `must be a finite number (allowed: ${range})`, raw, path);
  else if (!inBounds(v, b)) fail(ctx, `${v} is out of range (allowed: ${range})`, raw, path);
  else return v;
  return NaN;
}

/** A number (or numeric string from a form) within bounds; NaN, Infinity and empty text are refused. */
export function numberField(b: Bounds = {}) {
  const range = describeRange(b);
  const schema = z.transform((raw: number | string, ctx) => {
    const v = readNumber(raw, b, range, ctx);
    return Number.isNaN(v) ? z.NEVER : v;
  });
  return hint(schema, {
    anyOf: [{ type: 'number' }, { type: 'string' }],
    description: `number or numeric text; ${range}`,
  });
}

type UnitCheck<T extends string> = { allowed: ReadonlySet<string>; list: string; kind: string; _t?: T };

function readUnit<T extends string>(raw: unknown, u: UnitCheck<T>, ctx: Issues, path?: string[]): T | undefined {
  if (raw === undefined) {
    fail(ctx, `required (allowed: ${u.list})`, raw, path);
    return undefined;
  }
  if (typeof raw !== 'string') {
    fail(ctx, `${u.kind} unit must be a string (allowed: ${u.list})`, raw, path);
    return undefined;
  }
  const unit = normalizeUnit(raw);
  if (u.allowed.has(unit)) return unit as T;
  fail(ctx, `unknown ${u.kind} unit "${raw}" (allowed: ${u.list})`, raw, path);
  return undefined;
}

function unitCheck<T extends string>(units: readonly T[], kind: string): UnitCheck<T> {
  return { allowed: new Set(units), list: units.join(', '), kind };
}

/** A unit string from `units` (aliases such as "Nm³/h" or "°C" accepted), returned in canonical form. */
export function unitField<const T extends string>(units: readonly T[], kind: string) {
  const check = unitCheck(units, kind);
  const schema = z.transform((raw: string, ctx): T => readUnit(raw, check, ctx) ?? z.NEVER);
  return hint(schema, {
    type: 'string',
    description: `one of: ${check.list} (superscript and degree-sign spellings accepted)`,
  });
}

export type Quantity<T extends string> = { value: number; unit: T };
type Extra<T extends string> = (q: Quantity<T>, ctx: Issues) => void;

/** A { value, unit } quantity, checked in one step; unknown keys are refused like everywhere else. */
export function quantityField<const T extends string>(
  units: readonly T[],
  kind: string,
  bounds: Bounds = {},
  extra?: Extra<T>,
) {
  const check = unitCheck(units, kind);
  const range = describeRange(bounds);
  const schema = z.transform((raw: { value: number | string; unit: string }, ctx): Quantity<T> => {
    if (raw === undefined) {
      fail(ctx, `required: an object { "value": number, "unit": string } (${kind} units: ${check.list})`, raw);
      return z.NEVER;
    }
    if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
      fail(ctx, `must be an object { "value": number, "unit": string } (${kind} units: ${check.list})`, raw);
      return z.NEVER;
    }
    const before = ctx.issues.length;
    for (const key in raw) {
      if (key !== 'value' && key !== 'unit')
        fail(ctx, 'unknown field; a quantity has only "value" and "unit"', raw, [key]);
    }
    const value = readNumber(raw.value, bounds, range, ctx, ['value']);
    const unit = readUnit(raw.unit, check, ctx, ['unit']);
    if (ctx.issues.length > before || unit === undefined) return z.NEVER;
    const q = { value, unit };
    extra?.(q, ctx);
    return ctx.issues.length > before ? z.NEVER : q;
  });
  return hint(schema, {
    type: 'object',
    required: ['value', 'unit'],
    additionalProperties: false,
    properties: {
      value: { anyOf: [{ type: 'number' }, { type: 'string' }], description: range },
      unit: { type: 'string', enum: [...units] },
    },
  });
}

function formatIn(temperatureK: number, unit: string): string {
  return `${Number(temperatureFromK(temperatureK, unit).toFixed(2))} ${unit}`;
}

/** A temperature quantity inside [minK, maxK] (default: the 200-6000 K property-data range). */
export function temperatureField<const T extends string>(
  units: readonly T[],
  minK = MIN_TEMPERATURE_K,
  maxK = MAX_TEMPERATURE_K,
  why = 'the range of the property data',
) {
  return quantityField(units, 'temperature', {}, (q, ctx) => {
    const k = temperatureToK(q.value, q.unit);
    if (k < 0) fail(ctx, `${q.value} ${q.unit} is below absolute zero`, q);
    else if (k < minK || k > maxK) {
      fail(
        ctx,
        `${q.value} ${q.unit} is outside ${why}: allowed ${formatIn(minK, q.unit)} to ${formatIn(maxK, q.unit)}`,
        q,
      );
    }
  });
}
