import { DataTypes, type QueryInterface } from 'sequelize';

/** Each truss line's design version: raised by every design change, named by every review. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('order_lines', 'design_version', {
    type: DataTypes.INTEGER,
    allowNull: false,
    defaultValue: 1,
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('order_lines', 'design_version');
}
