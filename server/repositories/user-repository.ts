import { Op, QueryTypes, type Sequelize } from 'sequelize';
import { User } from '../models';

/** How many accounts may sign in. */
export function countActiveUsers(): Promise<number> {
  return User.count({ where: { active: true } });
}

/** The accounts with any of these addresses. */
export function findUsersByEmails(emails: readonly string[]) {
  return User.findAll({ where: { email: { [Op.in]: [...emails] } } });
}

export function countUsersByEmails(emails: readonly string[]): Promise<number> {
  return User.count({ where: { email: { [Op.in]: [...emails] } } });
}

/** Whether the audit trail or a tone check names this user. */
export async function isUserNamedInRecords(sequelize: Sequelize, userId: number): Promise<boolean> {
  const [row] = await sequelize.query<{ named: number }>(
    `SELECT EXISTS (SELECT 1 FROM audit_events WHERE user_id = :userId)
         OR EXISTS (SELECT 1 FROM tone_checks WHERE checked_by = :userId) AS named`,
    { replacements: { userId }, type: QueryTypes.SELECT },
  );
  return Boolean(row?.named);
}

/** Notes a sign-in: the one before it becomes "your last visit" on the start page. */
export async function markSignedIn(user: User, at: Date): Promise<void> {
  await user.update({ previousSignInAt: user.lastSignInAt, lastSignInAt: at });
}
