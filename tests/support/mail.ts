import { Op } from 'sequelize';
import type { AppContext } from '../../server/context';
import { OutboxMessage } from '../../server/models';
import { resetRequestsSettled } from '../../server/services/people/password-resets';

/** Waits until queued mail has gone through the built-in SMTP server into the outbox. */
export async function mailSettled(ctx: AppContext): Promise<void> {
  await resetRequestsSettled();
  await ctx.mailer.idle();
}

/** The newest message the outbox holds for an address, or null. */
export async function lastMailTo(ctx: AppContext, address: string) {
  await mailSettled(ctx);
  return OutboxMessage.findOne({
    // Stored lower-cased; LIKE ignores case on SQLite only.
    where: { recipients: { [Op.like]: `%${address.toLowerCase()}%` } },
    order: [['id', 'DESC']],
  });
}

/** The one-time token of an invitation or reset link in a message's plain text. */
export function tokenIn(text: string | undefined): string {
  const match = /#([A-Za-z0-9_-]{43})\b/.exec(text ?? '');
  if (!match) throw new Error(`no link with a token in: ${text}`);
  return match[1]!;
}
