import Link from 'next/link';
import type { ReactNode } from 'react';
import { signOutAction } from '@/app/(auth)/sign-in/actions';
import type { CurrentUser } from '@/lib/auth/current-user';
import { can, roleLabels, type Permission } from '@/lib/auth/roles';
import { Logo } from './logo';

type NavItem = { href: string; label: string; permission?: Permission };

/** The signed-in shell's sections; each shows only to roles holding its permission. */
const deskNav: NavItem[] = [
  { href: '/size', label: 'Size' },
  { href: '/batch', label: 'Batch sizing', permission: 'batch:upload' },
  { href: '/sizings', label: 'Sizings', permission: 'sizing:read' },
  { href: '/quotes', label: 'Quotes', permission: 'quote:read' },
  { href: '/accounts', label: 'Accounts', permission: 'account:read' },
  { href: '/datasheets', label: 'Datasheets', permission: 'datasheet:read' },
  { href: '/support', label: 'Look-up', permission: 'sizing:lookup' },
  { href: '/support/audit', label: 'Audit trail', permission: 'audit:read' },
  { href: '/mail', label: 'Demo inbox', permission: 'audit:read' },
  { href: '/billing', label: 'Subscription', permission: 'billing:manage' },
  { href: '/admin', label: 'People', permission: 'users:manage' },
  { href: '/api-keys', label: 'API keys', permission: 'apikey:manage' },
];

/** The signed-in workspace frame: a left rail of sections and the page beside it. */
export function DeskShell({ user, children }: { user: CurrentUser | null; children: ReactNode }) {
  const items = deskNav.filter((i) => !i.permission || (user && can(user.role, i.permission)));
  return (
    <div className="flex min-h-screen flex-col md:flex-row">
      <nav aria-label="Desk" className="flex shrink-0 flex-col gap-1 bg-ink px-3 py-4 text-paper md:w-56">
        <Link href="/" className="mb-4 flex items-center gap-2 px-2 text-lg font-semibold">
          <Logo /> Dutywise
        </Link>
        <ul className="flex flex-row flex-wrap gap-1 md:flex-col">
          {items.map((i) => (
            <li key={i.href}>
              <Link
                href={i.href}
                className="block rounded-md px-3 py-2 text-sm hover:bg-ink-soft focus-visible:bg-ink-soft"
              >
                {i.label}
              </Link>
            </li>
          ))}
        </ul>
        <div className="mt-auto border-t border-ink-soft px-2 pt-4 text-sm">
          {user ? (
            <>
              <p className="font-medium" data-testid="signed-in-as">
                {user.name}
              </p>
              <p className="text-paper-line">{roleLabels[user.role]}</p>
              <form action={signOutAction} className="mt-2">
                <button type="submit" className="text-copper-100 underline">
                  Sign out
                </button>
              </form>
            </>
          ) : (
            <Link href="/sign-in" className="text-copper-100 underline">
              Sign in to save sizings
            </Link>
          )}
        </div>
      </nav>
      <div className="min-w-0 flex-1">{children}</div>
    </div>
  );
}
