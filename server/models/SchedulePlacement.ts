import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One line's work on one table on one day, as the last re-plan placed it. */
export class SchedulePlacement extends Model<
  InferAttributes<SchedulePlacement>,
  InferCreationAttributes<SchedulePlacement>
> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare orderId: number;
  declare orderLineId: number;
  declare mark: string;
  declare tableId: number;
  declare onDate: string;
  declare minutes: number;
  declare setupMinutes: number;
  declare quantity: number;
  declare pinned: boolean;

  static initModel(sequelize: Sequelize) {
    SchedulePlacement.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false },
        orderId: { type: DataTypes.INTEGER, allowNull: false },
        orderLineId: { type: DataTypes.INTEGER, allowNull: false },
        mark: { type: DataTypes.STRING(12), allowNull: false },
        tableId: { type: DataTypes.INTEGER, allowNull: false },
        onDate: { type: DataTypes.DATEONLY, allowNull: false },
        minutes: { type: DataTypes.DOUBLE, allowNull: false },
        setupMinutes: { type: DataTypes.DOUBLE, allowNull: false },
        quantity: { type: DataTypes.INTEGER, allowNull: false },
        pinned: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      },
      { sequelize, tableName: 'schedule_placements', underscored: true, timestamps: false },
    );
  }
}
