import type { WhereOptions } from 'sequelize';
import type { User } from '../models';
import { hasRole } from './predicates';

/** The plant's lumber stock: the shop and the desk read it; only the plant manager changes it. */
export const stockSettingsPolicy = {
  show: hasRole('admin', 'foreman', 'sales'),
  update: hasRole('admin'),
  scope: (actor: User): WhereOptions => ({ plantId: actor.plantId }),
};
