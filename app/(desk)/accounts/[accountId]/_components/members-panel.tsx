import { EmptyState } from '@/app/_components/empty-state';
import { formatDate } from '@/app/_components/format';
import type { AccountDetail } from '@/lib/accounts/queries';
import { InviteForm } from './invite-form';

/** Who can sign in to this customer account, who has been invited, and the invite form. */
export function MembersPanel({ account, mayInvite }: { account: AccountDetail; mayInvite: boolean }) {
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <div>
        <h3 className="text-label uppercase tracking-wide text-ink-muted">Members</h3>
        {account.members.length ? (
          <ul className="mt-2 divide-y divide-paper-line text-sm" data-testid="account-members">
            {account.members.map((m) => (
              <li key={m.id} className="flex flex-wrap justify-between gap-2 py-2">
                <span className="font-medium">{m.name}</span>
                <span className="font-mono text-ink-soft">{m.email}</span>
              </li>
            ))}
          </ul>
        ) : (
          <div className="mt-2">
            <EmptyState title="No members yet">
              Invite the customer’s engineers so they can see their quotes and sizings.
            </EmptyState>
          </div>
        )}
        <h3 className="mt-6 text-label uppercase tracking-wide text-ink-muted">Pending invitations</h3>
        {account.pendingInvitations.length ? (
          <ul className="mt-2 divide-y divide-paper-line text-sm" data-testid="pending-invitations">
            {account.pendingInvitations.map((i) => (
              <li key={i.id} className="flex flex-wrap justify-between gap-2 py-2">
                <span className="font-mono">{i.email}</span>
                <span className="tabular text-ink-muted">expires {formatDate(i.expiresAt)}</span>
              </li>
            ))}
          </ul>
        ) : (
          <p className="mt-2 text-sm text-ink-muted">None open.</p>
        )}
      </div>
      {mayInvite && (
        <div>
          <h3 className="text-label uppercase tracking-wide text-ink-muted">Invite by e-mail</h3>
          <InviteForm accountId={account.id} />
        </div>
      )}
    </div>
  );
}
