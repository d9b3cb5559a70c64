import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** What to render and attach when the message is sent (rendered by the worker, not stored). */
export type MailAttachment =
  { type: 'quote'; quoteId: number } | { type: 'receipt'; paymentId: number };
export type MailStatus = 'queued' | 'retrying' | 'sent' | 'failed';

/**
 * The mail outbox: one row per message, written in the same transaction as the change that causes
 * it; the queue's worker sends it and records its delivery state for the desk.
 */
export class MailMessage extends Model<
  InferAttributes<MailMessage>,
  InferCreationAttributes<MailMessage>
> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare orderId: number | null;
  declare kind: string;
  declare toAddress: string;
  declare subject: string;
  declare body: string;
  declare attachment: MailAttachment | null;
  declare status: CreationOptional<MailStatus>;
  declare attempts: CreationOptional<number>;
  declare lastError: CreationOptional<string | null>;
  declare jobId: CreationOptional<string | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    MailMessage.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false },
        orderId: { type: DataTypes.INTEGER, allowNull: true },
        kind: { type: DataTypes.STRING(30), allowNull: false },
        toAddress: { type: DataTypes.STRING(400), allowNull: false },
        subject: { type: DataTypes.STRING(300), allowNull: false },
        body: { type: DataTypes.TEXT, allowNull: false },
        attachment: { type: DataTypes.JSONB, allowNull: true },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'queued' },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastError: { type: DataTypes.TEXT, allowNull: true },
        jobId: { type: DataTypes.STRING(40), allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'mail_messages', underscored: true },
    );
  }
}
