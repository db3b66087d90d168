import type { Metadata } from 'next';
import { EmptyState } from '@/app/_components/empty-state';
import { formatDateTime } from '@/app/_components/format';
import { PageBody, PageHeader, Section } from '@/app/_components/page-header';
import { requirePageUser } from '@/lib/auth/guards';
import { readDemoInbox, type DemoInboxMessage } from '@/lib/email/demo-inbox';

export const metadata: Metadata = { title: 'Demo mail inbox' };
export const dynamic = 'force-dynamic';

function MessageItem({ m }: { m: DemoInboxMessage }) {
  return (
    <li className="border-t border-paper-line py-3 first:border-t-0" data-testid="mail-message">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="font-medium text-ink">{m.subject || '(no subject)'}</p>
        <p className="tabular text-hint text-ink-muted">{formatDateTime(m.receivedAt)}</p>
      </div>
      <p className="text-sm text-ink-soft">To {m.to.join(', ') || '(no recipient)'}</p>
      <details className="mt-1 text-sm">
        <summary className="cursor-pointer text-tide-600">Text of the message</summary>
        <pre className="mt-2 max-h-96 overflow-auto whitespace-pre-wrap rounded-panel bg-paper-sunk p-3 font-mono text-hint text-ink">
          {m.text ?? 'No text part.'}
        </pre>
        <a href={m.htmlUrl} target="_blank" rel="noreferrer" className="mt-1 inline-block text-tide-600 underline">
          Open as received (HTML)
        </a>
      </details>
    </li>
  );
}

// The demo's window on the local SMTP fake: what Dutywise would have delivered to people's mailboxes.
export default async function MailPage() {
  await requirePageUser('/mail', 'audit:read');
  const inbox = await readDemoInbox();
  return (
    <PageBody>
      <PageHeader
        title="Demo mail inbox"
        eyebrow="Local mail"
        description="Messages the local mail server has received from Dutywise, newest first. Nothing here reaches a real mailbox."
      />
      {inbox.state === 'unconfigured' && (
        <EmptyState title="No demo inbox is configured">
          MAIL_FAKE_INBOX_URL is not set, so mail goes to the SMTP server in the settings and there is nothing to show
          here.
        </EmptyState>
      )}
      {inbox.state === 'unreachable' && (
        <div
          role="status"
          className="rounded-panel border border-severity-caution/40 bg-paper-raised p-panel text-sm"
          data-testid="mail-inbox-down"
        >
          <p className="font-medium text-severity-caution">The demo mail server is not answering</p>
          <p className="mt-1 text-ink-soft">
            {inbox.url} could not be read ({inbox.reason}). Queued mail is kept and will be delivered once it is back;
            start it with <code>npm run fakes</code>.
          </p>
        </div>
      )}
      {inbox.state === 'ok' && (
        <Section title={`Received (${inbox.total})`} id="mail-received">
          {inbox.messages.length === 0 ? (
            <EmptyState title="No mail yet">
              Invite someone, send a quote or issue a datasheet, and the message appears here within a few seconds.
            </EmptyState>
          ) : (
            <ul>
              {inbox.messages.map((m) => (
                <MessageItem key={m.id} m={m} />
              ))}
            </ul>
          )}
          {inbox.total > inbox.messages.length && (
            <p className="mt-2 text-hint text-ink-muted">
              Showing the newest {inbox.messages.length} of {inbox.total}.
            </p>
          )}
        </Section>
      )}
    </PageBody>
  );
}
