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
import type { Role } from '../../shared/api/roles';
import type { Plant } from './Plant';
import type { Customer } from './Customer';

/** Staff of a plant (one role) or a builder user of one customer. */
export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare plantId: ForeignKey<Plant['id']>;
  declare customerId: ForeignKey<Customer['id']> | null;
  declare email: string;
  declare name: string;
  declare role: Role;
  declare passwordHash: string;
  declare active: CreationOptional<boolean>;
  declare lastSignInAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare customer?: NonAttribute<Customer | null>;
  declare plant?: NonAttribute<Plant>;

  static initModel(sequelize: Sequelize) {
    User.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        email: { type: DataTypes.STRING(200), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        role: { type: DataTypes.STRING(20), allowNull: false },
        passwordHash: { type: DataTypes.STRING(100), allowNull: false },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        lastSignInAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users', underscored: true },
    );
  }
}
