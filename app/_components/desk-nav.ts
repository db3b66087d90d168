import type { Permission } from '@/lib/auth/roles';

export type NavItem = { href: string; label: string; permission?: Permission };

/** The signed-in shell's sections; each shows only to roles holding its permission. */
export const deskNav: NavItem[] = [
  { href: '/size', label: 'Size' },
  { href: '/sizings', label: 'Sizings', permission: 'sizing:read' },
  { href: '/quotes', label: 'Quotes', permission: 'quote:read' },
  { href: '/accounts', label: 'Accounts', permission: 'account:read' },
  { href: '/datasheets', label: 'Datasheets', permission: 'datasheet:read' },
  { href: '/support', label: 'Look-up', permission: 'support:search' },
  { href: '/billing', label: 'Subscription', permission: 'billing:manage' },
  { href: '/admin', label: 'People', permission: 'users:manage' },
];
