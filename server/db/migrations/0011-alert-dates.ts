import type { QueryInterface } from 'sequelize';

/**
 * Re-evaluation after a settings change wrote alerts' `opened_at` as ISO text
 * (`2026-12-02T09:52:00.000Z`). Sequelize's SQLite reader appends the zone to any date
 * without a `+` and gets an invalid date, so `GET /api/alerts` failed from then on. Rewrite
 * those rows in the form Sequelize writes (`2026-12-02 09:52:00.000 +00:00`).
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  // Only SQLite stored dates as text; other databases never had such rows.
  if (qi.sequelize.getDialect() !== 'sqlite') return;
  await qi.sequelize.query(
    `UPDATE alerts SET opened_at = replace(replace(opened_at, 'T', ' '), 'Z', ' +00:00')
      WHERE opened_at LIKE '____-__-__T%Z'`,
  );
}

/** Nothing to undo: the rewritten rows read the same instant. */
export async function down(): Promise<void> {}
