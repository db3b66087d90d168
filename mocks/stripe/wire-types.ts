/** JSON as it crosses the wire. */
export type Json = string | number | boolean | null | Json[] | { [key: string]: Json };
export type JsonObject = { [key: string]: Json };

/**
 * A Stripe SDK type with every field optional: renderers are checked against the SDK's own
 * shapes for each field they emit, without having to fill the hundreds the app never reads.
 */
export type WireShape<T> = T extends string | number | boolean | null | undefined
  ? T
  : T extends (infer U)[]
    ? WireShape<U>[]
    : T extends object
      ? { [K in keyof T]?: WireShape<T[K]> }
      : T;

/** Deep copy into plain JSON, so an event keeps the object as it was when the event happened. */
export function toJson(value: unknown): JsonObject {
  return JSON.parse(JSON.stringify(value)) as JsonObject;
}
