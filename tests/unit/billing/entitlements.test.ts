import { describe, expect, it, vi } from 'vitest';

vi.mock('@/db', () => ({ db: {} }));
const { entitlementFrom } = await import('@/lib/billing/entitlements');

const now = new Date('2026-06-15T12:00:00Z');
const day = 86_400_000;
const sub = (
  over: Partial<{
    status: string;
    currentPeriodEnd: Date | null;
    cancelAtPeriodEnd: boolean;
    pastDueSince: Date | null;
  }>,
) => ({
  status: 'active',
  currentPeriodEnd: new Date(now.getTime() + 10 * day),
  cancelAtPeriodEnd: false,
  pastDueSince: null,
  ...over,
});

describe('entitlements derive from stored status and period end', () => {
  it('no subscription locks', () =>
    expect(entitlementFrom(null, now, 7)).toMatchObject({ unlocked: false, reason: 'none' }));
  it('active and trialing unlock', () => {
    expect(entitlementFrom(sub({}), now, 7).unlocked).toBe(true);
    expect(entitlementFrom(sub({ status: 'trialing' }), now, 7).unlocked).toBe(true);
  });
  it('past due keeps access for the grace period counted from the first failure, then locks', () => {
    expect(
      entitlementFrom(sub({ status: 'past_due', pastDueSince: new Date(now.getTime() - 6 * day) }), now, 7),
    ).toMatchObject({ unlocked: true, reason: 'grace' });
    expect(
      entitlementFrom(sub({ status: 'past_due', pastDueSince: new Date(now.getTime() - 8 * day) }), now, 7),
    ).toMatchObject({ unlocked: false, reason: 'lapsed' });
  });
  it('cancel at period end keeps access until the period ends, even if the final event is late', () => {
    expect(entitlementFrom(sub({ cancelAtPeriodEnd: true }), now, 7)).toMatchObject({
      unlocked: true,
      reason: 'period-remaining',
    });
    expect(
      entitlementFrom(sub({ cancelAtPeriodEnd: true, currentPeriodEnd: new Date(now.getTime() - 1) }), now, 7).unlocked,
    ).toBe(false);
  });
  it('cancelled, unpaid and incomplete subscriptions lock', () => {
    for (const status of ['canceled', 'unpaid', 'incomplete', 'incomplete_expired', 'paused'])
      expect(entitlementFrom(sub({ status }), now, 7).unlocked).toBe(false);
  });
});
