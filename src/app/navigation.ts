import type { Role } from '../../shared/api/roles';

/** One entry of the main navigation. */
export interface NavItem {
  to: string;
  label: string;
}

/** Title of the landing page (`/`) per role; the page's `<h1>`. */
export const HOME_TITLES: Record<Role, string> = {
  admin: 'Plant overview',
  sales: 'Sales desk',
  engineer: 'Design review',
  foreman: 'Shop floor',
  builder: 'Your jobs',
};

/** Which roles may open each guarded section (the server enforces the same). */
export const SECTION_ROLES = {
  users: ['admin'],
  builders: ['admin', 'sales'],
  jobs: ['admin', 'sales', 'engineer', 'foreman'],
} as const satisfies Record<string, readonly Role[]>;

/** The navigation a role sees: its landing page first, then the sections it may open. */
export function navForRole(role: Role): NavItem[] {
  const items: NavItem[] = [{ to: '/', label: role === 'admin' ? 'Overview' : HOME_TITLES[role] }];
  if ((SECTION_ROLES.users as readonly Role[]).includes(role)) {
    items.push({ to: '/users', label: 'Users' });
  }
  if ((SECTION_ROLES.builders as readonly Role[]).includes(role)) {
    items.push({ to: '/builders', label: 'Builders' });
  }
  if ((SECTION_ROLES.jobs as readonly Role[]).includes(role)) {
    items.push({ to: '/jobs', label: 'Jobs' });
  }
  return items;
}
