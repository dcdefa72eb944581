import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false };
const text = { type: DataTypes.TEXT, allowNull: true };
const reference = (table: string, onDelete: 'CASCADE' | 'SET NULL') => ({
  type: DataTypes.INTEGER,
  allowNull: onDelete !== 'CASCADE',
  references: { model: table, key: 'id' },
  onDelete,
  onUpdate: 'CASCADE',
});

/**
 * Tone watch: checks with their readings (kept as JSON on the check: a check is always read
 * and written whole, and re-evaluating 100,000 prints reads one row per check), alerts,
 * settings, and the evaluation stored on each print so lists sort and filter in SQL.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('tone_checks', {
    id,
    print_id: reference('prints', 'CASCADE'),
    checked_on: { type: DataTypes.DATEONLY, allowNull: false },
    checked_by: reference('users', 'SET NULL'),
    method: { type: DataTypes.STRING(40), allowNull: false },
    instrument: text,
    illuminant: { type: DataTypes.STRING(10), allowNull: false },
    observer: { type: DataTypes.STRING(4), allowNull: false },
    baseline: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    notes: text,
    readings: { type: DataTypes.JSON, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('tone_checks', ['print_id', 'checked_on']);

  await qi.createTable('alerts', {
    id,
    print_id: reference('prints', 'CASCADE'),
    kind: { type: DataTypes.STRING(30), allowNull: false },
    reason: { type: DataTypes.TEXT, allowNull: false },
    opened_at: { type: DataTypes.DATE, allowNull: false },
    acknowledged_at: { type: DataTypes.DATE, allowNull: true },
    acknowledged_by: reference('users', 'SET NULL'),
  });
  await qi.addIndex('alerts', ['acknowledged_at', 'opened_at']);
  await qi.addIndex('alerts', ['print_id', 'kind']);

  await qi.createTable('settings', {
    key: { type: DataTypes.STRING(60), primaryKey: true, allowNull: false },
    value: { type: DataTypes.JSON, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });

  await qi.addColumn('prints', 'tone_baseline_on', { type: DataTypes.DATEONLY, allowNull: true });
  await qi.addColumn('prints', 'tone_flags', {
    type: DataTypes.JSON,
    allowNull: false,
    defaultValue: '[]',
  });
  await qi.addColumn('prints', 'tone_urgency', {
    type: DataTypes.REAL,
    allowNull: false,
    defaultValue: 0,
  });
  await qi.addColumn('prints', 'tone_rate_per_year', { type: DataTypes.REAL, allowNull: true });
  await qi.addIndex('prints', ['deleted_at', 'tone_urgency'], { name: 'prints_live_urgency' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeIndex('prints', 'prints_live_urgency');
  for (const column of ['tone_rate_per_year', 'tone_urgency', 'tone_flags', 'tone_baseline_on']) {
    await qi.removeColumn('prints', column);
  }
  for (const table of ['settings', 'alerts', 'tone_checks']) await qi.dropTable(table);
}
