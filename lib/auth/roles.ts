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
  | 'batch:upload'
  | 'apikey:manage';

// Support looks up anything but changes no engineering; sales engineers look up their own customers' sizings
// (lib/support/scope.ts); admins manage people and roles. Only vendor staff issue datasheet revisions: a datasheet
// is the vendor's document.
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
    'apikey:manage',
  ],
  customer: [
    'sizing:save',
    'sizing:read',
    'quote:read',
    'account:read',
    'member:invite',
    'datasheet:read',
    'billing:manage',
    'batch:upload',
    'apikey:manage',
  ],
  support: [
    'sizing:read',
    'quote:read',
    'account:read',
    'datasheet:read',
    'support:search',
    'sizing:lookup',
    'audit:read',
    'apikey:manage',
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
    'apikey:manage',
  ],
};

export function can(role: UserRole, permission: Permission): boolean {
  return grants[role].includes(permission);
}

export function isStaff(role: UserRole): boolean {
  return staffRoles.includes(role);
}
