import { QueryTypes, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize';

/**
 * Ends a user's sessions at once (deactivation, password change or reset): the rows go,
 * and the store reads every request's session from the table, so the next request is 401.
 */
export async function endSessionsOf(
  sequelize: Sequelize,
  userId: number,
  options: { exceptSid?: string; transaction?: Transaction } = {},
): Promise<void> {
  await sequelize.query('DELETE FROM sessions WHERE user_id = :userId AND sid <> :except', {
    replacements: { userId, except: options.exceptSid ?? '' },
    type: QueryTypes.DELETE,
    transaction: options.transaction,
  });
}
