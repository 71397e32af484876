import { ANY_STAFF, AUTHORS, LINK_SENDERS, OWNERS, WORKSHOP, type Role } from '@/shared/roles';

export interface NavItem {
  key: string;
  label: string;
  href: '/jobs' | '/support' | '/trees' | '/readings' | '/patterns' | '/settings';
  /** Icon name for NavIcon, always shown with the label. */
  icon: string;
  /** Roles that see the entry; the API enforces the same rights on its own. */
  roles: readonly Role[];
}

/** The signed-in navigation, in order. Add a screen here with the roles that may use it. */
export const NAV_ITEMS: readonly NavItem[] = [
  { key: 'jobs', label: 'Jobs', href: '/jobs', icon: 'jobs', roles: WORKSHOP },
  // Before Trees, so support staff land on their inbox.
  { key: 'support', label: 'Support', href: '/support', icon: 'support', roles: LINK_SENDERS },
  { key: 'trees', label: 'Trees', href: '/trees', icon: 'trees', roles: ANY_STAFF },
  { key: 'readings', label: 'Readings', href: '/readings', icon: 'readings', roles: ANY_STAFF },
  { key: 'patterns', label: 'Patterns', href: '/patterns', icon: 'patterns', roles: AUTHORS },
  { key: 'settings', label: 'Settings', href: '/settings', icon: 'settings', roles: OWNERS },
];

/** The entries a role may use, in display order. */
export function navItemsFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => item.roles.includes(role));
}

/** Where a person lands after sign-in: the first entry their role may use. */
export function homeFor(role: Role): NavItem['href'] {
  return navItemsFor(role)[0]?.href ?? '/trees';
}

/** The entry a path belongs to (for the "you are here" mark), if any. */
export function activeItem(pathname: string, items: readonly NavItem[]): NavItem | undefined {
  return items.find((item) => pathname === item.href || pathname.startsWith(`${item.href}/`));
}
