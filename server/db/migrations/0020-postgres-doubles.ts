import type { QueryInterface } from 'sequelize';
import { QueryTypes } from 'sequelize';

/**
 * The models declare readings, temperatures and rates as REAL: 8 bytes on SQLite, but 4 on
 * PostgreSQL (about 7 digits, so a mean rate read back differs after the 8th). Every REAL
 * column on PostgreSQL becomes double precision, as SQLite keeps them. Nothing to do on
 * SQLite.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  if (qi.sequelize.getDialect() !== 'postgres') return;
  const columns = await qi.sequelize.query<{ table_name: string; column_name: string }>(
    `SELECT table_name, column_name FROM information_schema.columns
      WHERE table_schema = current_schema() AND data_type = 'real'`,
    { type: QueryTypes.SELECT },
  );
  for (const { table_name: table, column_name: column } of columns) {
    await qi.sequelize.query(
      `ALTER TABLE "${table}" ALTER COLUMN "${column}" TYPE double precision`,
    );
  }
}

/** Narrowing back would lose digits for nothing; the wider columns stay. */
export async function down(): Promise<void> {}
