import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The tone watch at 100,000 prints sorted every live print for each page, counted through
 * the deleted_at index (one table lookup per print), and re-read eight checks per listed
 * print for its small line. Two partial indexes over live prints walk the page in order and
 * count from the index alone; the small line is stored with the rest of the tone state.
 * NULL until the print is next evaluated; the list derives it from the checks meanwhile.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('prints', 'tone_sparkline', { type: DataTypes.JSON, allowNull: true });
  await qi.sequelize.query(
    `CREATE INDEX prints_tone_watch_order ON prints
       (tone_urgency DESC, next_check_due, id, tone_status) WHERE deleted_at IS NULL`,
  );
  await qi.sequelize.query(
    `CREATE INDEX prints_tone_watch_due ON prints (tone_status, next_check_due)
       WHERE deleted_at IS NULL`,
  );
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.query('DROP INDEX prints_tone_watch_due');
  await qi.sequelize.query('DROP INDEX prints_tone_watch_order');
  await qi.removeColumn('prints', 'tone_sparkline');
}
