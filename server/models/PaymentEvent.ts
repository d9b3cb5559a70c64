import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A payment-service webhook event already handled (its id is the primary key: once only). */
export class PaymentEvent extends Model<
  InferAttributes<PaymentEvent>,
  InferCreationAttributes<PaymentEvent>
> {
  declare id: string;
  declare type: string;
  declare orderId: number | null;
  declare receivedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    PaymentEvent.init(
      {
        id: { type: DataTypes.STRING(80), primaryKey: true },
        type: { type: DataTypes.STRING(60), allowNull: false },
        orderId: { type: DataTypes.INTEGER, allowNull: true },
        receivedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'payment_events', underscored: true, timestamps: false },
    );
  }
}
