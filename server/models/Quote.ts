import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Order } from './Order';
import type { User } from './User';

/**
 * An immutable quote revision of an order: the snapshot holds prices, designs, terms and validity.
 * Only the sending fields change after it is written (a database trigger enforces it).
 */
export class Quote extends Model<InferAttributes<Quote>, InferCreationAttributes<Quote>> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare orderId: number;
  declare number: number;
  declare reference: string;
  declare snapshot: Record<string, unknown>;
  /** DECIMAL columns arrive as strings from pg. */
  declare total: string | number;
  declare depositDue: string | number;
  declare validUntil: string;
  declare createdBy: number | null;
  declare sentAt: CreationOptional<Date | null>;
  declare sentTo: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare order?: NonAttribute<Order>;
  declare creator?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    Quote.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false },
        orderId: { type: DataTypes.INTEGER, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        reference: { type: DataTypes.STRING(40), allowNull: false },
        snapshot: { type: DataTypes.JSONB, allowNull: false },
        total: { type: DataTypes.DECIMAL(14, 2), allowNull: false },
        depositDue: { type: DataTypes.DECIMAL(14, 2), allowNull: false },
        validUntil: { type: DataTypes.DATEONLY, allowNull: false },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        sentTo: { type: DataTypes.STRING(200), allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'quotes', underscored: true, updatedAt: false },
    );
  }
}
