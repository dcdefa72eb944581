import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';

/** Deletes a user's stored sessions, all but `exceptSid` (the asker's own, when kept). */
export async function deleteSessionsOfUser(
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

/** Deletes the stored sessions of the accounts with these addresses. */
export async function deleteSessionsOfEmails(
  sequelize: Sequelize,
  emails: readonly string[],
): Promise<void> {
  await sequelize.query(
    `DELETE FROM sessions WHERE user_id IN (SELECT id FROM users WHERE email IN (:emails))`,
    { replacements: { emails: [...emails] } },
  );
}
