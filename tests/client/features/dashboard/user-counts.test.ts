import { describe, expect, it } from 'vitest';
import type { User } from '../../../../shared/api/users';
import { countUsersByRole } from '../../../../src/features/dashboard/user-counts';

const user = (id: number, role: User['role'], active = true): User => ({
  id,
  email: `u${id}@example.test`,
  name: `User ${id}`,
  role,
  active,
  customerId: role === 'builder' ? 1 : null,
  customerName: role === 'builder' ? 'Demo Builder' : null,
  lastSignInAt: null,
  createdAt: '2025-01-01T00:00:00Z',
});

describe('countUsersByRole', () => {
  it('counts active users per role and includes empty roles', () => {
    const counts = countUsersByRole([
      user(1, 'admin'),
      user(2, 'sales'),
      user(3, 'sales'),
      user(4, 'builder', false),
    ]);
    expect(counts).toEqual({ admin: 1, sales: 2, engineer: 0, foreman: 0, builder: 0 });
  });
});
