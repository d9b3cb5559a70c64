import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type PaymentKind = 'deposit' | 'offline' | 'refund';
export type PaymentMethod = 'card' | 'cheque' | 'transfer' | 'cash';
export type PaymentStatus = 'pending' | 'succeeded' | 'failed';

/**
 * Money in or out of an order, in cents: a card deposit through the payment service (pending
 * while its checkout session is open), an offline payment the desk records, or a refund.
 */
export class Payment extends Model<InferAttributes<Payment>, InferCreationAttributes<Payment>> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare orderId: number;
  declare quoteId: number | null;
  declare kind: PaymentKind;
  declare method: PaymentMethod;
  declare amountCents: number;
  declare currency: string;
  declare status: PaymentStatus;
  declare providerSessionId: CreationOptional<string | null>;
  declare providerPaymentIntentId: CreationOptional<string | null>;
  declare providerRefundId: CreationOptional<string | null>;
  declare reference: CreationOptional<string | null>;
  declare receiptNumber: CreationOptional<string | null>;
  declare recordedBy: CreationOptional<number | null>;
  declare paidAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Payment.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false },
        orderId: { type: DataTypes.INTEGER, allowNull: false },
        quoteId: { type: DataTypes.INTEGER, allowNull: true },
        kind: { type: DataTypes.STRING(12), allowNull: false },
        method: { type: DataTypes.STRING(12), allowNull: false },
        amountCents: { type: DataTypes.INTEGER, allowNull: false },
        currency: { type: DataTypes.STRING(3), allowNull: false },
        status: { type: DataTypes.STRING(12), allowNull: false },
        providerSessionId: { type: DataTypes.STRING(80), allowNull: true },
        providerPaymentIntentId: { type: DataTypes.STRING(80), allowNull: true },
        providerRefundId: { type: DataTypes.STRING(80), allowNull: true },
        reference: { type: DataTypes.STRING(120), allowNull: true },
        receiptNumber: { type: DataTypes.STRING(30), allowNull: true },
        recordedBy: { type: DataTypes.INTEGER, allowNull: true },
        paidAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'payments', underscored: true },
    );
  }
}
