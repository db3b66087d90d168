import 'server-only';
import { recordAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';

/** Look-ups change nothing but are still recorded: who searched or opened what, and when. */
export async function auditLookup(
  user: CurrentUser,
  action: string,
  entityType: string,
  entityId: string,
  detail: Record<string, unknown>,
  accountId?: string | null,
) {
  await recordAudit({ actor: user, action, entityType, entityId, accountId, detail });
}
