import type { NavIconName } from '@/components/nav/nav-icons';

export type NavItem = {
  key: NavIconName;
  label: string;
  href: '/' | '/recipes' | '/targets' | '/setup' | '/calibration' | '/clubs' | '/account' | '/mail';
  testID: string;
  /** Other path prefixes that belong to this section (e.g. a rig's page under Rig & site). */
  alsoMatches?: string[];
  adminOnly?: boolean;
};

/**
 * The sections that exist today, in the product's order (product.md "Screens"); add one here when
 * its screens exist, not before. On phones the first ones become tabs and the rest move into
 * "More" (see `splitTabs`), so the order is also the phone priority.
 */
export const navItems: NavItem[] = [
  { key: 'tonight', label: 'Tonight', href: '/', testID: 'nav-tonight' },
  { key: 'recipes', label: 'Recipes', href: '/recipes', testID: 'nav-recipes' },
  { key: 'targets', label: 'Targets', href: '/targets', testID: 'nav-targets' },
  { key: 'setup', label: 'Rig & site', href: '/setup', testID: 'nav-setup', alsoMatches: ['/rigs', '/sites'] },
  { key: 'calibration', label: 'Calibration', href: '/calibration', testID: 'nav-calibration' },
  { key: 'club', label: 'Club', href: '/clubs', testID: 'nav-club' },
  { key: 'account', label: 'Account', href: '/account', testID: 'nav-account' },
  { key: 'mail', label: 'Mail', href: '/mail', testID: 'nav-mail', adminOnly: true },
];

function underPrefix(prefix: string, pathname: string): boolean {
  return pathname === prefix || pathname.startsWith(`${prefix}/`);
}

/** Which section a path belongs to. */
export function isActive(item: NavItem, pathname: string): boolean {
  if (item.href === '/') return pathname === '/' || pathname === '';
  return [item.href, ...(item.alsoMatches ?? [])].some((prefix) => underPrefix(prefix, pathname));
}

/** Most tabs a phone bar shows; five stay readable at 320 px with icon and caption. */
export const MAX_PHONE_TABS = 5;

/**
 * Splits the sections into bottom tabs and a "More" list: all fit up to `max`; beyond that the
 * first `max − 1` stay tabs and the rest go under More (which takes the last slot).
 */
export function splitTabs(items: NavItem[], max = MAX_PHONE_TABS): { tabs: NavItem[]; more: NavItem[] } {
  if (items.length <= max) return { tabs: items, more: [] };
  return { tabs: items.slice(0, max - 1), more: items.slice(max - 1) };
}
