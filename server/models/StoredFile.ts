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

/** A builder's plan file on a job, kept outside the web root under a random name. */
export class StoredFile extends Model<
  InferAttributes<StoredFile>,
  InferCreationAttributes<StoredFile>
> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare customerId: number;
  declare jobId: number;
  declare originalName: string;
  declare storedName: string;
  declare contentType: 'application/pdf' | 'image/png' | 'image/jpeg';
  declare size: number;
  declare uploadedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare uploader?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    StoredFile.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false },
        customerId: { type: DataTypes.INTEGER, allowNull: false },
        jobId: { type: DataTypes.INTEGER, allowNull: false },
        originalName: { type: DataTypes.STRING(255), allowNull: false },
        storedName: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        contentType: { type: DataTypes.STRING(40), allowNull: false },
        size: { type: DataTypes.INTEGER, allowNull: false },
        uploadedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'stored_files', underscored: true, updatedAt: false },
    );
  }
}
