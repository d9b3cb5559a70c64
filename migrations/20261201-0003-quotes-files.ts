import { DataTypes, type QueryInterface } from 'sequelize';

/** The plant's price book, immutable quote revisions, and builders' plan files. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('price_books', {
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
  await qi.createTable('quotes', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plant_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'plants', key: 'id' },
      onDelete: 'CASCADE',
    },
    order_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'orders', key: 'id' },
      onDelete: 'CASCADE',
    },
    number: { type: DataTypes.INTEGER, allowNull: false },
    reference: { type: DataTypes.STRING(40), allowNull: false },
    snapshot: { type: DataTypes.JSONB, allowNull: false },
    total: { type: DataTypes.DECIMAL(14, 2), allowNull: false },
    deposit_due: { type: DataTypes.DECIMAL(14, 2), allowNull: false },
    valid_until: { type: DataTypes.DATEONLY, allowNull: false },
    created_by: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    sent_at: { type: DataTypes.DATE, allowNull: true },
    sent_to: { type: DataTypes.STRING(200), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('quotes', ['order_id', 'number'], { unique: true });
  // A quote is a snapshot: its contents never change after it is written (only sent_at/sent_to).
  await qi.sequelize.query(`
    CREATE FUNCTION quotes_immutable() RETURNS trigger AS $$
    BEGIN
      IF NEW.snapshot IS DISTINCT FROM OLD.snapshot OR NEW.total IS DISTINCT FROM OLD.total
         OR NEW.deposit_due IS DISTINCT FROM OLD.deposit_due OR NEW.valid_until IS DISTINCT FROM OLD.valid_until
         OR NEW.number IS DISTINCT FROM OLD.number OR NEW.order_id IS DISTINCT FROM OLD.order_id THEN
        RAISE EXCEPTION 'quote revisions are immutable';
      END IF;
      RETURN NEW;
    END $$ LANGUAGE plpgsql;
    CREATE TRIGGER quotes_immutable BEFORE UPDATE ON quotes FOR EACH ROW EXECUTE FUNCTION quotes_immutable();
  `);
  await qi.createTable('stored_files', {
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
    original_name: { type: DataTypes.STRING(255), allowNull: false },
    stored_name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    content_type: { type: DataTypes.STRING(40), allowNull: false },
    size: { type: DataTypes.INTEGER, allowNull: false },
    uploaded_by: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('stored_files', ['job_id']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('stored_files');
  await qi.sequelize.query(
    'DROP TRIGGER IF EXISTS quotes_immutable ON quotes; DROP FUNCTION IF EXISTS quotes_immutable();',
  );
  await qi.dropTable('quotes');
  await qi.dropTable('price_books');
}
