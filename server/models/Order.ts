import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { OrderStatus } from '../../shared/api/orders';
import type { Customer } from './Customer';
import type { Job } from './Job';
import type { OrderLine } from './OrderLine';

/** A builder's order for one job: truss lines moving through the order's flow (DESIGN.md §2). */
export class Order extends Model<InferAttributes<Order>, InferCreationAttributes<Order>> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare customerId: ForeignKey<Customer['id']>;
  declare jobId: ForeignKey<Job['id']>;
  declare number: string;
  declare status: CreationOptional<OrderStatus>;
  declare createdBy: number | null;
  declare promisedOn: CreationOptional<string | null>;
  declare releasedAt: CreationOptional<Date | null>;
  declare onHold: CreationOptional<boolean>;
  declare holdReason: CreationOptional<string | null>;
  declare schedulePin: CreationOptional<{ tableId: number; date: string } | null>;
  declare plannedFinishOn: CreationOptional<string | null>;
  declare plannedLate: CreationOptional<boolean>;
  /** Raised by the database when the order's own state changes; changes name the one seen. */
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare job?: NonAttribute<Job>;
  declare customer?: NonAttribute<Customer>;
  declare lines?: NonAttribute<OrderLine[]>;

  static initModel(sequelize: Sequelize) {
    Order.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false },
        number: { type: DataTypes.STRING(20), allowNull: false },
        status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'draft' },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        promisedOn: { type: DataTypes.DATEONLY, allowNull: true },
        releasedAt: { type: DataTypes.DATE, allowNull: true },
        onHold: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        holdReason: { type: DataTypes.TEXT, allowNull: true },
        schedulePin: { type: DataTypes.JSONB, allowNull: true },
        plannedFinishOn: { type: DataTypes.DATEONLY, allowNull: true },
        plannedLate: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'orders', underscored: true },
    );
  }
}
