import { Op, type Transaction } from 'sequelize';
import { formatAccessionNumber, parseAccessionNumber } from '../../../shared/domain/accession';
import { AccessionCounter, Print } from '../../models';

/**
 * The next free `YYYY.NNNN` for the year. Must run inside a write-locking (IMMEDIATE)
 * transaction: the counter row is the point of serialisation between concurrent creates.
 */
export async function assignAccessionNumber(
  year: number,
  transaction: Transaction,
): Promise<string> {
  const counter = await AccessionCounter.findByPk(year, { transaction });
  let sequence = counter ? counter.last : await highestSequence(year, transaction);
  let candidate: string;
  do {
    sequence += 1;
    candidate = formatAccessionNumber(year, sequence);
  } while (await isTaken(candidate, transaction));
  await AccessionCounter.upsert({ year, last: sequence }, { transaction });
  return candidate;
}

async function highestSequence(year: number, transaction: Transaction): Promise<number> {
  const rows = await Print.findAll({
    attributes: ['accessionNumber'],
    where: { accessionNumber: { [Op.like]: `${year}.%` } },
    paranoid: false,
    transaction,
  });
  return rows.reduce((max, row) => {
    const parsed = parseAccessionNumber(row.accessionNumber);
    return parsed && parsed.year === year ? Math.max(max, parsed.sequence) : max;
  }, 0);
}

async function isTaken(accessionNumber: string, transaction: Transaction): Promise<boolean> {
  const count = await Print.count({ where: { accessionNumber }, paranoid: false, transaction });
  return count > 0;
}
