import Link from 'next/link';

export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl px-6 py-16">
      <h1 className="text-2xl font-semibold">Nothing here</h1>
      <p className="mt-3 text-ink-soft">The page or record does not exist, or it belongs to another account.</p>
      <Link href="/" className="mt-6 inline-block text-tide-600 underline">
        Go to the start page
      </Link>
    </main>
  );
}
