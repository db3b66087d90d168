import Link from 'next/link';

type Props = { title: string; tag: string | null; number: string; revision: string | null };

/** What a customer without a subscription sees in place of downloads: a blurred sheet and the way to unlock it. */
export function LockedCard({ title, tag, number, revision }: Props) {
  return (
    <div
      data-testid="datasheet-locked"
      className="relative overflow-hidden rounded-md border border-paper-line bg-paper-sunk/60 p-4"
    >
      <div aria-hidden="true" className="pointer-events-none select-none space-y-2 blur-[3px]">
        <div className="h-3 w-2/3 rounded bg-ink-faint/50" />
        <div className="h-2 w-full rounded bg-ink-faint/30" />
        <div className="h-2 w-5/6 rounded bg-ink-faint/30" />
        <div className="grid grid-cols-3 gap-2 pt-1">
          <div className="h-8 rounded bg-copper-100" />
          <div className="h-8 rounded bg-copper-100" />
          <div className="h-8 rounded bg-tide-100" />
        </div>
        <div className="h-2 w-3/4 rounded bg-ink-faint/30" />
      </div>
      <div className="absolute inset-0 flex flex-col items-start justify-center gap-1 bg-paper-raised/70 px-4">
        <p className="font-medium text-ink">
          {number}
          {revision ? ` rev. ${revision}` : ''}: {title}
          {tag ? <span className="font-mono text-ink-soft"> · {tag}</span> : null}
        </p>
        <p className="text-sm text-ink-soft">Downloads unlock with an active subscription for your account.</p>
        <Link href="/billing" className="text-sm font-medium text-tide-600 underline">
          Subscribe to download
        </Link>
      </div>
    </div>
  );
}
