import type { Metadata } from 'next';
import Link from 'next/link';
import { PageBody, PageHeader, Section } from '@/app/_components/page-header';
import { orNotFound, uuidOrNotFound } from '@/app/_components/route-guards';
import { requirePageUser } from '@/lib/auth/guards';
import { can, isStaff } from '@/lib/auth/roles';
import { downloadAccess } from '@/lib/datasheets/queries';
import { listEditionsOfReadQuote } from '@/lib/quotes/document/editions';
import { getQuote } from '@/lib/quotes/queries';
import type { QuoteStatus } from '@/db/schema/enums';
import { listSizings } from '@/lib/sizings/queries';
import { toSizingOption } from '../_components/sizing-option';
import { AddLineForm } from './_components/add-line-form';
import { BindPdfButton } from './_components/bind-pdf-button';
import { QuoteLines } from './_components/quote-lines';
import { QuotePdfEditions } from './_components/quote-pdf-editions';
import { QuoteSummary } from './_components/quote-summary';
import { SendQuoteButton } from './_components/send-quote-button';
import { StatusForm } from './_components/status-form';

export const metadata: Metadata = { title: 'Quote' };

export default async function QuotePage({ params }: { params: Promise<{ quoteId: string }> }) {
  const { quoteId: raw } = await params;
  const user = await requirePageUser(`/quotes/${raw}`, 'quote:read');
  const quoteId = uuidOrNotFound(raw);
  const quote = await orNotFound(getQuote(user, quoteId));
  const mayManage = can(user.role, 'quote:manage');
  const editable = mayManage && quote.status === 'draft';
  const [editions, access] = await Promise.all([listEditionsOfReadQuote(quote), downloadAccess(user)]);
  const onQuote = new Set(quote.lines.map((l) => l.sizingId));
  const addable = editable
    ? (await listSizings(user, { accountId: quote.accountId, limit: 500 }))
        .filter((s) => !onQuote.has(s.id))
        .map(toSizingOption)
    : [];

  return (
    <PageBody>
      <PageHeader
        eyebrow={
          <Link href="/quotes" className="underline">
            Quotes
          </Link>
        }
        title={quote.title}
        description={`Quote ${quote.number} for ${quote.accountName}`}
      />
      <Section title="Summary" id="summary">
        <QuoteSummary quote={quote} linkAccount={isStaff(user.role) || user.accountId === quote.accountId} />
      </Section>
      <Section title="Lines" id="lines">
        <QuoteLines quoteId={quote.id} lines={quote.lines} currency={quote.currency} editable={editable} />
        <p className="mt-3 text-hint text-ink-muted">
          Headlines come from preliminary sizings, each on the equation of state its record names. Confirm the design
          with a qualified engineer under the local codes before ordering.
        </p>
        {editable && (
          <div className="mt-4 border-t border-paper-line pt-4">
            <h3 className="mb-2 text-label uppercase tracking-wide text-ink-muted">Add a line</h3>
            <AddLineForm quoteId={quote.id} sizings={addable} />
          </div>
        )}
        {mayManage && !editable && (
          <p className="mt-3 text-sm text-ink-muted">
            Lines are fixed once a quote leaves draft. Mark it draft again to change them.
          </p>
        )}
      </Section>
      {(quote.status !== 'draft' || editions.length > 0) && (
        <Section title="Quote PDF" id="quote-pdf">
          <p className="mb-3 text-sm text-ink-soft">
            One PDF: a cover sheet with the lines and totals, then the current revision of each line&apos;s datasheet
            exactly as issued. A new edition is bound only when the quote or a datasheet revision has changed.
          </p>
          <QuotePdfEditions editions={editions} locked={!access.unlocked} />
          {mayManage && quote.status !== 'draft' && (
            <div className="mt-4 border-t border-paper-line pt-4">
              <BindPdfButton quoteId={quote.id} />
            </div>
          )}
        </Section>
      )}
      {mayManage && (
        <div className="grid gap-6 md:grid-cols-2">
          <Section title="Send to customer" id="send">
            {quote.status === 'won' || quote.status === 'lost' ? (
              <p className="text-sm text-ink-muted">This quote is closed ({quote.status}); it is not sent again.</p>
            ) : (
              <SendQuoteButton
                quoteId={quote.id}
                to={quote.billingContactEmail}
                alreadySent={quote.sentAt !== null}
                lineCount={quote.lines.length}
              />
            )}
          </Section>
          <Section title="Status" id="status">
            <StatusForm quoteId={quote.id} status={quote.status as QuoteStatus} />
          </Section>
        </div>
      )}
    </PageBody>
  );
}
