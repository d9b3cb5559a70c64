import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Plant } from './Plant';
import type { Customer } from './Customer';
import type { DesignCriteria } from '../../shared/api/jobs';

/** A building site of one builder. */
export class Job extends Model<InferAttributes<Job>, InferCreationAttributes<Job>> {
  declare id: CreationOptional<number>;
  declare plantId: ForeignKey<Plant['id']>;
  declare customerId: ForeignKey<Customer['id']>;
  declare name: string;
  declare address: string;
  declare planRevision: string | null;
  declare criteria: CreationOptional<DesignCriteria>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare customer?: NonAttribute<Customer>;

  static initModel(sequelize: Sequelize) {
    Job.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(160), allowNull: false },
        address: { type: DataTypes.TEXT, allowNull: false },
        planRevision: { type: DataTypes.STRING(40), allowNull: true },
        criteria: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'jobs', underscored: true },
    );
  }
}
