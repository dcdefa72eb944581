import type { Sequelize } from 'sequelize';
import { writeTransaction } from '../../db/write-transaction';
import type { User } from '../../models';

/**
 * The person has looked at the tone status changes so far: the start page counts only later
 * ones, whatever other sign-ins or devices come between.
 */
export async function markToneChangesSeen(sequelize: Sequelize, user: User): Promise<void> {
  await writeTransaction(sequelize, (transaction) =>
    user.update({ toneChangesSeenAt: new Date() }, { transaction }),
  );
}
