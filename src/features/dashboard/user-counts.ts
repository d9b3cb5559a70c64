import { ROLES, type Role } from '../../../shared/api/roles';
import type { User } from '../../../shared/api/users';

/** Active users per role (deactivated users do not count). */
export function countUsersByRole(users: readonly User[]): Record<Role, number> {
  const counts = Object.fromEntries(ROLES.map((r) => [r, 0])) as Record<Role, number>;
  for (const user of users) if (user.active) counts[user.role] += 1;
  return counts;
}
