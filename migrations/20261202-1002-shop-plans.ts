import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * An order's stored shop plan (cut list and lumber plan, made by the shop-plan job) with what it
 * was made from, and the state of the run that makes the next one.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('shop_plans', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    order_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      unique: true,
      references: { model: 'orders', key: 'id' },
      onDelete: 'CASCADE',
    },
    plant_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'plants', key: 'id' },
      onDelete: 'CASCADE',
    },
    cut_list: { type: DataTypes.JSONB, allowNull: true },
    lumber_plan: { type: DataTypes.JSONB, allowNull: true },
    engine_version: { type: DataTypes.STRING(20), allowNull: true },
    designs_hash: { type: DataTypes.STRING(64), allowNull: true },
    stock_hash: { type: DataTypes.STRING(64), allowNull: true },
    made_at: { type: DataTypes.DATE, allowNull: true },
    run_state: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'idle' },
    run_progress: { type: DataTypes.JSONB, allowNull: true },
    run_error: { type: DataTypes.TEXT, allowNull: true },
    requested_at: { type: DataTypes.DATE, allowNull: true },
    requested_by: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    job_id: { type: DataTypes.STRING(64), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('shop_plans', ['run_state', 'job_id'], { name: 'shop_plans_waiting' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('shop_plans');
}
