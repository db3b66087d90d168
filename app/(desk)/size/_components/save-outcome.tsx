'use client';

import Link from 'next/link';
import { useEffect, useRef } from 'react';

export type Saved = { id: string; number: string; version: number };

/** The confirmation after a save, with the way to the saved record. */
export function SaveOutcome({ saved }: { saved: Saved | null }) {
  const ref = useRef<HTMLParagraphElement>(null);
  // The confirmation is brought into view: on a long desk it would otherwise sit below the fold.
  useEffect(() => {
    ref.current?.scrollIntoView({ block: 'nearest' });
  }, [saved]);
  if (!saved) return null;
  return (
    <p
      ref={ref}
      role="status"
      data-testid="save-success"
      className="mt-3 rounded-md border border-tide-100 bg-tide-50 px-3 py-2 text-sm text-tide-700"
    >
      Saved{' '}
      <Link href={`/sizings/${saved.id}`} data-testid="saved-sizing-link" className="font-mono font-semibold underline">
        {saved.number}
      </Link>
      {saved.version > 1 ? ` version ${saved.version}` : ''}.{' '}
      <Link href="/sizings" className="underline">
        All sizings
      </Link>
    </p>
  );
}
