import type { UserRole } from './roles';

/** Where each role starts after signing in: engineers and customers on the desk, support on the look-up, admins on people. */
export const roleHome: Readonly<Record<UserRole, string>> = {
  sales_engineer: '/size',
  customer: '/size',
  support: '/support',
  admin: '/admin',
};

/** The path sign-in goes to when no page asked for it: it sends each role to its own home. */
export const HOME_PATH = '/home';
