import { DataTypes, type QueryInterface } from 'sequelize';

const STAGES = ['cut', 'assembled', 'banded', 'loaded', 'delivered'] as const;
const ref = (model: string, onDelete: 'CASCADE' | 'SET NULL' = 'CASCADE') => ({
  references: { model, key: 'id' },
  onDelete,
});

/**
 * Production planning: the plant's production settings, promised and planned dates and release on
 * orders, the persisted schedule, progress counts per truss line (each floor change recorded once
 * by its client id) and the quality-control inspection log.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('production_settings', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plant_id: { type: DataTypes.INTEGER, allowNull: false, unique: true, ...ref('plants') },
    data: { type: DataTypes.JSONB, allowNull: false },
    updated_by: { type: DataTypes.INTEGER, allowNull: true, ...ref('users', 'SET NULL') },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addColumn('orders', 'promised_on', { type: DataTypes.DATEONLY, allowNull: true });
  await qi.addColumn('orders', 'released_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('orders', 'on_hold', {
    type: DataTypes.BOOLEAN,
    allowNull: false,
    defaultValue: false,
  });
  await qi.addColumn('orders', 'hold_reason', { type: DataTypes.TEXT, allowNull: true });
  await qi.addColumn('orders', 'schedule_pin', { type: DataTypes.JSONB, allowNull: true });
  await qi.addColumn('orders', 'planned_finish_on', { type: DataTypes.DATEONLY, allowNull: true });
  await qi.addColumn('orders', 'planned_late', {
    type: DataTypes.BOOLEAN,
    allowNull: false,
    defaultValue: false,
  });
  for (const s of STAGES) {
    await qi.addColumn('order_lines', `${s}_count`, {
      type: DataTypes.INTEGER,
      allowNull: false,
      defaultValue: 0,
    });
    // Counts never exceed the line's quantity, whatever writes them.
    await qi.sequelize.query(
      `ALTER TABLE order_lines ADD CONSTRAINT order_lines_${s}_count_range CHECK (${s}_count BETWEEN 0 AND quantity)`,
    );
  }
  await qi.createTable('schedule_placements', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plant_id: { type: DataTypes.INTEGER, allowNull: false, ...ref('plants') },
    order_id: { type: DataTypes.INTEGER, allowNull: false, ...ref('orders') },
    order_line_id: { type: DataTypes.INTEGER, allowNull: false, ...ref('order_lines') },
    mark: { type: DataTypes.STRING(12), allowNull: false },
    table_id: { type: DataTypes.INTEGER, allowNull: false },
    on_date: { type: DataTypes.DATEONLY, allowNull: false },
    minutes: { type: DataTypes.DOUBLE, allowNull: false },
    setup_minutes: { type: DataTypes.DOUBLE, allowNull: false },
    quantity: { type: DataTypes.INTEGER, allowNull: false },
    pinned: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
  });
  await qi.addIndex('schedule_placements', ['plant_id', 'on_date']);
  await qi.addIndex('schedule_placements', ['order_id']);
  await qi.createTable('progress_events', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plant_id: { type: DataTypes.INTEGER, allowNull: false, ...ref('plants') },
    order_line_id: { type: DataTypes.INTEGER, allowNull: false, ...ref('order_lines') },
    client_id: { type: DataTypes.UUID, allowNull: false, unique: true },
    stage: { type: DataTypes.STRING(12), allowNull: false },
    delta: { type: DataTypes.INTEGER, allowNull: false },
    actor_id: { type: DataTypes.INTEGER, allowNull: true, ...ref('users', 'SET NULL') },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.createTable('inspections', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plant_id: { type: DataTypes.INTEGER, allowNull: false, ...ref('plants') },
    table_id: { type: DataTypes.INTEGER, allowNull: false },
    order_line_id: { type: DataTypes.INTEGER, allowNull: true, ...ref('order_lines', 'SET NULL') },
    truss: { type: DataTypes.STRING(60), allowNull: false },
    checks: { type: DataTypes.JSONB, allowNull: false },
    passed: { type: DataTypes.BOOLEAN, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: true },
    inspector_id: { type: DataTypes.INTEGER, allowNull: true, ...ref('users', 'SET NULL') },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('inspections', ['plant_id', 'table_id', 'created_at']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('inspections');
  await qi.dropTable('progress_events');
  await qi.dropTable('schedule_placements');
  for (const s of STAGES) {
    await qi.sequelize.query(
      `ALTER TABLE order_lines DROP CONSTRAINT order_lines_${s}_count_range`,
    );
    await qi.removeColumn('order_lines', `${s}_count`);
  }
  for (const c of [
    'planned_late',
    'planned_finish_on',
    'schedule_pin',
    'hold_reason',
    'on_hold',
    'released_at',
    'promised_on',
  ])
    await qi.removeColumn('orders', c);
  await qi.dropTable('production_settings');
}
