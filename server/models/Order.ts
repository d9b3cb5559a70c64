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
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'orders', underscored: true },
    );
  }
}
