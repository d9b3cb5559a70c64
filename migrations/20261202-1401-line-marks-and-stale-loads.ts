import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Truss marks are unique within an order (they go on tags and placement plans), compared without
 * case; and a line remembers that its job's design loads changed after it was designed.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  // Existing duplicates get a suffix first, so the index can be built on a live database.
  await qi.sequelize.query(`
    WITH d AS (
      SELECT id, mark, row_number() OVER (PARTITION BY order_id, upper(mark) ORDER BY position, id) AS n
      FROM order_lines
    )
    UPDATE order_lines l SET mark = left(d.mark, 9) || '-' || d.n
    FROM d WHERE l.id = d.id AND d.n > 1`);
  await qi.sequelize.query(
    'CREATE UNIQUE INDEX order_lines_mark_unique ON order_lines (order_id, upper(mark))',
  );
  await qi.addColumn('order_lines', 'loads_out_of_date', {
    type: DataTypes.BOOLEAN,
    allowNull: false,
    defaultValue: false,
  });
  await qi.addColumn('order_lines', 'out_of_date_reason', {
    type: DataTypes.TEXT,
    allowNull: true,
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('order_lines', 'out_of_date_reason');
  await qi.removeColumn('order_lines', 'loads_out_of_date');
  await qi.sequelize.query('DROP INDEX IF EXISTS order_lines_mark_unique');
}
