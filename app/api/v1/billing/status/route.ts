import { getEntitlement } from '@/lib/billing/entitlements';
import { requireUser } from '@/lib/auth/guards';
import { guarded } from '@/lib/http/guarded';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** The signed-in customer's entitlement; the billing page polls it while a payment is confirmed. */
export const GET = guarded(async () => {
  const user = await requireUser('billing:manage');
  if (!user.accountId)
    return Response.json({ errors: [{ path: '', message: 'No customer account.' }] }, { status: 404 });
  return Response.json(await getEntitlement(user.accountId), { headers: { 'Cache-Control': 'no-store' } });
});
