import type { Role } from '@/shared/schemas/auth';

/** The signed-in app's sections, in order. A section appears only for the roles listed. */
export interface NavItem {
  href: string;
  /** First path segment the item owns, for the active state. */
  segment: string;
  label: string;
  icon: string;
  roles: readonly Role[];
}

const everyone: readonly Role[] = ['tech', 'estimator', 'admin'];

export const NAV_ITEMS: NavItem[] = [
  { href: '/check', segment: 'check', label: 'Check', icon: 'clipboard-check-outline', roles: everyone },
  { href: '/readings', segment: 'readings', label: 'Readings', icon: 'gauge', roles: everyone },
  { href: '/jobs', segment: 'jobs', label: 'Jobs', icon: 'briefcase-outline', roles: everyone },
  { href: '/coils', segment: 'coils', label: 'Coils', icon: 'swap-horizontal', roles: ['estimator', 'admin'] },
  { href: '/catalog', segment: 'catalog', label: 'Catalog', icon: 'book-open-variant', roles: everyone },
  { href: '/admin', segment: 'admin', label: 'Admin', icon: 'cog-outline', roles: ['admin'] },
  { href: '/account', segment: 'account', label: 'Account', icon: 'account-circle-outline', roles: everyone },
];

export function navItemsFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => item.roles.includes(role));
}

/** Admin sub-sections, shown as a row of choices at the top of Admin. */
export const ADMIN_SECTIONS: { href: string; segment: string; label: string; icon: string }[] = [
  { href: '/admin/users', segment: 'users', label: 'Users', icon: 'account-multiple-outline' },
  { href: '/admin/imports', segment: 'imports', label: 'Imports', icon: 'file-upload-outline' },
  { href: '/admin/rules', segment: 'rules', label: 'Rules', icon: 'tune-variant' },
  { href: '/admin/pricing', segment: 'pricing', label: 'Pricing', icon: 'cash-multiple' },
  { href: '/admin/outbox', segment: 'outbox', label: 'Outbox', icon: 'email-outline' },
];
