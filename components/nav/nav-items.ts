import type { NavIconName } from '@/components/nav/nav-icons';

export type NavItem = {
  key: NavIconName;
  label: string;
  href: '/' | '/sites' | '/account' | '/mail';
  testID: string;
  adminOnly?: boolean;
};

/** The sections that exist today; add one here when its screens exist, not before. */
export const navItems: NavItem[] = [
  { key: 'tonight', label: 'Tonight', href: '/', testID: 'nav-tonight' },
  { key: 'sites', label: 'Sites', href: '/sites', testID: 'nav-sites' },
  { key: 'mail', label: 'Mail', href: '/mail', testID: 'nav-mail', adminOnly: true },
  { key: 'account', label: 'Account', href: '/account', testID: 'nav-account' },
];

/** Which section a path belongs to. */
export function isActive(item: NavItem, pathname: string): boolean {
  if (item.href === '/') return pathname === '/' || pathname === '';
  return pathname === item.href || pathname.startsWith(`${item.href}/`);
}
