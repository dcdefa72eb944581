import { Op, QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { Role } from '../../shared/domain/roles';
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

export function findUserById(id: number, transaction?: Transaction) {
  return User.findByPk(id, { transaction });
}

/** The account with this address (active only when asked). */
export function findUserByEmail(
  email: string,
  options: { activeOnly?: boolean; transaction?: Transaction } = {},
) {
  return User.findOne({
    where: { email, ...(options.activeOnly ? { active: true } : {}) },
    transaction: options.transaction,
  });
}

/** Everyone, by name. */
export function findAllUsers() {
  return User.findAll({ order: [['name', 'ASC']] });
}

export function countActiveAdmins(transaction?: Transaction): Promise<number> {
  return User.count({ where: { role: 'admin', active: true }, transaction });
}

export function insertUser(
  values: { email: string; name: string; role: Role; passwordHash: string },
  transaction: Transaction,
) {
  return User.create(values, { transaction });
}

export async function updateUserRow(
  user: User,
  change: Partial<Pick<User, 'name' | 'role' | 'active' | 'passwordHash'>>,
  transaction: Transaction,
): Promise<void> {
  await user.update(change, { transaction });
}

export async function setPasswordHash(
  userId: number,
  passwordHash: string,
  transaction: Transaction,
): Promise<void> {
  await User.update({ passwordHash }, { where: { id: userId }, transaction });
}
