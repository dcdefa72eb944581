import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The change feed of prints: one row per committed write that changed prints or what they
 * derive (risk reasons, tone state), with the ids and what changed, written in the same
 * transaction. The search index's snapshot is fresh only while the feed's last id matches
 * the one it was built at, so a change that leaves `updated_at` alone (a re-derivation) can
 * no longer hide behind a stale snapshot.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('print_changes', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    print_ids: { type: DataTypes.JSON, allowNull: false },
    what: { type: DataTypes.JSON, allowNull: false },
    at: { type: DataTypes.DATE, allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('print_changes');
}
