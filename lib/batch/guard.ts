import 'server-only';
import type { CurrentUser } from '@/lib/auth/current-user';
import { assertSubscribed } from '@/lib/billing/entitlements';
import { enforce } from '@/lib/ratelimit/limit';

/**
 * Before a batch request is read: customers need an active subscription, and every account (each staff member
 * counts as their own) has an hourly budget of batch checks and saves.
 */
export async function admitBatch(user: CurrentUser): Promise<void> {
  await assertSubscribed(user, 'Batch upload');
  await enforce('batch uploads', ['batch.account', user.accountId ?? `user:${user.id}`]);
}
