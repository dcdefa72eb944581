import type { Sequelize, Transaction } from 'sequelize';
import { deleteSessionsOfUser } from '../repositories/session-repository';
import { forgetReadSessions } from './session-store';

/**
 * Ends a user's sessions at once (deactivation, password change or reset): the rows go,
 * and every session store forgets the sessions it read, so the next request is 401.
 */
export async function endSessionsOf(
  sequelize: Sequelize,
  userId: number,
  options: { exceptSid?: string; transaction?: Transaction } = {},
): Promise<void> {
  await deleteSessionsOfUser(sequelize, userId, options);
  await forgetReadSessions(sequelize, options.transaction);
}
