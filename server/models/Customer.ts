import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Plant } from './Plant';
import type { Contact } from '../../shared/api/customers';

/** A builder's company, customer of one plant. */
export class Customer extends Model<InferAttributes<Customer>, InferCreationAttributes<Customer>> {
  declare id: CreationOptional<number>;
  declare plantId: ForeignKey<Plant['id']>;
  declare name: string;
  declare email: string;
  declare phone: string | null;
  declare terms: 'account' | 'deposit';
  declare billingAddress: string | null;
  declare city: string | null;
  declare contacts: CreationOptional<Contact[]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Customer.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(160), allowNull: false },
        email: { type: DataTypes.STRING(200), allowNull: false },
        phone: { type: DataTypes.STRING(40), allowNull: true },
        terms: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'deposit' },
        billingAddress: { type: DataTypes.TEXT, allowNull: true },
        city: { type: DataTypes.STRING(120), allowNull: true },
        contacts: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'customers', underscored: true },
    );
  }
}
