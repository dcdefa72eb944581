import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false };
const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const text = (allowNull = true) => ({ type: DataTypes.TEXT, allowNull });
const real = { type: DataTypes.REAL, allowNull: true };
const reference = (table: string, onDelete: 'RESTRICT' | 'CASCADE' | 'SET NULL' = 'RESTRICT') => ({
  type: DataTypes.INTEGER,
  allowNull: onDelete === 'CASCADE' ? false : true,
  references: { model: table, key: 'id' },
  onDelete,
  onUpdate: 'CASCADE',
});

/** Users, sessions, the reference lists, prints with their processing, and the audit trail. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('users', {
    id,
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: text(false),
    role: { type: DataTypes.STRING(20), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    last_sign_in_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.createTable('sessions', {
    sid: { type: DataTypes.STRING(36), primaryKey: true },
    expires: { type: DataTypes.DATE, allowNull: true },
    data: text(),
    ...timestamps,
  });
  await qi.createTable('papers', {
    id,
    name: { type: DataTypes.STRING(120), allowNull: false, unique: true },
    manufacturer: text(),
    fibre: text(),
    weight_gsm: real,
    surface: text(),
    sizing: text(),
    notes: text(),
    ...timestamps,
  });
  await qi.createTable('negatives', {
    id,
    code: { type: DataTypes.STRING(40), allowNull: false, unique: true },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    format: text(),
    subject: text(),
    density_range: real,
    notes: text(),
    ...timestamps,
  });
  await qi.createTable('locations', {
    id,
    code: { type: DataTypes.STRING(40), allowNull: false, unique: true },
    name: text(false),
    parent_id: reference('locations'),
    notes: text(),
    ...timestamps,
  });
  await qi.createTable('solution_batches', {
    id,
    code: { type: DataTypes.STRING(40), allowNull: false, unique: true },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    chemical: text(false),
    concentration_percent: real,
    volume_ml: real,
    made_on: { type: DataTypes.DATEONLY, allowNull: true },
    made_by: text(),
    notes: text(),
    exhausted_on: { type: DataTypes.DATEONLY, allowNull: true },
    ...timestamps,
  });
  await qi.createTable('accession_counters', {
    year: { type: DataTypes.INTEGER, primaryKey: true },
    last: { type: DataTypes.INTEGER, allowNull: false },
  });
  await createPrints(qi);
  await qi.createTable('audit_events', {
    id,
    at: { type: DataTypes.DATE, allowNull: false },
    user_id: reference('users', 'SET NULL'),
    action: { type: DataTypes.STRING(40), allowNull: false },
    entity: { type: DataTypes.STRING(40), allowNull: false },
    entity_id: { type: DataTypes.INTEGER, allowNull: false },
    before: { type: DataTypes.JSON, allowNull: true },
    after: { type: DataTypes.JSON, allowNull: true },
  });
  await qi.addIndex('audit_events', ['entity', 'entity_id']);
}

async function createPrints(qi: QueryInterface): Promise<void> {
  await qi.createTable('prints', {
    id,
    accession_number: { type: DataTypes.STRING(32), allowNull: false, unique: true },
    title: text(false),
    maker: text(),
    made_on: text(),
    made_from: { type: DataTypes.DATEONLY, allowNull: true },
    made_to: { type: DataTypes.DATEONLY, allowNull: true },
    process: { type: DataTypes.STRING(40), allowNull: false },
    paper_id: reference('papers'),
    negative_id: reference('negatives'),
    location_id: reference('locations'),
    image_width_mm: real,
    image_height_mm: real,
    sheet_width_mm: real,
    sheet_height_mm: real,
    edition: text(),
    status: { type: DataTypes.STRING(20), allowNull: false },
    description: text(),
    tags: { type: DataTypes.JSON, allowNull: false, defaultValue: '[]' },
    fixing_minutes: real,
    washing_minutes: real,
    tone_status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'unchecked' },
    next_check_due: { type: DataTypes.DATEONLY, allowNull: true },
    has_processing_risk: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    risk_reasons: { type: DataTypes.JSON, allowNull: false, defaultValue: '[]' },
    created_by: reference('users', 'SET NULL'),
    ...timestamps,
    deleted_at: { type: DataTypes.DATE, allowNull: true },
  });
  for (const column of [
    'process',
    'paper_id',
    'fixing_minutes',
    'washing_minutes',
    'tone_status',
    'made_from',
    'deleted_at',
  ]) {
    await qi.addIndex('prints', [column]);
  }
  await qi.createTable('processing_steps', {
    id,
    print_id: reference('prints', 'CASCADE'),
    position: { type: DataTypes.INTEGER, allowNull: false },
    stage: { type: DataTypes.STRING(20), allowNull: false },
    chemical: text(),
    concentration_percent: real,
    solution_batch_id: reference('solution_batches'),
    method: text(),
    coats: { type: DataTypes.INTEGER, allowNull: true },
    minutes: real,
    temperature_c: real,
    light_source: text(),
    notes: text(),
  });
  await qi.addIndex('processing_steps', ['print_id', 'position'], { unique: true });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  for (const table of [
    'audit_events',
    'processing_steps',
    'prints',
    'accession_counters',
    'solution_batches',
    'locations',
    'negatives',
    'papers',
    'sessions',
    'users',
  ]) {
    await qi.dropTable(table);
  }
}
