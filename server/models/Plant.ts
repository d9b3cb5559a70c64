import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { AreaLoads } from '../../shared/api/jobs';

/** Plant-wide settings kept as JSON (defaults apply to what is missing). */
export interface PlantSettings {
  defaultLoads?: AreaLoads;
  /** Contact details printed on quotes and truss design drawings. */
  phone?: string;
  email?: string;
  /** Engine options of every design the plant runs (absent: common practice, all off). */
  designRules?: { amplifyPanelPointMoment?: boolean; version?: number };
}

/** The fabricator: owns every other record. */
export class Plant extends Model<InferAttributes<Plant>, InferCreationAttributes<Plant>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare units: 'imperial' | 'metric';
  declare address: string | null;
  declare settings: CreationOptional<PlantSettings>;
  declare nextOrderNumber: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Plant.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        units: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'imperial' },
        address: { type: DataTypes.TEXT, allowNull: true },
        settings: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        nextOrderNumber: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'plants', underscored: true },
    );
  }
}
