import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The start page's "tone status changed since you last looked": the moment up to which the
 * person has marked those changes seen. It was the previous sign-in, which a second device
 * or a second sign-in moved on before anyone had looked; it now moves only when the person
 * marks the changes seen. Existing accounts start from their previous sign-in.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('users', 'tone_changes_seen_at', { type: DataTypes.DATE, allowNull: true });
  await qi.sequelize.query('UPDATE users SET tone_changes_seen_at = previous_sign_in_at');
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('users', 'tone_changes_seen_at');
}
