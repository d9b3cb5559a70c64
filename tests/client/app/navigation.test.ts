import { describe, expect, it } from 'vitest';
import { ROLES } from '../../../shared/api/roles';
import { HOME_TITLES, navForRole } from '../../../src/app/navigation';

const labels = (role: (typeof ROLES)[number]) => navForRole(role).map((item) => item.label);

describe('role navigation (product brief for the client shell)', () => {
  it('shows each role its own sections', () => {
    expect(labels('admin')).toEqual(['Overview', 'Users', 'Builders', 'Jobs']);
    expect(labels('sales')).toEqual(['Sales desk', 'Builders', 'Jobs']);
    expect(labels('engineer')).toEqual(['Design review', 'Jobs']);
    expect(labels('foreman')).toEqual(['Shop floor', 'Jobs']);
    expect(labels('builder')).toEqual(['Your jobs']);
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
