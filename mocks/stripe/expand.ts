import type { Json, JsonObject } from './wire-types';

/** Finds the object behind an id (by its prefix), or undefined when the fake does not hold it. */
export type ObjectResolver = (id: string) => JsonObject | undefined;

function expandAt(value: Json, segments: string[], resolve: ObjectResolver): Json {
  const [head, ...rest] = segments;
  if (head === undefined) return value;
  if (Array.isArray(value)) return value.map((item) => expandAt(item, segments, resolve));
  if (value === null || typeof value !== 'object') return value;
  const child = value[head];
  if (child === undefined) return value;
  const resolved = typeof child === 'string' ? (resolve(child) ?? child) : child;
  return { ...value, [head]: expandAt(resolved, rest, resolve) };
}

/**
 * Applies Stripe's `expand[]` paths (`subscription`, `data.product`, `subscription.latest_invoice`):
 * each id on the path is replaced by its object. Paths the fake cannot follow are left as ids.
 */
export function expandObject(object: JsonObject, paths: string[], resolve: ObjectResolver): JsonObject {
  let out: JsonObject = object;
  for (const path of paths) {
    const expanded = expandAt(out, path.split('.'), resolve);
    if (expanded !== null && typeof expanded === 'object' && !Array.isArray(expanded)) out = expanded;
  }
  return out;
}
