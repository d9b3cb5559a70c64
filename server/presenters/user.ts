import type { Me } from '../../shared/api/auth';
import type { User as UserShape } from '../../shared/api/users';
import type { User } from '../models';

/** The session user, as login and /me present it. */
export function presentMe(user: User, demo: boolean): Me {
  return {
    user: {
      id: user.id,
      email: user.email,
      name: user.name,
      role: user.role,
      plantId: user.plantId,
      customerId: user.customerId ?? null,
    },
    plant: {
      id: user.plant!.id,
      name: user.plant!.name,
      units: user.plant!.units,
      demo,
    },
    customer: user.customer ? { id: user.customer.id, name: user.customer.name } : null,
  };
}

/** A user row on the plant manager's Users screen. */
export function presentUser(user: User): UserShape {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    active: user.active,
    customerId: user.customerId ?? null,
    customerName: user.customer?.name ?? null,
    lastSignInAt: user.lastSignInAt?.toISOString() ?? null,
    createdAt: user.createdAt.toISOString(),
  };
}
