import 'server-only';
import { redirect } from 'next/navigation';
import { AppError } from '@/lib/errors';
import { getCurrentUser, type CurrentUser } from './current-user';
import { can, isStaff, type Permission } from './roles';

/** For actions and route handlers: the user, or an AppError (unauthenticated 401, forbidden 403). */
export async function requireUser(permission?: Permission): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) throw new AppError('unauthenticated', 'Sign in to continue.');
  if (permission && !can(user.role, permission)) throw new AppError('forbidden', 'Your role does not allow this.');
  return user;
}

/** For pages: redirects to sign-in when signed out, to the no-access page when the role lacks the permission. */
export async function requirePageUser(nextPath: string, permission?: Permission): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) redirect(`/sign-in?next=${encodeURIComponent(nextPath)}`);
  if (permission && !can(user.role, permission)) redirect('/no-access');
  return user;
}

/** Customers reach only their own account; staff reach every account. Cross-account ids look like missing rows. */
export function assertAccountAccess(user: CurrentUser, accountId: string): void {
  if (isStaff(user.role)) return;
  if (!user.accountId || user.accountId !== accountId) throw new AppError('not_found', 'Not found');
}

/** The account filter a query must apply: null for staff (all accounts), the user's account otherwise. */
export function accountScope(user: CurrentUser): string | null {
  if (isStaff(user.role)) return null;
  // A customer without an account sees nothing: an impossible id keeps the filter in place.
  return user.accountId ?? '00000000-0000-0000-0000-000000000000';
}
