'use client';

import { useEffect, useMemo, useState } from 'react';
import type { SizingInput, SizingResult } from '@/lib/engine';
import type { UnitSystem } from '@/lib/units';
import { sharePath } from '../_lib/share-link';
import { buildSummary } from '../_lib/summary';
import { CopyButton } from './copy-button';

type Props = { input: SizingInput | null; result: SizingResult | null; system: UnitSystem };

/** A link that reopens these inputs, and the plain-text summary, both for the clipboard. */
export function ShareActions({ input, result, system }: Props) {
  const [origin, setOrigin] = useState('');
  useEffect(() => {
    setOrigin(window.location.origin);
  }, []);
  const link = useMemo(() => (input ? `${origin}${sharePath(input)}` : ''), [input, origin]);
  const summary = useMemo(
    () => (result ? buildSummary(result, system, link || undefined) : ''),
    [result, system, link],
  );
  return (
    <section
      aria-labelledby="share-title"
      className="rounded-panel border border-paper-line bg-paper-raised p-panel shadow-panel print:hidden"
      data-testid="share-panel"
    >
      <h2 id="share-title" className="text-base font-semibold">
        Share
      </h2>
      <label className="mt-2 block text-label text-ink-soft">
        Link to these inputs
        <input
          readOnly
          value={link}
          placeholder="Appears once the inputs are valid"
          data-testid="share-link"
          onFocus={(e) => e.currentTarget.select()}
          className="mt-1 block w-full truncate rounded-md border border-paper-line bg-paper-sunk px-3 py-2 font-mono text-xs text-ink"
        />
      </label>
      <div className="flex flex-wrap gap-x-3">
        <CopyButton text={link} label="Copy link" testId="copy-share-link" disabled={!link} />
        <CopyButton text={summary} label="Copy summary" testId="copy-summary" disabled={!summary} />
        <div className="mt-2">
          <button
            type="button"
            onClick={() => window.print()}
            disabled={!result}
            className="inline-flex items-center rounded-md border border-paper-line bg-paper-raised px-3 py-1.5 text-sm font-medium text-ink hover:bg-paper-sunk disabled:opacity-50"
          >
            Print
          </button>
        </div>
      </div>
    </section>
  );
}
