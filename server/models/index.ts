import type { Sequelize } from 'sequelize';
import { Plant } from './Plant';
import { Customer } from './Customer';
import { User } from './User';
import { Job } from './Job';
import { AuditEvent } from './AuditEvent';

let initialised: Sequelize | null = null;

/** Initialise every model and association on one Sequelize instance. */
export function initModels(sequelize: Sequelize) {
  if (initialised === sequelize) return;
  initialised = sequelize;
  for (const m of [Plant, Customer, User, Job, AuditEvent]) m.initModel(sequelize);
  Plant.hasMany(Customer, { foreignKey: 'plantId' });
  Customer.belongsTo(Plant, { foreignKey: 'plantId', as: 'plant' });
  Plant.hasMany(User, { foreignKey: 'plantId' });
  User.belongsTo(Plant, { foreignKey: 'plantId', as: 'plant' });
  Customer.hasMany(User, { foreignKey: 'customerId' });
  User.belongsTo(Customer, { foreignKey: 'customerId', as: 'customer' });
  Customer.hasMany(Job, { foreignKey: 'customerId', as: 'jobs' });
  Job.belongsTo(Customer, { foreignKey: 'customerId', as: 'customer' });
  Plant.hasMany(Job, { foreignKey: 'plantId' });
}

export { Plant, Customer, User, Job, AuditEvent };
