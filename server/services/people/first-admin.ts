import type { Sequelize } from 'sequelize';
import { FirstAdminSchema, type FirstAdminInput } from '../../../shared/schemas/people';
import { hashPassword } from '../../auth/password';
import { endSessionsOf } from '../../auth/user-sessions';
import { writeTransaction } from '../../db/write-transaction';
import { User } from '../../models';
import { recordAudit } from '../audit';

const FIELD_NAMES: Record<string, string> = {
  email: 'E-mail address',
  name: 'Name',
  password: 'Password',
};

export type FirstAdminResult =
  | { outcome: 'created' | 'promoted'; user: User }
  | { outcome: 'refused'; reason: string }
  | { outcome: 'invalid'; errors: string[] };

/**
 * Makes an admin from the server's command line. Refuses while an active admin exists
 * (they invite everyone else) unless `force`; with `force`, an existing account at that
 * address becomes an active admin with the new password, and its sessions end.
 */
export async function createFirstAdmin(
  sequelize: Sequelize,
  input: FirstAdminInput,
  options: { force: boolean; passwordCost?: number },
): Promise<FirstAdminResult> {
  const parsed = FirstAdminSchema.safeParse(input);
  if (!parsed.success) {
    return {
      outcome: 'invalid',
      errors: parsed.error.issues.map(
        (issue) => `${FIELD_NAMES[String(issue.path[0])] ?? 'Input'}: ${issue.message}`,
      ),
    };
  }
  const { email, name, password } = parsed.data;
  const admin = await User.findOne({ where: { role: 'admin', active: true } });
  if (admin && !options.force) {
    return {
      outcome: 'refused',
      reason: `An active admin already exists (${admin.email}); they can invite more people from People. Run again with --force to add another admin anyway.`,
    };
  }
  const existing = await User.findOne({ where: { email } });
  if (existing && !options.force) {
    return {
      outcome: 'refused',
      reason: `${email} already has an account; run again with --force to make it an active admin with this password.`,
    };
  }
  const passwordHash = await hashPassword(password, options.passwordCost);
  return writeTransaction(sequelize, async (transaction) => {
    if (existing) {
      const before = { role: existing.role, active: existing.active };
      await existing.update({ name, role: 'admin', active: true, passwordHash }, { transaction });
      await endSessionsOf(sequelize, existing.id, { transaction });
      await recordAudit(
        {
          user: null,
          action: 'update',
          entity: 'user',
          entityId: existing.id,
          before,
          after: { role: 'admin', active: true, event: 'made admin on the command line' },
        },
        transaction,
      );
      return { outcome: 'promoted', user: existing };
    }
    const user = await User.create({ email, name, role: 'admin', passwordHash }, { transaction });
    await recordAudit(
      {
        user: null,
        action: 'create',
        entity: 'user',
        entityId: user.id,
        after: { email, name, role: 'admin', event: 'made on the command line' },
      },
      transaction,
    );
    return { outcome: 'created', user };
  });
}
