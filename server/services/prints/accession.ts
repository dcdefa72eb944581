import type { Sequelize, Transaction } from 'sequelize';
import { formatAccessionNumber, parseAccessionNumber } from '../../../shared/domain/accession';
import { runBound } from '../../db/insert-many';
import { selectRows } from '../../db/select-rows';

/**
 * The next free `YYYY.NNNN` for the year. Must run inside a write-locking (IMMEDIATE)
 * transaction: the counter row is the point of serialisation between concurrent creates.
 * Plain statements on the transaction's connection (`selectRows`, `runBound`) rather than
 * model calls or `sequelize.query`: this runs inside the write lock of every create.
 */
export async function assignAccessionNumber(
  sequelize: Sequelize,
  year: number,
  transaction: Transaction,
): Promise<string> {
  const select = <T extends object>(sql: string, values: unknown[]) =>
    selectRows<T>(sequelize, sql, values, transaction);
  const [counter] = await select<{ last: number }>(
    'SELECT last FROM accession_counters WHERE year = ?',
    [year],
  );
  let sequence = counter ? counter.last : await highestSequence(year, select);
  let candidate: string;
  // A number typed in by hand may already hold the next place in the sequence: skip it.
  do {
    sequence += 1;
    candidate = formatAccessionNumber(year, sequence);
  } while ((await select('SELECT 1 FROM prints WHERE accession_number = ?', [candidate])).length);
  await runBound(
    sequelize,
    'INSERT INTO accession_counters (year, last) VALUES (?, ?) ON CONFLICT (year) DO UPDATE SET last = excluded.last',
    [year, sequence],
    transaction,
  );
  return candidate;
}

async function highestSequence(
  year: number,
  select: <T extends object>(sql: string, replacements: unknown[]) => Promise<T[]>,
): Promise<number> {
  const rows = await select<{ accession_number: string }>(
    'SELECT accession_number FROM prints WHERE accession_number LIKE ?',
    [`${year}.%`],
  );
  return rows.reduce((max, row) => {
    const parsed = parseAccessionNumber(row.accession_number);
    return parsed && parsed.year === year ? Math.max(max, parsed.sequence) : max;
  }, 0);
}
