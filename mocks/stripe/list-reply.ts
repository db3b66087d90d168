import type { FormObject } from './form-body';
import { optionalInteger, optionalString } from './params';
import type { JsonObject } from './wire-types';

/** Stripe's list envelope with `limit` (1-100, default 10) and `starting_after` paging. */
export function listReply(items: JsonObject[], body: FormObject, url: string): JsonObject {
  const limit = optionalInteger(body, 'limit', 1, 100) ?? 10;
  const after = optionalString(body, 'starting_after', 200);
  const start = after ? items.findIndex((item) => item.id === after) + 1 : 0;
  const page = items.slice(start, start + limit);
  return { object: 'list', data: page, has_more: start + limit < items.length, url };
}
