import type { SizingWarning } from '@/lib/engine';
import { formatIssueDate } from '@/lib/datasheets/format';
import { sortedWarnings } from '@/lib/datasheets/pdf/cautions-section';
import { formatHeadline } from '@/lib/sizings/headline';
import { lineFigures } from '../line-figures';
import { formatMoney, formatPriceTotal, priceCents, priceTotals } from '../prices';
import { quoteTotals } from '../totals';
import type { QuoteSource } from './source';

const STATUS_WORDS: Record<QuoteSource['status'], string> = { draft: 'Draft', sent: 'Sent', won: 'Won', lost: 'Lost' };
const UNIT_WORDS: Record<QuoteSource['unitSystem'], string> = {
  si: 'SI (kg/h, °C, kPa, bar)',
  us: 'US customary (lb/h, °F, psia/psig)',
};

/** What the cover sheet prints, every figure already a string in the account's units and currency. */
export type CoverModel = {
  title: string;
  reference: string;
  identity: [string, string][];
  priced: boolean;
  lines: string[][];
  basis: string[][];
  totals: [string, string][];
  cautions: { tag: string; warning: SizingWarning }[];
  appended: string[][];
};

const datasheetCell = (l: QuoteSource['lines'][number]) =>
  l.datasheet ? `${l.datasheet.number} Rev. ${l.datasheet.revision}` : 'None issued yet';

const tagOf = (l: QuoteSource['lines'][number], i: number) => l.equipmentTag ?? `Line ${i + 1}`;

/** The cover sheet of edition `edition`, bound at `boundAt`; `pageCounts` holds each appended datasheet's pages. */
export function coverModel(
  q: QuoteSource,
  edition: number,
  boundAt: Date,
  pageCounts: Map<string, number>,
): CoverModel {
  const priced = q.lines.some((l) => l.unitPrice !== null);
  const money = (cents: number | null) => (cents === null ? '—' : formatMoney(cents, q.currency));
  const lines = q.lines.map((l, i) => [
    String(i + 1),
    l.equipmentTag ?? '—',
    `${l.title} (${l.sizingNumber} v${l.sizingVersion})`,
    formatHeadline(l.service, l.headlineKw),
    datasheetCell(l),
    String(l.quantity),
    ...(priced
      ? [money(priceCents(l.unitPrice)), money(l.unitPrice === null ? null : priceCents(l.unitPrice)! * l.quantity)]
      : []),
  ]);
  const basis = q.lines.map((l, i) => [
    String(i + 1),
    l.gasLabel,
    lineFigures(l.service, l.headlineKw, l.result, q.unitSystem),
  ]);
  const kw = quoteTotals(q.lines);
  const totals: [string, string][] = (['heater', 'compressor'] as const)
    .filter((s) => kw[s].units > 0)
    .map((s) => [
      `${s === 'heater' ? 'Heaters' : 'Compressors'}, ${kw[s].units} ${kw[s].units === 1 ? 'unit' : 'units'}`,
      formatHeadline(s, kw[s].kw),
    ]);
  const price = formatPriceTotal(priceTotals(q.lines), q.currency);
  totals.push(['Quoted price', price ?? `Not priced on this quote (prices in ${q.currency})`]);
  const cautions = q.lines.flatMap((l, i) =>
    sortedWarnings(l.warnings)
      .filter((w) => w.severity === 'danger' || w.severity === 'warning')
      .map((warning) => ({ tag: tagOf(l, i), warning })),
  );
  const appended = q.lines
    .filter((l) => l.datasheet)
    .map((l) => [datasheetCell(l), tagOf(l, q.lines.indexOf(l)), String(pageCounts.get(l.datasheet!.id) ?? 0)]);
  return {
    title: q.title,
    reference: `${q.number}  Edition ${edition}`,
    identity: [
      ['Quote', q.number],
      ['Edition', String(edition)],
      ['Date', formatIssueDate(boundAt.toISOString())],
      ['Status', STATUS_WORDS[q.status]],
      ['Customer', q.accountName],
      ['Site', q.site ?? 'not stated'],
      ['Units', UNIT_WORDS[q.unitSystem]],
      ['Currency', q.currency],
    ],
    priced,
    lines,
    basis,
    totals,
    cautions,
    appended,
  };
}
