import { DataTypes, type QueryInterface } from 'sequelize';

/** Failed sign-in counters, in the database so every app server counts the same attempts. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('sign_in_limits', {
    key: { type: DataTypes.STRING(400), primaryKey: true },
    failures: { type: DataTypes.INTEGER, allowNull: false },
    window_start: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('sign_in_limits', ['window_start']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('sign_in_limits');
}
