import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { PriceBook as PriceBookData } from '../../shared/api/pricing';
import type { User } from './User';

/** One plant's prices: lumber, plates, labour, delivery, margin, tax, deposit, validity. */
export class PriceBook extends Model<
  InferAttributes<PriceBook>,
  InferCreationAttributes<PriceBook>
> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare data: PriceBookData;
  declare updatedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare editor?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    PriceBook.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
        data: { type: DataTypes.JSONB, allowNull: false },
        updatedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'price_books', underscored: true },
    );
  }
}
