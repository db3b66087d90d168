'use client';

import { useEffect, useRef, useState } from 'react';
import { copyText } from './copy-text';

type Props = { text: string; label: string; testId: string; disabled?: boolean; primary?: boolean };

/** Copies `text`; says so, or shows the text selected for Ctrl+C when the browser refuses. */
export function CopyButton({ text, label, testId, disabled, primary }: Props) {
  const [state, setState] = useState<'idle' | 'copied' | 'manual'>('idle');
  const areaRef = useRef<HTMLTextAreaElement>(null);
  useEffect(() => {
    if (state === 'manual') areaRef.current?.select();
    if (state !== 'copied') return;
    const t = setTimeout(() => setState('idle'), 2500);
    return () => clearTimeout(t);
  }, [state]);
  const cls = primary
    ? 'bg-tide-600 text-white hover:bg-tide-700'
    : 'border border-paper-line bg-paper-raised text-ink hover:bg-paper-sunk';
  return (
    <div className="mt-2">
      <button
        type="button"
        data-testid={testId}
        disabled={disabled}
        onClick={async () => setState((await copyText(text)) ? 'copied' : 'manual')}
        className={`inline-flex items-center gap-1.5 rounded-md px-3 py-1.5 text-sm font-medium disabled:cursor-not-allowed disabled:opacity-50 ${cls}`}
      >
        <svg viewBox="0 0 16 16" aria-hidden="true" className="h-3.5 w-3.5">
          <rect x="5" y="5" width="9" height="9" rx="1.5" fill="none" stroke="currentColor" strokeWidth="1.4" />
          <path d="M3 11V3.5A1.5 1.5 0 0 1 4.5 2H11" fill="none" stroke="currentColor" strokeWidth="1.4" />
        </svg>
        {label}
      </button>
      <span role="status" className="ml-2 text-hint text-tide-700" data-testid={`${testId}-status`}>
        {state === 'copied' ? 'Copied.' : ''}
      </span>
      {state === 'manual' && (
        <label className="mt-2 block text-hint text-ink-muted">
          The browser blocked copying: press Ctrl+C (⌘C) to copy the selected text.
          <textarea
            ref={areaRef}
            readOnly
            value={text}
            rows={6}
            className="mt-1 block w-full rounded-md border border-paper-line bg-paper-raised p-2 font-mono text-xs"
          />
        </label>
      )}
    </div>
  );
}
