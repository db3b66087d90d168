import type { ReactNode } from 'react';

/** The desk's title row: what it does, the unit system, a fresh start; then any notices about how it opened. */
export function DeskHeader({
  toggle,
  onNew,
  notices,
}: {
  toggle: ReactNode;
  onNew: () => void;
  notices: readonly string[];
}) {
  return (
    <header className="border-b border-paper-line pb-3 print:border-0">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="min-w-0">
          <p className="text-label uppercase tracking-wide text-ink-muted">Sizing desk</p>
          <h1 className="mt-0.5 text-2xl font-semibold text-ink">Size a heater or compressor</h1>
          <p className="mt-1 max-w-2xl text-sm text-ink-soft">
            Enter the duty point; the result follows as you type. Ideal-gas properties; every figure is preliminary.
          </p>
        </div>
        <div className="flex items-start gap-3 print:hidden">
          {toggle}
          <button
            type="button"
            onClick={onNew}
            className="rounded-md border border-paper-line bg-paper-raised px-3 py-1.5 text-sm text-ink hover:bg-paper-sunk"
            data-testid="new-sizing"
          >
            Start over
          </button>
        </div>
      </div>
      {notices.length > 0 && (
        <ul className="mt-3 space-y-1" data-testid="desk-notices">
          {notices.map((n) => (
            <li
              key={n}
              className="rounded-md border border-severity-info/30 bg-paper-raised px-3 py-1.5 text-sm text-severity-info"
            >
              {n}
            </li>
          ))}
        </ul>
      )}
    </header>
  );
}
