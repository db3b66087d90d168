'use client';

import { sizingOptionLabel, type SizingOption } from '../../_components/sizing-option';

type Props = { sizings: SizingOption[]; selected: string[]; onChange: (ids: string[]) => void; error?: string };

/** Saved sizings of the chosen account, ticked to become quote lines (quantity 1 each; change it on the quote). */
export function SizingChecklist({ sizings, selected, onChange, error }: Props) {
  const toggle = (id: string, on: boolean) => onChange(on ? [...selected, id] : selected.filter((s) => s !== id));
  return (
    <fieldset
      className="rounded-md border border-paper-line p-3"
      aria-describedby={error ? 'sizing-checklist-error' : undefined}
    >
      <legend className="px-1 text-label text-ink-soft">Lines: saved sizings of this account</legend>
      {sizings.length ? (
        <ul className="max-h-80 space-y-1 overflow-y-auto text-sm" data-testid="sizing-checklist">
          {sizings.map((s) => (
            <li key={s.id}>
              <label className="flex items-start gap-2 rounded px-1 py-1 hover:bg-paper-sunk">
                <input
                  type="checkbox"
                  className="mt-1 accent-tide-600"
                  checked={selected.includes(s.id)}
                  onChange={(e) => toggle(s.id, e.target.checked)}
                />
                <span className="tabular">{sizingOptionLabel(s)}</span>
              </label>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-ink-muted">
          This account has no saved sizings yet. The quote can be created empty and lines added later.
        </p>
      )}
      {error && (
        <p id="sizing-checklist-error" className="mt-1 text-hint text-severity-danger">
          {error}
        </p>
      )}
    </fieldset>
  );
}
