import { requireUser } from '@/lib/auth/guards';
import { getEntitlement } from '@/lib/billing/entitlements';
import { AppError } from '@/lib/errors';
import { defineHandler } from '@/lib/http/define-handler';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** The signed-in customer's entitlement; the billing page polls it while a payment is confirmed. */
export const GET = defineHandler(
  async () => {
    const user = await requireUser('billing:manage');
    if (!user.accountId) throw new AppError('not_found', 'No customer account.');
    return Response.json(await getEntitlement(user.accountId), { headers: { 'Cache-Control': 'no-store' } });
  },
  { name: 'billing.read_status' },
);
