import type { Metadata } from 'next';
import Link from 'next/link';
import type { ReactNode } from 'react';
import { Logo } from '@/app/_components/logo';
import { formatDate } from '@/app/_components/format';
import { acceptInviteSchema } from '@/lib/accounts/schema';
import { roleLabels } from '@/lib/auth/roles';
import { clerkEnabled } from '@/lib/env';
import { getInvitationPreview } from '@/lib/users/invitation-preview';
import { AcceptInviteForm } from './_components/accept-invite-form';

export const metadata: Metadata = { title: 'Accept invitation' };
export const dynamic = 'force-dynamic';

function Unusable({ children }: { children: ReactNode }) {
  return (
    <div
      className="mt-6 rounded-panel border border-paper-line bg-paper-raised p-4 text-sm"
      data-testid="invite-unusable"
    >
      {children}
    </div>
  );
}

// Only an app path may follow joining (a quote the invitation came with); anything else lands on the desk.
function safeNext(next: string | string[] | undefined): string | undefined {
  return typeof next === 'string' && /^\/(quotes|sizings|datasheets)\/[\w-]+$/.test(next) ? next : undefined;
}

export default async function InvitePage({
  params,
  searchParams,
}: {
  params: Promise<{ token: string }>;
  searchParams: Promise<{ next?: string | string[] }>;
}) {
  const { token: raw } = await params;
  const next = safeNext((await searchParams).next);
  // Malformed tokens never reach the database; they read as any other dead link.
  const token = acceptInviteSchema.shape.token.safeParse(raw);
  const preview = token.success && !clerkEnabled ? await getInvitationPreview(token.data) : null;
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-6 py-12">
      <Link href="/" className="mb-8 flex items-center gap-2 text-xl font-semibold">
        <Logo /> Dutywise
      </Link>
      <h1 className="text-2xl font-semibold">
        {preview && !preview.accountName ? 'Join the Dutywise team' : 'Join a customer account'}
      </h1>
      {clerkEnabled ? (
        <Unusable>
          Invitations on this installation are accepted through the hosted sign-up. Ask the person who invited you for
          help.
        </Unusable>
      ) : preview && token.success ? (
        <>
          <p className="mt-2 text-sm text-ink-soft">
            {preview.accountName ? (
              <>
                You are invited to <strong>{preview.accountName}</strong> on Dutywise as{' '}
              </>
            ) : (
              <>
                You are invited to Dutywise as <strong>{roleLabels[preview.role]}</strong>, signing in as{' '}
              </>
            )}
            <span className="font-mono">{preview.email}</span>. The invitation is open until{' '}
            {formatDate(preview.expiresAt)}.
          </p>
          <AcceptInviteForm token={token.data} email={preview.email} next={next} />
        </>
      ) : (
        <Unusable>
          This invitation link is not valid any more: it may have been used already, have expired, or be incomplete. Ask
          the person who invited you for a new one, or{' '}
          <Link href="/sign-in" className="text-tide-600 underline">
            sign in
          </Link>{' '}
          if you already have a Dutywise sign-in.
        </Unusable>
      )}
    </main>
  );
}
