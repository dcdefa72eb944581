import type { Transaction } from 'sequelize';
import type { AppContext } from '../../context';
import { writeTransaction } from '../../db/write-transaction';
import { hashPassword } from '../../auth/password';
import { endSessionsOf } from '../../auth/user-sessions';
import { problems } from '../../middleware/problem';
import {
  findOpenPasswordReset,
  insertPasswordReset,
  spendPasswordResetsOf,
} from '../../repositories/password-reset-repository';
import { findUserByEmail, findUserById, updateUserRow } from '../../repositories/user-repository';
import { recordAudit } from '../audit';
import { resetMessage } from './messages';
import { RESET_MINUTES, hashToken, newToken } from './tokens';

const running = new Set<Promise<void>>();

/** Resolves when every reset request handed to the background has finished (tests). */
export async function resetRequestsSettled(): Promise<void> {
  while (running.size) await Promise.all(running);
}

/**
 * Starts a reset for an address and returns at once. The lookup, the token and the
 * e-mail happen after the answer is sent, so a known and an unknown address get the
 * same answer in the same time.
 */
export function requestPasswordReset(ctx: AppContext, email: string, origin: string): void {
  const work = createReset(ctx, email, origin).catch((error: unknown) => {
    ctx.logger.error({ err: error }, 'password reset request failed');
  });
  running.add(work);
  void ctx.background.track(work);
  void work.finally(() => running.delete(work));
}

async function createReset(ctx: AppContext, email: string, origin: string): Promise<void> {
  await writeTransaction(ctx.sequelize, async (transaction) => {
    const user = await findUserByEmail(email, { activeOnly: true, transaction });
    if (!user) return;
    const { token, hash } = newToken();
    await insertPasswordReset(
      {
        userId: user.id,
        tokenHash: hash,
        expiresAt: new Date(Date.now() + RESET_MINUTES * 60_000),
      },
      transaction,
    );
    const link = `${origin}/reset-password#${token}`;
    await ctx.mailer.send(resetMessage({ to: user.email, link, minutes: RESET_MINUTES }), {
      transaction,
    });
  });
}

/** Sets the new password, spends the token (and any other open one), ends all sessions. */
export async function resetPassword(ctx: AppContext, token: string, password: string) {
  const openReset = (transaction?: Transaction) =>
    findOpenPasswordReset(hashToken(token), new Date(), transaction);
  // Check the token before the costly hashing, so a stream of bad tokens costs little.
  if (!(await openReset())) throw problems.notFound('This reset link is not valid any more: it');
  const passwordHash = await hashPassword(password, ctx.config.passwordCost);
  await writeTransaction(ctx.sequelize, async (transaction) => {
    const reset = await openReset(transaction);
    const user = reset && (await findUserById(reset.userId, transaction));
    if (!reset || !user?.active) {
      throw problems.notFound('This reset link is not valid any more: it');
    }
    const now = new Date();
    await spendPasswordResetsOf(user.id, now, transaction);
    await updateUserRow(user, { passwordHash }, transaction);
    await endSessionsOf(ctx.sequelize, user.id, { transaction });
    await recordAudit(
      {
        user,
        action: 'update',
        entity: 'user',
        entityId: user.id,
        after: { event: 'password reset by e-mail link' },
      },
      transaction,
    );
  });
}
