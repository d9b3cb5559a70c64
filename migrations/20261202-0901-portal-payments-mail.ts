import { DataTypes, type QueryInterface } from 'sequelize';

const ref = (model: string, onDelete = 'CASCADE') => ({
  references: { model, key: 'id' },
  onDelete,
});

/** Quote acceptances, payments (card, offline, refunds), payment webhook events and the mail outbox. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('quote_acceptances', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plant_id: { type: DataTypes.INTEGER, allowNull: false, ...ref('plants') },
    // One acceptance per order: accepting twice changes nothing.
    order_id: { type: DataTypes.INTEGER, allowNull: false, unique: true, ...ref('orders') },
    quote_id: { type: DataTypes.INTEGER, allowNull: false, ...ref('quotes') },
    user_id: { type: DataTypes.INTEGER, allowNull: true, ...ref('users', 'SET NULL') },
    name: { type: DataTypes.STRING(120), allowNull: false },
    on_behalf: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    method: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'portal' },
    ip: { type: DataTypes.STRING(64), allowNull: true },
    accepted_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.createTable('payments', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plant_id: { type: DataTypes.INTEGER, allowNull: false, ...ref('plants') },
    order_id: { type: DataTypes.INTEGER, allowNull: false, ...ref('orders') },
    quote_id: { type: DataTypes.INTEGER, allowNull: true, ...ref('quotes', 'SET NULL') },
    kind: { type: DataTypes.STRING(12), allowNull: false },
    method: { type: DataTypes.STRING(12), allowNull: false },
    amount_cents: { type: DataTypes.INTEGER, allowNull: false },
    currency: { type: DataTypes.STRING(3), allowNull: false },
    status: { type: DataTypes.STRING(12), allowNull: false },
    provider_session_id: { type: DataTypes.STRING(80), allowNull: true, unique: true },
    provider_payment_intent_id: { type: DataTypes.STRING(80), allowNull: true },
    provider_refund_id: { type: DataTypes.STRING(80), allowNull: true, unique: true },
    reference: { type: DataTypes.STRING(120), allowNull: true },
    receipt_number: { type: DataTypes.STRING(30), allowNull: true, unique: true },
    recorded_by: { type: DataTypes.INTEGER, allowNull: true, ...ref('users', 'SET NULL') },
    paid_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('payments', ['order_id']);
  await qi.createTable('payment_events', {
    // The provider's event id: recorded once, so a replayed event changes nothing.
    id: { type: DataTypes.STRING(80), primaryKey: true },
    type: { type: DataTypes.STRING(60), allowNull: false },
    order_id: { type: DataTypes.INTEGER, allowNull: true, ...ref('orders', 'SET NULL') },
    received_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.createTable('mail_messages', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plant_id: { type: DataTypes.INTEGER, allowNull: false, ...ref('plants') },
    order_id: { type: DataTypes.INTEGER, allowNull: true, ...ref('orders', 'SET NULL') },
    kind: { type: DataTypes.STRING(30), allowNull: false },
    to_address: { type: DataTypes.STRING(400), allowNull: false },
    subject: { type: DataTypes.STRING(300), allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false },
    attachment: { type: DataTypes.JSONB, allowNull: true },
    status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'queued' },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    last_error: { type: DataTypes.TEXT, allowNull: true },
    job_id: { type: DataTypes.STRING(40), allowNull: true },
    sent_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('mail_messages', ['order_id']);
  await qi.addIndex('mail_messages', ['status']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('mail_messages');
  await qi.dropTable('payment_events');
  await qi.dropTable('payments');
  await qi.dropTable('quote_acceptances');
}
