import type { Sequelize } from 'sequelize';
import { Plant } from './Plant';
import { Customer } from './Customer';
import { User } from './User';
import { Job } from './Job';
import { AuditEvent } from './AuditEvent';
import { Order } from './Order';
import { OrderLine } from './OrderLine';
import { PriceBook } from './PriceBook';
import { Quote } from './Quote';
import { StoredFile } from './StoredFile';
import { QuoteAcceptance } from './QuoteAcceptance';
import { Payment } from './Payment';
import { PaymentEvent } from './PaymentEvent';
import { MailMessage } from './MailMessage';
import { StockSettings } from './StockSettings';
import { ProductionSettings } from './ProductionSettings';
import { SchedulePlacement } from './SchedulePlacement';
import { ProgressEvent } from './ProgressEvent';
import { Inspection } from './Inspection';
import { ShopPlan } from './ShopPlan';

let initialised: Sequelize | null = null;

/** Initialise every model and association on one Sequelize instance. */
export function initModels(sequelize: Sequelize) {
  if (initialised === sequelize) return;
  initialised = sequelize;
  for (const m of [
    Plant,
    Customer,
    User,
    Job,
    AuditEvent,
    Order,
    OrderLine,
    PriceBook,
    Quote,
    StoredFile,
    QuoteAcceptance,
    Payment,
    PaymentEvent,
    MailMessage,
    ProductionSettings,
    SchedulePlacement,
    ProgressEvent,
    Inspection,
  ])
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
  PriceBook.belongsTo(User, { foreignKey: 'updatedBy', as: 'editor', constraints: false });
  Order.hasMany(Quote, { foreignKey: 'orderId', as: 'quotes' });
  Quote.belongsTo(Order, { foreignKey: 'orderId', as: 'order' });
  Quote.belongsTo(User, { foreignKey: 'createdBy', as: 'creator', constraints: false });
  StoredFile.belongsTo(User, { foreignKey: 'uploadedBy', as: 'uploader', constraints: false });
  QuoteAcceptance.belongsTo(Quote, { foreignKey: 'quoteId', as: 'quote' });
  StockSettings.initModel(sequelize);
  StockSettings.belongsTo(User, { foreignKey: 'updatedBy', as: 'editor', constraints: false });
  Inspection.belongsTo(User, { foreignKey: 'inspectorId', as: 'inspector', constraints: false });
  ShopPlan.initModel(sequelize);
}

export { Plant, Customer, User, Job, AuditEvent, Order, OrderLine, PriceBook, Quote, StoredFile };
export { QuoteAcceptance, Payment, PaymentEvent, MailMessage };
export { StockSettings };
export { ProductionSettings, SchedulePlacement, ProgressEvent, Inspection };
export { ShopPlan };
