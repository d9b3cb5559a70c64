import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Orders get a version the desk and the floor send back with a change (409 when stale). The
 * database raises it whenever one of the order's own columns changes, however written (status,
 * promised date, hold, …). Touching only `updated_at` (a line edited, a floor count, an audit entry)
 * or the planner's columns (planned finish, late flag, a board pin) leaves it alone, so the floor's
 * taps and the foreman's moves never make the desk's open page stale.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('orders', 'version', {
    type: DataTypes.INTEGER,
    allowNull: false,
    defaultValue: 1,
  });
  await qi.sequelize.query(`
    CREATE FUNCTION orders_bump_version() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF (to_jsonb(NEW) - '{updated_at,planned_finish_on,planned_late,schedule_pin,version}'::text[])
         IS DISTINCT FROM
         (to_jsonb(OLD) - '{updated_at,planned_finish_on,planned_late,schedule_pin,version}'::text[])
      THEN
        NEW.version := OLD.version + 1;
      END IF;
      RETURN NEW;
    END $$;
    CREATE TRIGGER orders_version BEFORE UPDATE ON orders
      FOR EACH ROW EXECUTE FUNCTION orders_bump_version();`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(`
    DROP TRIGGER IF EXISTS orders_version ON orders;
    DROP FUNCTION IF EXISTS orders_bump_version();`);
  await qi.removeColumn('orders', 'version');
}
