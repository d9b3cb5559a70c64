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
import type { ReviewState } from '../../shared/api/orders';
import type { Order } from './Order';
import type { User } from './User';

/**
 * One truss line of an order: mark, quantity, plies and a design snapshot — the input, the server's
 * results and the engine version that produced them.
 */
export class OrderLine extends Model<
  InferAttributes<OrderLine>,
  InferCreationAttributes<OrderLine>
> {
  declare id: CreationOptional<number>;
  declare orderId: ForeignKey<Order['id']>;
  declare position: number;
  declare mark: string;
  declare quantity: number;
  declare plies: number;
  declare profile: string;
  declare designInput: Record<string, unknown>;
  declare designResult: Record<string, unknown>;
  declare engineVersion: string;
  declare designOk: boolean;
  declare maxCsi: number | null;
  declare warningCount: number;
  declare description: string;
  /** 1 for a new line, raised by every design change; a review names the version it approves. */
  declare designVersion: CreationOptional<number>;
  declare reviewState: CreationOptional<ReviewState>;
  declare reviewComment: CreationOptional<string | null>;
  declare reviewedBy: CreationOptional<number | null>;
  declare reviewedAt: CreationOptional<Date | null>;
  declare cutCount: CreationOptional<number>;
  declare assembledCount: CreationOptional<number>;
  declare bandedCount: CreationOptional<number>;
  declare loadedCount: CreationOptional<number>;
  declare deliveredCount: CreationOptional<number>;
  /** The job's design loads changed after this design was made: redesign before quoting. */
  declare loadsOutOfDate: CreationOptional<boolean>;
  declare outOfDateReason: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare order?: NonAttribute<Order>;
  declare reviewer?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    OrderLine.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        position: { type: DataTypes.INTEGER, allowNull: false },
        mark: { type: DataTypes.STRING(12), allowNull: false },
        quantity: { type: DataTypes.INTEGER, allowNull: false },
        plies: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        profile: { type: DataTypes.STRING(20), allowNull: false },
        designInput: { type: DataTypes.JSONB, allowNull: false },
        designResult: { type: DataTypes.JSONB, allowNull: false },
        engineVersion: { type: DataTypes.STRING(20), allowNull: false },
        designOk: { type: DataTypes.BOOLEAN, allowNull: false },
        maxCsi: { type: DataTypes.DOUBLE, allowNull: true },
        warningCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        description: { type: DataTypes.STRING(120), allowNull: false },
        designVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        reviewState: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'pending' },
        reviewComment: { type: DataTypes.TEXT, allowNull: true },
        reviewedBy: { type: DataTypes.INTEGER, allowNull: true },
        reviewedAt: { type: DataTypes.DATE, allowNull: true },
        cutCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        assembledCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        bandedCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        loadedCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        deliveredCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        loadsOutOfDate: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        outOfDateReason: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'order_lines', underscored: true },
    );
  }
}
