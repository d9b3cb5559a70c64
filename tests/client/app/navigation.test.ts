import { describe, expect, it } from 'vitest';
import { ROLES } from '../../../shared/api/roles';
import { HOME_TITLES, SECTION_ROLES, navForRole } from '../../../src/app/navigation';

const labels = (role: (typeof ROLES)[number]) => navForRole(role).map((item) => item.label);

describe('role navigation (product brief for the client shell and the sales desk screens)', () => {
  it('shows each role its own sections', () => {
    expect(labels('admin')).toEqual([
      'Overview',
      'Orders',
      'Cut lists',
      'Users',
      'Builders',
      'Jobs',
      'Price book',
      'Schedule',
      'Floor',
      'Quality',
      'Production',
      'Demo inbox',
      'Lumber stock',
      'Design rules',
    ]);
    expect(labels('sales')).toEqual([
      'Sales desk',
      'Orders',
      'Cut lists',
      'Builders',
      'Jobs',
      'Price book',
      'Schedule',
    ]);
    expect(labels('engineer')).toEqual(['Design review', 'Review queue', 'Orders', 'Jobs']);
    expect(labels('foreman')).toEqual([
      'Shop floor',
      'Orders',
      'Cut lists',
      'Jobs',
      'Schedule',
      'Floor',
      'Quality',
    ]);
    expect(labels('builder')).toEqual(['Your jobs', 'Your orders']);
  });

  it("puts the plant manager's settings in one menu so the bar fits a laptop", () => {
    const grouped = (role: (typeof ROLES)[number]) =>
      navForRole(role)
        .filter((item) => item.group === 'plant')
        .map((item) => item.label);
    expect(grouped('admin')).toEqual([
      'Users',
      'Price book',
      'Production',
      'Demo inbox',
      'Lumber stock',
      'Design rules',
    ]);
    // The desk works from the price book every day: it stays on the bar.
    expect(grouped('sales')).toEqual([]);
    expect(navForRole('admin').filter((item) => !item.group)).toHaveLength(8);
  });

  it('links the review queue and the orders list where the routes live', () => {
    expect(navForRole('engineer').find((i) => i.label === 'Review queue')?.to).toBe('/reviews');
    expect(navForRole('builder').find((i) => i.label === 'Your orders')?.to).toBe('/orders');
  });

  it('only lists sections the role may open', () => {
    for (const role of ROLES) {
      for (const item of navForRole(role).slice(1)) {
        const section = item.to.slice(1) as keyof typeof SECTION_ROLES;
        expect(SECTION_ROLES[section] as readonly string[]).toContain(role);
      }
    }
  });

  it('starts every role at /', () => {
    for (const role of ROLES) expect(navForRole(role)[0].to).toBe('/');
  });

  it('titles each landing page as the browser tests expect', () => {
    expect(HOME_TITLES).toEqual({
      admin: 'Plant overview',
      sales: 'Sales desk',
      engineer: 'Design review',
      foreman: 'Shop floor',
      builder: 'Your jobs',
    });
  });
});
