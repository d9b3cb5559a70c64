import type { Sequelize } from 'sequelize';
import { Plant } from './Plant';
import { Customer } from './Customer';
import { User } from './User';
import { Job } from './Job';
import { AuditEvent } from './AuditEvent';
import { Order } from './Order';
import { OrderLine } from './OrderLine';

let initialised: Sequelize | null = null;

/** Initialise every model and association on one Sequelize instance. */
export function initModels(sequelize: Sequelize) {
  if (initialised === sequelize) return;
  initialised = sequelize;
  for (const m of [Plant, Customer, User, Job, AuditEvent, Order, OrderLine])
    m.initModel(sequelize);
  Plant.hasMany(Customer, { foreignKey: 'plantId' });
  Customer.belongsTo(Plant, { foreignKey: 'plantId', as: 'plant' });
  Plant.hasMany(User, { foreignKey: 'plantId' });
  User.belongsTo(Plant, { foreignKey: 'plantId', as: 'plant' });
  Customer.hasMany(User, { foreignKey: 'customerId' });
  User.belongsTo(Customer, { foreignKey: 'customerId', as: 'customer' });
  Customer.hasMany(Job, { foreignKey: 'customerId', as: 'jobs' });
  Job.belongsTo(Customer, { foreignKey: 'customerId', as: 'customer' });
  Plant.hasMany(Job, { foreignKey: 'plantId' });
  Job.hasMany(Order, { foreignKey: 'jobId', as: 'orders' });
  Order.belongsTo(Job, { foreignKey: 'jobId', as: 'job' });
  Order.belongsTo(Customer, { foreignKey: 'customerId', as: 'customer' });
  Order.hasMany(OrderLine, { foreignKey: 'orderId', as: 'lines' });
  OrderLine.belongsTo(Order, { foreignKey: 'orderId', as: 'order' });
  OrderLine.belongsTo(User, { foreignKey: 'reviewedBy', as: 'reviewer', constraints: false });
  AuditEvent.belongsTo(User, { foreignKey: 'actorId', as: 'actor', constraints: false });
}

export { Plant, Customer, User, Job, AuditEvent, Order, OrderLine };
