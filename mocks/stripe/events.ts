import { newId, nowSeconds } from './ids';
import type { EventRecord } from './records';
import type { StateStore } from './state-store';
import { type JsonObject, toJson } from './wire-types';
import type { WebhookSender } from './webhook-sender';

/** What emitting an event needs: where it is recorded and who delivers it. */
export type EventSink = { store: StateStore; sender: WebhookSender; apiVersion: string };

/** Records an event with a snapshot of the object as it is now, and queues its delivery. */
export function emitEvent(
  sink: EventSink,
  type: string,
  object: unknown,
  previousAttributes?: JsonObject,
): EventRecord {
  const event: EventRecord = {
    id: newId('evt'),
    type,
    created: nowSeconds(),
    apiVersion: sink.apiVersion,
    object: toJson(object),
    previousAttributes: previousAttributes ?? null,
    delivery: {
      status: 'pending',
      attempts: 0,
      lastStatusCode: null,
      lastError: null,
      lastAttemptAt: null,
      deliveredAt: null,
    },
  };
  sink.store.state.events.push(event);
  sink.store.save();
  sink.sender.enqueue(event.id);
  return event;
}

/** The event as Stripe sends it (and as `stripe.events.retrieve` returns it). */
export function renderEvent(event: EventRecord): JsonObject {
  const data: JsonObject = { object: event.object };
  if (event.previousAttributes) data.previous_attributes = event.previousAttributes;
  return {
    id: event.id,
    object: 'event',
    api_version: event.apiVersion,
    created: event.created,
    data,
    livemode: false,
    pending_webhooks: event.delivery.status === 'delivered' ? 0 : 1,
    request: { id: null, idempotency_key: null },
    type: event.type,
  };
}

/** The changed top-level fields with their old values, for `data.previous_attributes`. */
export function previousAttributes(before: JsonObject, after: JsonObject): JsonObject {
  const changed: JsonObject = {};
  for (const [key, value] of Object.entries(before)) {
    if (JSON.stringify(value) !== JSON.stringify(after[key])) changed[key] = value;
  }
  return changed;
}
