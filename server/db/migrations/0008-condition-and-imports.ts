import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false };
const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const text = { type: DataTypes.TEXT, allowNull: true };
const real = { type: DataTypes.REAL, allowNull: true };
const printRef = {
  type: DataTypes.INTEGER,
  allowNull: false,
  references: { model: 'prints', key: 'id' },
  onDelete: 'CASCADE',
  onUpdate: 'CASCADE',
};
const userRef = {
  type: DataTypes.INTEGER,
  allowNull: true,
  references: { model: 'users', key: 'id' },
  onDelete: 'SET NULL',
  onUpdate: 'CASCADE',
};
/** Attached images are kept as JSON ({ assetId, area | stage }) so this migration does not depend on the assets table's number. */
const images = { type: DataTypes.JSON, allowNull: false, defaultValue: '[]' };

/** Condition reports, treatments, CSV import jobs and their saved column mappings. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('condition_reports', {
    id,
    print_id: printRef,
    reported_on: { type: DataTypes.DATEONLY, allowNull: false },
    reported_by: userRef,
    grade: { type: DataTypes.STRING(20), allowNull: true },
    observations: { type: DataTypes.JSON, allowNull: false, defaultValue: '[]' },
    notes: text,
    recommendation: text,
    temperature_c: real,
    relative_humidity: real,
    images,
    ...timestamps,
  });
  await qi.addIndex('condition_reports', ['print_id', 'reported_on']);
  await qi.createTable('treatments', {
    id,
    print_id: printRef,
    treated_on: { type: DataTypes.DATEONLY, allowNull: false },
    treated_by: userRef,
    action: { type: DataTypes.TEXT, allowNull: false },
    materials: text,
    notes: text,
    images,
    ...timestamps,
  });
  await qi.addIndex('treatments', ['print_id', 'treated_on']);
  await qi.createTable('import_jobs', {
    id,
    status: { type: DataTypes.STRING(20), allowNull: false },
    dry_run: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    file_name: text,
    encoding: { type: DataTypes.STRING(20), allowNull: true },
    mapping: { type: DataTypes.JSON, allowNull: false },
    headers: { type: DataTypes.JSON, allowNull: false, defaultValue: '[]' },
    rows: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    processed: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    imported: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    updated: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    unchanged: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    failed: { type: DataTypes.JSON, allowNull: false, defaultValue: '[]' },
    preview: { type: DataTypes.JSON, allowNull: false, defaultValue: '[]' },
    error: text,
    created_by: userRef,
    finished_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.createTable('import_mappings', {
    id,
    headers_key: { type: DataTypes.TEXT, allowNull: false, unique: true },
    mapping: { type: DataTypes.JSON, allowNull: false },
    ...timestamps,
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  for (const table of ['import_mappings', 'import_jobs', 'treatments', 'condition_reports']) {
    await qi.dropTable(table);
  }
}
