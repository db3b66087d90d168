import { fieldKeyOf, fieldLabel, type DeskIssues } from './field-paths';
import type { DeskService, DeskValues } from './form-types';

// The desk reads numbers with a decimal point and no grouping. Text that a reader in another locale could
// take for a different number is refused with the reason, never guessed: "1.000" is one in some countries
// and one thousand in others. A point followed by three digits ending in zero reads as grouping as readily as
// decimals (nobody pads 1.5 to 1.500 without reason), so it is refused; "101.325" is taken as written.

const POINT_GROUPED = /^[+-]?[1-9]\d{0,2}(\.\d{3})*\.\d\d0$/;
const COMMA_GROUPED = /^[+-]?\d{1,3}(,\d{3})+(\.\d+)?$/;
const COMMA_DECIMAL = /^[+-]?\d*,\d+$/;
const SPACE_GROUPED = /^[+-]?\d{1,3}(\s\d{3})+([.,]\d+)?$/;

/** Why a typed number is ambiguous or in a form the desk does not read, or null when it is plain. */
export function ambiguousNumber(text: string): string | null {
  const t = text.trim();
  if (POINT_GROUPED.test(t)) {
    const asDecimal = t.replace(/0+$/, '').replace(/\.$/, '');
    return `"${t}" could be ${asDecimal} or ${t.replace(/\./g, '')}: write it without a thousands separator (${t.replace(/\./g, '')}), or without the trailing zeros (${asDecimal})`;
  }
  if (COMMA_GROUPED.test(t))
    return `"${t}" has a thousands separator: write ${t.replace(/,/g, '')} (a point marks decimals, nothing groups thousands)`;
  if (COMMA_DECIMAL.test(t)) return `"${t}" uses a decimal comma: write ${t.replace(',', '.')}`;
  if (SPACE_GROUPED.test(t)) return `"${t}" has spaces between digits: write ${t.replace(/\s/g, '').replace(',', '.')}`;
  return null;
}

/** Every ambiguous number in the form, keyed as the desk's field errors are. */
export function numberEntryIssues(values: DeskValues, service: DeskService): DeskIssues['fields'] {
  const out: DeskIssues['fields'] = {};
  const walk = (node: unknown, path: string) => {
    if (typeof node === 'string') {
      const why = ambiguousNumber(node);
      const key = why ? fieldKeyOf(path) : null;
      if (why && key && !out[key]) out[key] = `${fieldLabel(key, service)}: ${why}`;
      return;
    }
    if (node && typeof node === 'object') for (const [k, v] of Object.entries(node)) walk(v, path ? `${path}.${k}` : k);
  };
  walk(values, '');
  return out;
}
