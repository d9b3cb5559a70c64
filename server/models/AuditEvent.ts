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

/** Who did what to which record, written by every command inside its transaction. */
export class AuditEvent extends Model<
  InferAttributes<AuditEvent>,
  InferCreationAttributes<AuditEvent>
> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare actorId: number | null;
  declare action: string;
  declare subjectType: string;
  declare subjectId: number | null;
  declare data: Record<string, unknown>;
  declare createdAt: CreationOptional<Date>;
  declare actor?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    AuditEvent.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false },
        actorId: { type: DataTypes.INTEGER, allowNull: true },
        action: { type: DataTypes.STRING(60), allowNull: false },
        subjectType: { type: DataTypes.STRING(40), allowNull: false },
        subjectId: { type: DataTypes.INTEGER, allowNull: true },
        data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'audit_events', underscored: true, updatedAt: false },
    );
  }
}
