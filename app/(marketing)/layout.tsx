import Link from 'next/link';
import type { ReactNode } from 'react';
import { Logo } from '@/app/_components/logo';

export default function MarketingLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col">
      <header className="border-b border-paper-line bg-paper-raised">
        <div className="mx-auto flex max-w-6xl items-center justify-between px-6 py-4">
          <Link href="/" className="flex items-center gap-2 text-lg font-semibold">
            <Logo /> Dutywise
          </Link>
          <nav aria-label="Site" className="flex items-center gap-5 text-sm">
            <Link href="/size" className="hover:text-tide-600">
              Size a duty
            </Link>
            <Link href="/pricing" className="hover:text-tide-600">
              Plans
            </Link>
            <Link href="/sign-in" className="rounded-md bg-ink px-3 py-1.5 font-medium text-paper hover:bg-ink-soft">
              Sign in
            </Link>
          </nav>
        </div>
      </header>
      <main className="flex-1">{children}</main>
      <footer className="border-t border-paper-line py-6 text-center text-hint text-ink-muted">
        Dutywise sizings are preliminary. Final equipment selection must be confirmed by a qualified engineer under the
        codes that apply at the site.
      </footer>
    </div>
  );
}
