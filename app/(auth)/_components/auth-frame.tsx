import Link from 'next/link';
import type { ReactNode } from 'react';
import { Logo } from '@/app/_components/logo';

/** The narrow page the sign-in, sign-up and mailed-link pages share. */
export function AuthFrame({ title, children }: { title: string; children: ReactNode }) {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-6 py-12">
      <Link href="/" className="mb-8 flex items-center gap-2 text-xl font-semibold">
        <Logo /> Dutywise
      </Link>
      <h1 className="text-2xl font-semibold">{title}</h1>
      {children}
    </main>
  );
}

/** A mailed link that cannot be used (unknown, used, expired): what happened and what to do. */
export function DeadLink({ children }: { children: ReactNode }) {
  return (
    <div
      className="mt-6 rounded-panel border border-paper-line bg-paper-raised p-4 text-sm"
      data-testid="link-unusable"
    >
      {children}
    </div>
  );
}
