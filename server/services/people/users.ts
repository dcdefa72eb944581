import type { Role } from '../../../shared/domain/roles';
import type { AppContext } from '../../context';
import { writeTransaction } from '../../db/write-transaction';
import { checkPassword, hashPassword } from '../../auth/password';
import { endSessionsOf } from '../../auth/user-sessions';
import { problems } from '../../middleware/problem';
import type { User } from '../../models';
import { presentUser } from '../../presenters/people';
import {
  countActiveAdmins,
  countActiveUsers,
  findAllUsers,
  findUserById,
  markSignedIn,
  setPasswordHash,
  updateUserRow,
} from '../../repositories/user-repository';
import { recordAudit } from '../audit';

export async function listUsers() {
  const users = await findAllUsers();
  return users.map(presentUser);
}

/**
 * Changes a role or deactivates. The last active admin can be neither demoted nor
 * deactivated (else nobody could manage people). A deactivated user's sessions end now;
 * a changed role takes effect on their next request, with a new session id.
 */
export async function updateUser(
  ctx: AppContext,
  admin: User,
  id: number,
  change: { role?: Role; active?: boolean },
) {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    const user = await findUserById(id, transaction);
    if (!user) throw problems.notFound('The person');
    const before = presentUser(user);
    const losesAdmin =
      user.active &&
      user.role === 'admin' &&
      ((change.role !== undefined && change.role !== 'admin') || change.active === false);
    if (losesAdmin) {
      const admins = await countActiveAdmins(transaction);
      if (admins <= 1) {
        throw problems.conflict('This is the last active admin: make another admin first.');
      }
    }
    await updateUserRow(user, change, transaction);
    if (change.active === false) await endSessionsOf(ctx.sequelize, user.id, { transaction });
    const after = presentUser(user);
    await recordAudit(
      { user: admin, action: 'update', entity: 'user', entityId: user.id, before, after },
      transaction,
    );
    return after;
  });
}

/** Changes one's own password after checking the current one; other sessions end. */
export async function changeOwnPassword(
  ctx: AppContext,
  user: User,
  input: { currentPassword: string; newPassword: string },
  currentSid: string,
): Promise<void> {
  if (!(await checkPassword(input.currentPassword, user.passwordHash))) {
    throw problems.invalid([
      { path: 'currentPassword', message: 'This is not your current password' },
    ]);
  }
  const passwordHash = await hashPassword(input.newPassword, ctx.config.passwordCost);
  await writeTransaction(ctx.sequelize, async (transaction) => {
    await setPasswordHash(user.id, passwordHash, transaction);
    await endSessionsOf(ctx.sequelize, user.id, { exceptSid: currentSid, transaction });
    await recordAudit(
      {
        user,
        action: 'update',
        entity: 'user',
        entityId: user.id,
        after: { event: 'password changed' },
      },
      transaction,
    );
  });
}

/** Whether any account may sign in yet (a fresh install has none until the first admin). */
export async function hasActiveAccounts(): Promise<boolean> {
  return (await countActiveUsers()) > 0;
}

/** Notes a successful sign-in (the start page's "since your last visit" reads it). */
export function recordSignIn(user: User): Promise<void> {
  return markSignedIn(user, new Date());
}
