import Stripe from 'stripe';
import type { EventRecord } from './records';
import type { JsonObject } from './wire-types';

export type WebhookSenderOptions = {
  url: string;
  secret: string;
  /** Delay before each retry; the attempt count is this list's length plus one. */
  retryDelaysMs: readonly number[];
  timeoutMs: number;
  findEvent: (id: string) => EventRecord | undefined;
  renderEvent: (event: EventRecord) => JsonObject;
  /** Called after every attempt so the caller can persist delivery status. */
  onAttempt: (event: EventRecord) => void;
  log: (line: string) => void;
};

type QueueItem = { eventId: string; readyAt: number; roundAttempts: number };

/**
 * Sends events one at a time, signed the way Stripe signs them. A failed event waits for its
 * retry while later events go ahead, so like the real service the order is not guaranteed.
 */
export class WebhookSender {
  private queue: QueueItem[] = [];
  private busy = false;
  private closed = false;
  private timer: NodeJS.Timeout | null = null;
  private readonly abort = new AbortController();
  private readonly listeners = new Set<() => void>();

  constructor(private readonly options: WebhookSenderOptions) {}

  enqueue(eventId: string): void {
    if (this.closed) return;
    this.queue.push({ eventId, readyAt: Date.now(), roundAttempts: 0 });
    this.pump();
  }

  /** Resolves once every listed event has had at least one attempt, or after `timeoutMs`. */
  async waitForAttempts(eventIds: string[], timeoutMs: number): Promise<void> {
    const done = () => eventIds.every((id) => (this.options.findEvent(id)?.delivery.attempts ?? 1) > 0);
    await this.waitFor(done, timeoutMs);
  }

  /** Resolves when nothing is queued or in flight (retries included), or after `timeoutMs`. */
  async idle(timeoutMs: number): Promise<boolean> {
    return this.waitFor(() => !this.busy && this.queue.length === 0, timeoutMs);
  }

  /** Drops everything queued (after a reset); an attempt already in flight still finishes. */
  clear(): void {
    this.queue = [];
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    this.notify();
  }

  close(): void {
    this.closed = true;
    if (this.timer) clearTimeout(this.timer);
    this.queue = [];
    this.abort.abort();
    for (const listener of this.listeners) listener();
  }

  private waitFor(condition: () => boolean, timeoutMs: number): Promise<boolean> {
    if (condition()) return Promise.resolve(true);
    return new Promise((resolve) => {
      const check = () => {
        if (!condition() && !this.closed) return;
        clearTimeout(timeout);
        this.listeners.delete(check);
        resolve(condition());
      };
      const timeout = setTimeout(() => {
        this.listeners.delete(check);
        resolve(condition());
      }, timeoutMs);
      this.listeners.add(check);
    });
  }

  private notify(): void {
    for (const listener of [...this.listeners]) listener();
  }

  private pump(): void {
    if (this.busy || this.closed) return;
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    const now = Date.now();
    const index = this.queue.findIndex((item) => item.readyAt <= now);
    if (index === -1) {
      if (this.queue.length > 0) {
        const next = Math.min(...this.queue.map((item) => item.readyAt));
        this.timer = setTimeout(() => this.pump(), Math.max(0, next - now));
      }
      this.notify();
      return;
    }
    const [item] = this.queue.splice(index, 1);
    if (!item) return;
    this.busy = true;
    void this.attempt(item).finally(() => {
      this.busy = false;
      this.notify();
      this.pump();
    });
  }

  private async attempt(item: QueueItem): Promise<void> {
    const event = this.options.findEvent(item.eventId);
    if (!event) return;
    const payload = JSON.stringify(this.options.renderEvent(event), null, 2);
    const header = Stripe.webhooks.generateTestHeaderString({ payload, secret: this.options.secret });
    let statusCode: number | null = null;
    let error: string | null = null;
    try {
      const response = await fetch(this.options.url, {
        method: 'POST',
        headers: {
          'content-type': 'application/json; charset=utf-8',
          'stripe-signature': header,
          'user-agent': 'DutywiseStripeFake/1.0',
        },
        body: payload,
        signal: AbortSignal.any([this.abort.signal, AbortSignal.timeout(this.options.timeoutMs)]),
      });
      statusCode = response.status;
      await response.arrayBuffer();
      if (!response.ok) error = `HTTP ${response.status}`;
    } catch (caught) {
      if (this.closed) return;
      error = (caught as Error).cause ? String((caught as Error).cause) : (caught as Error).message;
    }
    item.roundAttempts += 1;
    const delivery = event.delivery;
    delivery.attempts += 1;
    delivery.lastAttemptAt = Math.floor(Date.now() / 1000);
    delivery.lastStatusCode = statusCode;
    delivery.lastError = error;
    const delay = this.options.retryDelaysMs[item.roundAttempts - 1];
    if (error === null) {
      delivery.status = 'delivered';
      delivery.deliveredAt = delivery.lastAttemptAt;
    } else if (delay !== undefined) {
      delivery.status = 'pending';
      this.queue.push({ ...item, readyAt: Date.now() + delay });
      this.options.log(`webhook ${event.type} ${event.id} failed (${error}); retry in ${delay} ms`);
    } else {
      delivery.status = 'failed';
      this.options.log(`webhook ${event.type} ${event.id} failed after ${item.roundAttempts} attempts (${error})`);
    }
    this.options.onAttempt(event);
  }
}
