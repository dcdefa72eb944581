import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The start page counts a handful of things for each role; each count walks one index.
 * Partial indexes over live prints (as in 0009) cover the due dates, new prints and
 * processing concerns. A user's previous sign-in marks "since your last visit", and each
 * backup leaves a row so an admin sees its age.
 */
const INDEXES = [
  `CREATE INDEX prints_live_next_check ON prints (next_check_due) WHERE deleted_at IS NULL`,
  `CREATE INDEX prints_live_created ON prints (created_at) WHERE deleted_at IS NULL`,
  `CREATE INDEX prints_live_risk ON prints (has_processing_risk) WHERE deleted_at IS NULL`,
  `CREATE INDEX alerts_opened ON alerts (opened_at, print_id)`,
  `CREATE INDEX assets_status ON assets (status)`,
  `CREATE INDEX assets_sha_bytes ON assets (sha256, bytes)`,
  `CREATE INDEX import_jobs_status ON import_jobs (status)`,
  `CREATE INDEX invitations_open ON invitations (accepted_at, revoked_at, expires_at)`,
];
const NAMES = INDEXES.map((sql) => /CREATE INDEX (\w+)/.exec(sql)![1]!);

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('users', 'previous_sign_in_at', { type: DataTypes.DATE, allowNull: true });
  await qi.createTable('backups', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    made_at: { type: DataTypes.DATE, allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
  });
  for (const sql of INDEXES) await qi.sequelize.query(sql);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  for (const name of NAMES) await qi.sequelize.query(`DROP INDEX ${name}`);
  await qi.dropTable('backups');
  await qi.removeColumn('users', 'previous_sign_in_at');
}
