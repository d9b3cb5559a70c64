import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Quote } from './Quote';

/** How a quote was accepted: the builder in the portal, or the desk on the builder's behalf. */
export type AcceptanceMethod = 'portal' | 'phone' | 'paper' | 'email';

/** The acceptance of one revision of an order: who, when, from which address, which revision. */
export class QuoteAcceptance extends Model<
  InferAttributes<QuoteAcceptance>,
  InferCreationAttributes<QuoteAcceptance>
> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare orderId: number;
  declare quoteId: number;
  declare userId: number | null;
  declare name: string;
  declare onBehalf: boolean;
  declare method: AcceptanceMethod;
  declare ip: string | null;
  declare acceptedAt: CreationOptional<Date>;
  declare quote?: NonAttribute<Quote>;

  static initModel(sequelize: Sequelize) {
    QuoteAcceptance.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false },
        orderId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
        quoteId: { type: DataTypes.INTEGER, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        onBehalf: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        method: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'portal' },
        ip: { type: DataTypes.STRING(64), allowNull: true },
        acceptedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      {
        sequelize,
        tableName: 'quote_acceptances',
        underscored: true,
        timestamps: false,
      },
    );
  }
}
