import type { UserRole } from '@/db/schema/enums';

export type { UserRole };

export const roleLabels: Record<UserRole, string> = {
  sales_engineer: 'Sales engineer',
  customer: 'Customer',
  support: 'Support',
  admin: 'Admin',
};

/** Vendor staff see every account; customers see only their own. */
export const staffRoles: readonly UserRole[] = ['sales_engineer', 'support', 'admin'];

export type Permission =
  | 'sizing:save'
  | 'sizing:read'
  | 'quote:manage'
  | 'quote:read'
  | 'account:manage'
  | 'account:read'
  | 'member:invite'
  | 'datasheet:issue'
  | 'datasheet:read'
  | 'support:search'
  | 'sizing:lookup'
  | 'audit:read'
  | 'users:manage'
  | 'billing:manage'
  | 'batch:upload';

// Support looks up anything but changes no engineering; sales engineers look up their own customers' sizings
// (lib/support/scope.ts); admins manage people and roles.
const grants: Record<UserRole, readonly Permission[]> = {
  sales_engineer: [
    'sizing:save',
    'sizing:read',
    'quote:manage',
    'quote:read',
    'account:manage',
    'account:read',
    'member:invite',
    'datasheet:issue',
    'datasheet:read',
    'sizing:lookup',
    'batch:upload',
  ],
  customer: [
    'sizing:save',
    'sizing:read',
    'quote:read',
    'account:read',
    'member:invite',
    'datasheet:issue',
    'datasheet:read',
    'billing:manage',
    'batch:upload',
  ],
  support: [
    'sizing:read',
    'quote:read',
    'account:read',
    'datasheet:read',
    'support:search',
    'sizing:lookup',
    'audit:read',
  ],
  admin: [
    'sizing:save',
    'sizing:read',
    'quote:manage',
    'quote:read',
    'account:manage',
    'account:read',
    'member:invite',
    'datasheet:issue',
    'datasheet:read',
    'support:search',
    'sizing:lookup',
    'audit:read',
    'users:manage',
    'batch:upload',
  ],
};

export function can(role: UserRole, permission: Permission): boolean {
  return grants[role].includes(permission);
}

export function isStaff(role: UserRole): boolean {
  return staffRoles.includes(role);
}
