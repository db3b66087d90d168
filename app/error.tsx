'use client';

/** Shown when a page fails unexpectedly; says what to do without exposing details. */
export default function ErrorPage({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main className="mx-auto max-w-xl px-6 py-16">
      <h1 className="text-2xl font-semibold">This page could not be shown</h1>
      <p className="mt-3 text-ink-soft">
        Dutywise hit a problem on its side (often the database being briefly unreachable). Nothing you saved is lost.
      </p>
      <button type="button" onClick={reset} className="mt-6 rounded-md bg-tide-600 px-4 py-2 text-white">
        Try again
      </button>
    </main>
  );
}
