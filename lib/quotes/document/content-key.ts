import { createHash } from 'node:crypto';
import type { QuoteSource } from './source';

/**
 * SHA-256 over everything a quote document prints or appends, bar its edition number and date: the quote's identity,
 * status and account details, each line's sizing version, figures, quantity and price, and the datasheet revision
 * appended for it. Two states with one key would produce the same document, so the latest edition is served again.
 */
export function contentKeyOf(q: QuoteSource): string {
  const state = {
    quote: [q.number, q.title, q.status],
    account: [q.accountName, q.site, q.currency, q.unitSystem],
    lines: q.lines.map((l) => [
      l.itemId,
      l.sizingNumber,
      l.sizingVersion,
      l.title,
      l.equipmentTag,
      l.service,
      l.gasLabel,
      l.headlineKw,
      l.quantity,
      l.unitPrice,
      l.datasheet?.id ?? null,
    ]),
  };
  return createHash('sha256').update(JSON.stringify(state)).digest('hex');
}
