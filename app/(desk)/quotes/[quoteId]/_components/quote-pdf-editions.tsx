import type { QuoteEdition } from '@/lib/quotes/document/editions';
import { formatIssueDate } from '@/lib/datasheets/format';

type Props = { editions: QuoteEdition[]; locked: boolean };

const holds = (e: QuoteEdition) =>
  e.lines.map((l) =>
    l.datasheetNumber ? `${l.datasheetNumber} Rev. ${l.revision}` : `${l.sizingNumber}: no datasheet yet`,
  );

/** The stored editions of the quote PDF, newest first, each with what it holds and its download link. */
export function QuotePdfEditions({ editions, locked }: Props) {
  if (!editions.length) return <p className="text-sm text-ink-muted">No quote PDF has been bound yet.</p>;
  return (
    <ul className="divide-y divide-paper-line" data-testid="quote-pdf-editions">
      {editions.map((e, i) => (
        <li key={e.id} className="py-2 text-sm" data-testid="quote-pdf-edition">
          <a href={`/api/v1/quote-documents/${e.id}`} className="font-medium underline" download>
            Edition {e.edition} (PDF, {e.pageCount} pages)
          </a>
          {i === 0 && <span className="ml-2 text-ink-muted">current</span>}
          <span className="ml-2 text-ink-muted">
            bound {formatIssueDate(e.madeAt.toISOString())}
            {e.madeByName ? ` by ${e.madeByName}` : ''}
          </span>
          <p className="text-hint text-ink-muted">Holds the cover sheet and {holds(e).join(', ')}.</p>
        </li>
      ))}
      {locked && (
        <li className="py-2 text-sm text-ink-muted">
          Quote PDFs download with an active subscription; the link leads to the subscription page.
        </li>
      )}
    </ul>
  );
}
