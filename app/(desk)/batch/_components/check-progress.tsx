const n = (v: number) => v.toLocaleString('en-US');

/** How far a check has come: "Checked 3,500 of 10,000 rows" with a bar. */
export function CheckProgress({ done, total }: { done: number; total: number }) {
  return (
    <div className="space-y-1" data-testid="batch-progress">
      <progress className="h-2 w-full max-w-md accent-tide-600" max={total} value={done} aria-label="Rows checked" />
      <p className="text-sm text-ink-soft" role="status">
        Checked {n(done)} of {n(total)} rows
      </p>
    </div>
  );
}
