import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { db } from '@/db';
import { accounts, memberships, users } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import { hashPassword } from '@/lib/auth/local/passwords';
import { mayMail, sendVerification } from '@/lib/auth/local/verification';
import { enqueueEmail } from '@/lib/email/enqueue';
import { env } from '@/lib/env';
import { AppError } from '@/lib/errors';
import { accountsNamed } from './duplicates';

type SignUpInput = { name: string; email: string; password: string; company: string; site?: string; next?: string };

/** When the address already has a sign-in: a fresh confirmation link if it never confirmed, else a notice. */
async function answerExisting(existing: { id: string; email: string; name: string; verified: boolean }) {
  if (!(await mayMail(existing.email))) return;
  await db.transaction(async (tx) => {
    if (!existing.verified) return sendVerification(tx, existing);
    await enqueueEmail(tx, {
      template: 'account-exists',
      to: existing.email,
      entity: { type: 'user', id: existing.id },
      props: { signInUrl: `${env.APP_URL}/sign-in`, resetUrl: `${env.APP_URL}/forgot-password` },
    });
  });
}

/**
 * Self-serve sign-up: a customer user (unverified) and their own account in one transaction, and a confirmation
 * link by mail. The account's billing contact e-mail is set only when the address is confirmed. An address that
 * already has a sign-in gets a notice instead; the caller answers the same in both cases, and the password is
 * hashed in both, so neither the answer nor its timing tells which addresses exist.
 */
export async function signUpCustomer(input: SignUpInput): Promise<void> {
  const passwordHash = await hashPassword(input.password);
  const [existing] = await db
    .select({ id: users.id, email: users.email, name: users.name, verifiedAt: users.emailVerifiedAt })
    .from(users)
    .where(eq(sql`lower(${users.email})`, input.email.toLowerCase()))
    .limit(1);
  if (existing) return answerExisting({ ...existing, verified: Boolean(existing.verifiedAt) });
  if (!(await mayMail(input.email))) return;
  await db.transaction(async (tx) => {
    // One company, one account: a second sign-up for it would split its sizings and datasheets in two.
    if ((await accountsNamed(tx, input.company)).length)
      throw new AppError(
        'conflict',
        `${input.company} already has a Dutywise account. Ask a colleague there, or your sales engineer, to invite you to it.`,
        [{ path: 'company', message: 'This company already has an account; ask for an invitation to join it.' }],
      );
    const [u] = await tx
      .insert(users)
      .values({ email: input.email, name: input.name, role: 'customer', passwordHash })
      .onConflictDoNothing()
      .returning({ id: users.id });
    // Someone signed up with the same address a moment ago: the first one stands, as if it had existed before.
    if (!u) return;
    const [a] = await tx
      .insert(accounts)
      .values({ name: input.company, site: input.site, billingContactName: input.name, createdByUserId: u.id })
      .returning({ id: accounts.id });
    if (!a) throw new Error('account insert returned no row');
    await tx.insert(memberships).values({ accountId: a.id, userId: u.id });
    await writeAudit(tx, {
      actor: { id: u.id, role: 'customer' },
      action: 'account.signed_up',
      entityType: 'account',
      entityId: a.id,
      accountId: a.id,
      detail: { company: input.company },
    });
    await sendVerification(tx, { id: u.id, email: input.email, name: input.name }, input.next);
  });
}
