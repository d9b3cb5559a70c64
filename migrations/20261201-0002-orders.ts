import { DataTypes, type QueryInterface } from 'sequelize';

/** Builder contacts, job design criteria, plant settings, orders and their truss lines. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('plants', 'settings', {
    type: DataTypes.JSONB,
    allowNull: false,
    defaultValue: {},
  });
  await qi.addColumn('plants', 'next_order_number', {
    type: DataTypes.INTEGER,
    allowNull: false,
    defaultValue: 1,
  });
  await qi.addColumn('customers', 'contacts', {
    type: DataTypes.JSONB,
    allowNull: false,
    defaultValue: [],
  });
  await qi.addColumn('jobs', 'criteria', {
    type: DataTypes.JSONB,
    allowNull: false,
    defaultValue: {},
  });
  await qi.createTable('orders', {
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
    job_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'jobs', key: 'id' },
      onDelete: 'CASCADE',
    },
    number: { type: DataTypes.STRING(20), allowNull: false },
    status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'draft' },
    created_by: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('orders', ['plant_id', 'number'], { unique: true });
  await qi.addIndex('orders', ['plant_id', 'status']);
  await qi.addIndex('orders', ['job_id']);
  await qi.createTable('order_lines', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    order_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'orders', key: 'id' },
      onDelete: 'CASCADE',
    },
    position: { type: DataTypes.INTEGER, allowNull: false },
    mark: { type: DataTypes.STRING(12), allowNull: false },
    quantity: { type: DataTypes.INTEGER, allowNull: false },
    plies: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    profile: { type: DataTypes.STRING(20), allowNull: false },
    design_input: { type: DataTypes.JSONB, allowNull: false },
    design_result: { type: DataTypes.JSONB, allowNull: false },
    engine_version: { type: DataTypes.STRING(20), allowNull: false },
    design_ok: { type: DataTypes.BOOLEAN, allowNull: false },
    max_csi: { type: DataTypes.DOUBLE, allowNull: true },
    warning_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    description: { type: DataTypes.STRING(120), allowNull: false },
    review_state: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'pending' },
    review_comment: { type: DataTypes.TEXT, allowNull: true },
    reviewed_by: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    reviewed_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('order_lines', ['order_id', 'position']);
  await qi.addIndex('order_lines', ['review_state']);
  await qi.sequelize.query(
    `ALTER TABLE order_lines ADD CONSTRAINT order_lines_review_state CHECK (review_state IN ('pending','approved','returned'))`,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('order_lines');
  await qi.dropTable('orders');
  await qi.removeColumn('jobs', 'criteria');
  await qi.removeColumn('customers', 'contacts');
  await qi.removeColumn('plants', 'next_order_number');
  await qi.removeColumn('plants', 'settings');
}
