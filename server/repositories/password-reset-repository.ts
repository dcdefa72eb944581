import { Op, type Transaction } from 'sequelize';
import { PasswordReset } from '../models';

export async function insertPasswordReset(
  row: { userId: number; tokenHash: string; expiresAt: Date },
  transaction: Transaction,
): Promise<void> {
  await PasswordReset.create(row, { transaction });
}

/** The unused, unexpired reset with this token hash, if any. */
export function findOpenPasswordReset(tokenHash: string, now: Date, transaction?: Transaction) {
  return PasswordReset.findOne({
    where: { tokenHash, usedAt: null, expiresAt: { [Op.gt]: now } },
    transaction,
  });
}

/** Spends every open reset of a user. */
export async function spendPasswordResetsOf(
  userId: number,
  at: Date,
  transaction: Transaction,
): Promise<void> {
  await PasswordReset.update({ usedAt: at }, { where: { userId, usedAt: null }, transaction });
}
