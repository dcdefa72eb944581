import { QueryTypes, type InferAttributes, type Transaction } from 'sequelize';
import { ToneReevaluation } from '../models';

/** The one row of the collection-wide re-evaluation (id 1), if a run ever started. */
export function findToneReevaluation(transaction?: Transaction) {
  return ToneReevaluation.findByPk(1, { transaction });
}

export async function saveToneReevaluation(
  run: ToneReevaluation,
  transaction: Transaction,
): Promise<void> {
  await run.save({ transaction });
}

/** Starts the row at its first run. */
export function insertToneReevaluation(
  values: Omit<InferAttributes<ToneReevaluation>, 'id' | 'createdAt' | 'updatedAt'>,
  transaction: Transaction,
) {
  return ToneReevaluation.create({ ...values, id: 1 }, { transaction });
}

/** Prints a run goes through (the live ones). */
export async function countLivePrints(transaction: Transaction): Promise<number> {
  const [row] = await ToneReevaluation.sequelize!.query<{ total: number | string }>(
    'SELECT COUNT(*) AS total FROM prints WHERE deleted_at IS NULL',
    { type: QueryTypes.SELECT, transaction },
  );
  return Number(row?.total ?? 0);
}
