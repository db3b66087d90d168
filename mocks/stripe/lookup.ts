import { noSuch } from './api-error';
import type { FakeContext } from './context';
import { nowSeconds } from './ids';
import type { SessionRecord, SubscriptionRecord } from './records';

export function requireSubscription(ctx: FakeContext, id: string): SubscriptionRecord {
  const sub = ctx.store.state.subscriptions[id];
  if (!sub) throw noSuch('subscription', id);
  return sub;
}

/** The session, marked expired once its expiry has passed unpaid. */
export function requireSession(ctx: FakeContext, id: string): SessionRecord {
  const session = ctx.store.state.sessions[id];
  if (!session) throw noSuch('checkout.session', id);
  if (session.status === 'open' && session.expiresAt < nowSeconds()) {
    session.status = 'expired';
    ctx.store.save();
  }
  return session;
}
