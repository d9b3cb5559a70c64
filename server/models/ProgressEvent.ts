import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Stage } from '../../shared/api/production';

/** One change of a line's stage count from the floor; `clientId` is unique, so a replay is a no-op. */
export class ProgressEvent extends Model<
  InferAttributes<ProgressEvent>,
  InferCreationAttributes<ProgressEvent>
> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare orderLineId: number;
  declare clientId: string;
  declare stage: Stage;
  declare delta: number;
  declare actorId: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ProgressEvent.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false },
        orderLineId: { type: DataTypes.INTEGER, allowNull: false },
        clientId: { type: DataTypes.UUID, allowNull: false, unique: true },
        stage: { type: DataTypes.STRING(12), allowNull: false },
        delta: { type: DataTypes.INTEGER, allowNull: false },
        actorId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'progress_events', underscored: true, updatedAt: false },
    );
  }
}
