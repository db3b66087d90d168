import { getEntitlement } from '@/lib/billing/entitlements';
import { AuthError, requireUser } from '@/lib/auth/guards';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** The signed-in customer's entitlement; the billing page polls it while a payment is confirmed. */
export async function GET() {
  try {
    const user = await requireUser('billing:manage');
    if (!user.accountId)
      return Response.json({ errors: [{ path: '', message: 'No customer account.' }] }, { status: 404 });
    return Response.json(await getEntitlement(user.accountId), { headers: { 'Cache-Control': 'no-store' } });
  } catch (err) {
    if (err instanceof AuthError)
      return Response.json({ errors: [{ path: '', message: err.message }] }, { status: err.status });
    throw err;
  }
}
