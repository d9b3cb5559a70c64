import { DataTypes, type QueryInterface } from 'sequelize';

/** The plant's lumber stock settings: stock lengths, prices and counts per lumber, kerf, trim. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('stock_settings', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plant_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      unique: true,
      references: { model: 'plants', key: 'id' },
      onDelete: 'CASCADE',
    },
    data: { type: DataTypes.JSONB, allowNull: false },
    updated_by: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('stock_settings');
}
