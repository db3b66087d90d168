import { formatSig4 } from '@/app/_components/format';
import { readableKey } from './readable-key';

export type KvRow = { path: string; depth: number; label: string; unit: string | null; value: string | null };

const MAX_DEPTH = 8;
const MAX_ROWS = 2000;

function scalar(v: unknown): string {
  if (v === null || v === undefined) return '—';
  if (typeof v === 'number') return formatSig4(v);
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  return String(v);
}

function isQuantity(v: unknown): v is { value: number; unit: string } {
  if (!v || typeof v !== 'object' || Array.isArray(v)) return false;
  const keys = Object.keys(v);
  const q = v as Record<string, unknown>;
  return keys.length === 2 && typeof q.value === 'number' && typeof q.unit === 'string';
}

function isScalarList(v: unknown[]): boolean {
  return v.every((x) => x === null || ['number', 'string', 'boolean'].includes(typeof x));
}

/**
 * Turns saved input or result JSON of any shape into labelled rows, depth first: objects become group
 * rows with their members indented beneath, {value, unit} pairs read as one quantity, numbers take 4 significant figures.
 */
export function flattenJson(root: unknown): { rows: KvRow[]; truncated: boolean } {
  const rows: KvRow[] = [];
  let truncated = false;
  const walk = (v: unknown, path: string, depth: number, label: string, unit: string | null) => {
    if (rows.length >= MAX_ROWS) {
      truncated = true;
      return;
    }
    if (isQuantity(v)) {
      rows.push({ path, depth, label, unit: v.unit, value: formatSig4(v.value) });
    } else if (Array.isArray(v)) {
      if (isScalarList(v))
        rows.push({ path, depth, label, unit, value: v.length ? v.map(scalar).join(', ') : '(none)' });
      else {
        if (path) rows.push({ path, depth, label, unit, value: null });
        // "Stages" → "Stage 1", "Stage 2"…: each element is one of the plural.
        const itemLabel = (label || 'Item').replace(/(?<=[a-z])s$/, '');
        v.forEach((item, i) => walk(item, `${path}[${i}]`, depth + 1, `${itemLabel} ${i + 1}`, unit));
      }
    } else if (v && typeof v === 'object') {
      if (depth >= MAX_DEPTH) {
        rows.push({ path, depth, label, unit, value: JSON.stringify(v) });
        return;
      }
      if (path) rows.push({ path, depth, label, unit, value: null });
      for (const [k, child] of Object.entries(v as Record<string, unknown>)) {
        const rk = readableKey(k);
        walk(child, path ? `${path}.${k}` : k, path ? depth + 1 : 0, rk.label, rk.unit);
      }
    } else {
      rows.push({ path: path || '(value)', depth, label: label || 'Value', unit, value: scalar(v) });
    }
  };
  walk(root, '', 0, '', null);
  return { rows, truncated };
}
