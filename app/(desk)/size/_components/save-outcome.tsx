import Link from 'next/link';

export type Saved = { id: string; number: string; revision: boolean };

/** The confirmation after a save, with the way to the saved record. */
export function SaveOutcome({ saved }: { saved: Saved | null }) {
  if (!saved) return null;
  return (
    <p
      role="status"
      data-testid="save-success"
      className="mt-3 rounded-md border border-tide-100 bg-tide-50 px-3 py-2 text-sm text-tide-700"
    >
      Saved {saved.revision ? 'revision ' : ''}
      <Link href={`/sizings/${saved.id}`} data-testid="saved-sizing-link" className="font-mono font-semibold underline">
        {saved.number}
      </Link>
      .{' '}
      <Link href="/sizings" className="underline">
        All sizings
      </Link>
    </p>
  );
}
