/** One line of a comparison between two versions of a sizing: a changed input or headline figure. */
export type VersionChange = { label: string; before: string; after: string };

type Leaf = Map<string, string>;

function isQuantity(v: unknown): v is { value: number; unit: string } {
  return (
    !!v &&
    typeof v === 'object' &&
    typeof (v as { value?: unknown }).value === 'number' &&
    typeof (v as { unit?: unknown }).unit === 'string'
  );
}

function show(v: unknown): string {
  if (v === null || v === undefined) return '—';
  if (typeof v === 'number') return Number.isInteger(v) ? String(v) : String(Number(v.toPrecision(6)));
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  return String(v);
}

// Leaves of the stored input by dotted path; a {value, unit} pair is one leaf ("3 barg"), as it was entered.
function leaves(v: unknown, path: string, out: Leaf): Leaf {
  if (isQuantity(v)) out.set(path, `${show(v.value)} ${v.unit}`);
  else if (Array.isArray(v)) v.forEach((x, i) => leaves(x, `${path}[${i + 1}]`, out));
  else if (v && typeof v === 'object')
    for (const [k, child] of Object.entries(v)) leaves(child, path ? `${path}.${k}` : k, out);
  else out.set(path || 'value', show(v));
  return out;
}

/** The inputs that differ between two stored inputs, in the order the newer one lists them. */
export function inputChanges(before: unknown, after: unknown): VersionChange[] {
  const a = leaves(before, '', new Map());
  const b = leaves(after, '', new Map());
  const keys = [...b.keys(), ...[...a.keys()].filter((k) => !b.has(k))];
  return keys
    .filter((k) => a.get(k) !== b.get(k))
    .map((k) => ({ label: k, before: a.get(k) ?? '(not given)', after: b.get(k) ?? '(not given)' }));
}
