import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { StockSettings as StockSettingsData } from '../../shared/api/stock';
import type { User } from './User';

/** One plant's lumber stock: lengths, prices and counts on hand per lumber; kerf and trim. */
export class StockSettings extends Model<
  InferAttributes<StockSettings>,
  InferCreationAttributes<StockSettings>
> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare data: StockSettingsData;
  declare updatedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare editor?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    StockSettings.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
        data: { type: DataTypes.JSONB, allowNull: false },
        updatedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'stock_settings', underscored: true },
    );
  }
}
