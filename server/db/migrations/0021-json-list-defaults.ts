import { QueryTypes, type QueryInterface } from 'sequelize';

/** JSON list columns declared with `defaultValue: '[]'` (migrations 0001–0016). */
const LIST_COLUMNS: ReadonlyArray<[table: string, column: string]> = [
  ['prints', 'tags'],
  ['prints', 'risk_reasons'],
  ['prints', 'tone_flags'],
  ['prints', 'provenance'],
  ['prints', 'marks'],
  ['checklists', 'print_ids'],
  ['condition_reports', 'observations'],
  ['condition_reports', 'images'],
  ['treatments', 'images'],
  ['import_jobs', 'headers'],
  ['import_jobs', 'failed'],
  ['import_jobs', 'preview'],
];

/**
 * Sequelize wrote those defaults through the JSON type, so the stored default is the JSON
 * *string* `"[]"`, not an empty list: a row inserted without the column reads back a
 * string. The app always names these columns, but a script or a bulk load need not. Rows
 * holding the string become the empty list; on PostgreSQL the defaults are mended too (on
 * SQLite a default changes only by rebuilding the table, so inserts must keep naming them).
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  const postgres = qi.sequelize.getDialect() === 'postgres';
  for (const [table, column] of LIST_COLUMNS) {
    if (postgres) {
      await qi.sequelize.query(
        `ALTER TABLE "${table}" ALTER COLUMN "${column}" SET DEFAULT '[]'::json`,
      );
      await qi.sequelize.query(
        `UPDATE "${table}" SET "${column}" = '[]'::json WHERE "${column}"::text = '"[]"'`,
      );
    } else {
      await qi.sequelize.query(
        `UPDATE "${table}" SET "${column}" = '[]' WHERE "${column}" = '"[]"'`,
        {
          type: QueryTypes.UPDATE,
        },
      );
    }
  }
}

/** The mended rows read the same list; nothing to undo. */
export async function down(): Promise<void> {}
