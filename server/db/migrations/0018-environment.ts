import { DataTypes, type QueryInterface } from 'sequelize';

const location = {
  type: DataTypes.INTEGER,
  allowNull: false,
  references: { model: 'locations', key: 'id' },
  onDelete: 'CASCADE',
};

/**
 * Storage environment (issue 17): logger readings per place, one summary row per place and
 * local day (so a year's figures read 365 rows, not 52,560), the loggers' remembered column
 * mapping and time zone, and alerts for places outside their band.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('environment_loggers', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    logger_key: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    mapping: { type: DataTypes.JSON, allowNull: false },
    time_zone: { type: DataTypes.STRING(64), allowNull: false },
    location_id: { ...location, allowNull: true, onDelete: 'SET NULL' },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.createTable('environment_readings', {
    location_id: { ...location, primaryKey: true },
    // Milliseconds since the epoch, UTC.
    at: { type: DataTypes.BIGINT, allowNull: false, primaryKey: true },
    // The local day in the logger's time zone (YYYY-MM-DD), the key of its day summary.
    day: { type: DataTypes.STRING(10), allowNull: false },
    temperature_c: { type: DataTypes.REAL, allowNull: false },
    rh: { type: DataTypes.REAL, allowNull: false },
    logger_id: { type: DataTypes.INTEGER, allowNull: true },
  });
  await qi.createTable('environment_days', {
    location_id: { ...location, primaryKey: true },
    day: { type: DataTypes.STRING(10), allowNull: false, primaryKey: true },
    readings: { type: DataTypes.INTEGER, allowNull: false },
    t_min: { type: DataTypes.REAL, allowNull: false },
    t_max: { type: DataTypes.REAL, allowNull: false },
    t_sum: { type: DataTypes.REAL, allowNull: false },
    rh_min: { type: DataTypes.REAL, allowNull: false },
    rh_max: { type: DataTypes.REAL, allowNull: false },
    rh_sum: { type: DataTypes.REAL, allowNull: false },
    rate_sum: { type: DataTypes.REAL, allowNull: false },
  });
  await qi.createTable('environment_alerts', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    location_id: location,
    kind: { type: DataTypes.STRING(30), allowNull: false },
    reason: { type: DataTypes.TEXT, allowNull: false },
    started_at: { type: DataTypes.DATE, allowNull: false },
    ended_at: { type: DataTypes.DATE, allowNull: false },
    opened_at: { type: DataTypes.DATE, allowNull: false },
    acknowledged_at: { type: DataTypes.DATE, allowNull: true },
    acknowledged_by: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
  });
  await qi.addIndex('environment_alerts', ['location_id', 'kind', 'started_at']);
  await qi.addIndex('environment_alerts', ['acknowledged_at', 'opened_at']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  for (const table of [
    'environment_alerts',
    'environment_days',
    'environment_readings',
    'environment_loggers',
  ]) {
    await qi.dropTable(table);
  }
}
