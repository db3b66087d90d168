import Link from 'next/link';

export default function NoAccessPage() {
  return (
    <main className="mx-auto max-w-xl px-6 py-16">
      <h1 className="text-2xl font-semibold">Not available to your role</h1>
      <p className="mt-3 text-ink-soft">
        This part of Dutywise is for another role. Ask an administrator if you need it.
      </p>
      <Link href="/size" className="mt-6 inline-block text-tide-600 underline">
        Back to the sizing desk
      </Link>
    </main>
  );
}
