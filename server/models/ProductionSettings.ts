import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { ProductionSettings as SettingsData } from '../../shared/api/production';

/** One plant's production settings: tables, working days, closures, labour model. */
export class ProductionSettings extends Model<
  InferAttributes<ProductionSettings>,
  InferCreationAttributes<ProductionSettings>
> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare data: SettingsData;
  declare updatedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ProductionSettings.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
        data: { type: DataTypes.JSONB, allowNull: false },
        updatedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'production_settings', underscored: true },
    );
  }
}
