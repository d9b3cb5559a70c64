import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** The fabricator: owns every other record. */
export class Plant extends Model<InferAttributes<Plant>, InferCreationAttributes<Plant>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare units: 'imperial' | 'metric';
  declare address: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Plant.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        units: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'imperial' },
        address: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'plants', underscored: true },
    );
  }
}
