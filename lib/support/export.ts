import 'server-only';
import type { CurrentUser } from '@/lib/auth/current-user';
import { toCsv } from '@/lib/csv/write';
import type { SupportSearch } from './schema';
import { searchSizings, type SupportHit } from './search';

/** Rows one export carries at most; a larger result is cut there (narrow the look-up to see the rest). */
export const EXPORT_MAX_ROWS = 5_000;
const PAGE_SIZE = 100;

/** The export's columns: the header and how each cell is read from a hit. */
const COLUMNS: readonly (readonly [string, (h: SupportHit) => unknown])[] = [
  ['sizing', (h) => h.number],
  ['created_utc', (h) => h.createdAt],
  ['customer', (h) => h.accountName],
  ['title', (h) => h.title],
  ['equipment_tag', (h) => h.equipmentTag],
  ['service', (h) => h.service],
  ['gas', (h) => h.gasLabel],
  ['headline_kw', (h) => Number(h.headlineKw.toFixed(3))],
  ['datasheet', (h) => h.datasheetNumber],
  ['quotes', (h) => h.quoteNumbers.join(' ')],
  ['created_by', (h) => h.createdByName],
];

/** The look-up's hits as CSV, read page by page up to EXPORT_MAX_ROWS; formula-looking cells are neutralised. */
export async function exportLookupCsv(user: CurrentUser, query: SupportSearch): Promise<{ csv: string; rows: number }> {
  const rows: unknown[][] = [];
  let cursor: string | undefined;
  for (let page = 1; rows.length < EXPORT_MAX_ROWS; page++) {
    const res = await searchSizings(user, { ...query, cursor, page, pageSize: PAGE_SIZE });
    for (const hit of res.hits) rows.push(COLUMNS.map(([, cell]) => cell(hit)));
    if (!res.nextCursor) break;
    cursor = res.nextCursor;
  }
  return {
    csv: toCsv(
      COLUMNS.map(([name]) => name),
      rows,
    ),
    rows: rows.length,
  };
}
