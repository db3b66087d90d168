import type { ReactNode } from 'react';
import { DeskShell } from '@/app/_components/desk-shell';
import { getCurrentUser } from '@/lib/auth/current-user';

export const dynamic = 'force-dynamic';

// Pages below check their own permission; the layout only frames them for whoever is signed in.
export default async function DeskLayout({ children }: { children: ReactNode }) {
  const user = await getCurrentUser();
  return <DeskShell user={user}>{children}</DeskShell>;
}
