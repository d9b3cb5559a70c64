import type { WhereOptions } from 'sequelize';
import type { User } from '../models';
import { hasRole } from './predicates';

/** The plant's price book: the desk reads it to quote; only the plant manager changes it. */
export const priceBookPolicy = {
  show: hasRole('admin', 'sales'),
  update: hasRole('admin'),
  scope: (actor: User): WhereOptions => ({ plantId: actor.plantId }),
};
