import { DataTypes, type QueryInterface } from 'sequelize';

const ref = (model: string, onDelete: 'CASCADE' | 'SET NULL' | 'RESTRICT', allowNull = true) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model, key: 'id' },
  onDelete,
  onUpdate: 'CASCADE',
});
const real = { type: DataTypes.REAL, allowNull: true };

/**
 * Loans and exhibitions: dates, opening hours and agreed conditions, a stage, who signed the
 * conditions; their prints in order with the condition reports at departure and return and
 * the place each left from (the way back).
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('loans', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    title: { type: DataTypes.TEXT, allowNull: false },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    venue: { type: DataTypes.TEXT, allowNull: false },
    contact: { type: DataTypes.TEXT, allowNull: true },
    starts_on: { type: DataTypes.DATEONLY, allowNull: false },
    ends_on: { type: DataTypes.DATEONLY, allowNull: false },
    hours_per_day: { type: DataTypes.REAL, allowNull: false },
    max_lux: { type: DataTypes.REAL, allowNull: false },
    max_uv: real,
    temperature_min: real,
    temperature_max: real,
    humidity_min: real,
    humidity_max: real,
    stage: { type: DataTypes.STRING(20), allowNull: false },
    conditions_signed_by: ref('users', 'SET NULL'),
    conditions_signed_on: { type: DataTypes.DATEONLY, allowNull: true },
    away_location_id: ref('locations', 'RESTRICT'),
    created_by: ref('users', 'SET NULL'),
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.createTable('loan_prints', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    loan_id: ref('loans', 'CASCADE', false),
    print_id: ref('prints', 'CASCADE', false),
    position: { type: DataTypes.INTEGER, allowNull: false },
    departure_report_id: ref('condition_reports', 'SET NULL'),
    return_report_id: ref('condition_reports', 'SET NULL'),
    left_from_location_id: ref('locations', 'SET NULL'),
  });
  await qi.addIndex('loan_prints', ['loan_id', 'print_id'], {
    unique: true,
    name: 'loan_prints_loan_print',
  });
  await qi.addIndex('loan_prints', ['print_id'], { name: 'loan_prints_print' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('loan_prints');
  await qi.dropTable('loans');
}
