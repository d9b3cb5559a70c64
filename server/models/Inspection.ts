import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { User } from './User';

/** One quality-control inspection of a truss at a set-up station (table). */
export class Inspection extends Model<
  InferAttributes<Inspection>,
  InferCreationAttributes<Inspection>
> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare tableId: number;
  declare orderLineId: number | null;
  declare truss: string;
  declare checks: Record<string, boolean>;
  declare passed: boolean;
  declare notes: string | null;
  declare inspectorId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare inspector?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    Inspection.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false },
        tableId: { type: DataTypes.INTEGER, allowNull: false },
        orderLineId: { type: DataTypes.INTEGER, allowNull: true },
        truss: { type: DataTypes.STRING(60), allowNull: false },
        checks: { type: DataTypes.JSONB, allowNull: false },
        passed: { type: DataTypes.BOOLEAN, allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: true },
        inspectorId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'inspections', underscored: true, updatedAt: false },
    );
  }
}
