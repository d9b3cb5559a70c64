import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};

/** Plants, builder companies, users, jobs, the audit trail and the session store. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('plants', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    units: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'imperial' },
    address: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await qi.createTable('customers', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plant_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'plants', key: 'id' },
      onDelete: 'CASCADE',
    },
    name: { type: DataTypes.STRING(160), allowNull: false },
    email: { type: DataTypes.STRING(200), allowNull: false },
    phone: { type: DataTypes.STRING(40), allowNull: true },
    terms: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'deposit' },
    billing_address: { type: DataTypes.TEXT, allowNull: true },
    city: { type: DataTypes.STRING(120), allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('customers', ['plant_id', 'name']);
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plant_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'plants', key: 'id' },
      onDelete: 'CASCADE',
    },
    customer_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'customers', key: 'id' },
      onDelete: 'CASCADE',
    },
    email: { type: DataTypes.STRING(200), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.STRING(20), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    last_sign_in_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.sequelize.query(
    `ALTER TABLE users ADD CONSTRAINT users_role_check CHECK (role IN ('admin','sales','engineer','foreman','builder'))`,
  );
  await qi.sequelize.query(
    `ALTER TABLE users ADD CONSTRAINT users_builder_customer CHECK ((role = 'builder') = (customer_id IS NOT NULL))`,
  );
  await qi.createTable('jobs', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plant_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'plants', key: 'id' },
      onDelete: 'CASCADE',
    },
    customer_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'customers', key: 'id' },
      onDelete: 'CASCADE',
    },
    name: { type: DataTypes.STRING(160), allowNull: false },
    address: { type: DataTypes.TEXT, allowNull: false },
    plan_revision: { type: DataTypes.STRING(40), allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('jobs', ['plant_id', 'customer_id']);
  await qi.createTable('audit_events', {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    plant_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'plants', key: 'id' },
      onDelete: 'CASCADE',
    },
    actor_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    action: { type: DataTypes.STRING(60), allowNull: false },
    subject_type: { type: DataTypes.STRING(40), allowNull: false },
    subject_id: { type: DataTypes.INTEGER, allowNull: true },
    data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('audit_events', ['plant_id', 'subject_type', 'subject_id']);
  // The session store's table (connect-pg-simple's documented schema).
  await qi.createTable('session', {
    sid: { type: DataTypes.STRING, primaryKey: true },
    sess: { type: DataTypes.JSON, allowNull: false },
    expire: { type: DataTypes.DATE(6), allowNull: false },
  });
  await qi.addIndex('session', ['expire'], { name: 'IDX_session_expire' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const t of ['session', 'audit_events', 'jobs', 'users', 'customers', 'plants']) {
    await qi.dropTable(t);
  }
}
