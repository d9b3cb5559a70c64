import type { Role } from '../../shared/api/roles';

/** One entry of the main navigation. */
export interface NavItem {
  to: string;
  label: string;
  /** Plant settings sit in one menu so a plant manager's bar fits a laptop screen. */
  group?: 'plant';
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
  /** A job's own page: builders read their company's jobs too (server/policies/job.ts). */
  job: ['admin', 'sales', 'engineer', 'foreman', 'builder'],
  orders: ['admin', 'sales', 'engineer', 'foreman', 'builder'],
  reviews: ['engineer'],
  quotes: ['admin', 'sales', 'builder'],
  'price-book': ['admin', 'sales'],
  inbox: ['admin'],
  stock: ['admin'],
  shop: ['foreman', 'sales', 'admin'],
  /** Shop paper of orders whose designs are all approved (never a builder). */
  'shop-paper': ['admin', 'sales', 'foreman'],
  schedule: ['admin', 'foreman', 'sales'],
  floor: ['admin', 'foreman'],
  quality: ['admin', 'foreman'],
  'production-settings': ['admin'],
  'design-rules': ['admin'],
} as const satisfies Record<string, readonly Role[]>;

const may = (section: keyof typeof SECTION_ROLES, role: Role) =>
  (SECTION_ROLES[section] as readonly Role[]).includes(role);

/** The navigation a role sees: its landing page first, then the sections it may open. */
export function navForRole(role: Role): NavItem[] {
  const items: NavItem[] = [{ to: '/', label: role === 'admin' ? 'Overview' : HOME_TITLES[role] }];
  if (may('reviews', role)) items.push({ to: '/reviews', label: 'Review queue' });
  if (may('orders', role)) {
    items.push({ to: '/orders', label: role === 'builder' ? 'Your orders' : 'Orders' });
  }
  if (may('shop', role)) items.push({ to: '/shop', label: 'Cut lists' });
  // The desk prices from the price book daily; for the plant manager it is one of the settings.
  const plant = role === 'admin' ? ({ group: 'plant' } as const) : {};
  if (may('users', role)) items.push({ to: '/users', label: 'Users', group: 'plant' });
  if (may('builders', role)) items.push({ to: '/builders', label: 'Builders' });
  if (may('jobs', role)) items.push({ to: '/jobs', label: 'Jobs' });
  if (may('price-book', role)) items.push({ to: '/price-book', label: 'Price book', ...plant });
  if (may('schedule', role)) items.push({ to: '/schedule', label: 'Schedule' });
  if (may('floor', role)) items.push({ to: '/floor', label: 'Floor' });
  if (may('quality', role)) items.push({ to: '/quality', label: 'Quality' });
  if (may('production-settings', role))
    items.push({ to: '/production-settings', label: 'Production', group: 'plant' });
  if (may('inbox', role)) items.push({ to: '/inbox', label: 'Demo inbox', group: 'plant' });
  if (may('stock', role)) items.push({ to: '/stock', label: 'Lumber stock', group: 'plant' });
  if (may('design-rules', role))
    items.push({ to: '/design-rules', label: 'Design rules', group: 'plant' });
  return items;
}
