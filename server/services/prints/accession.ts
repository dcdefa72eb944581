import type { Sequelize, Transaction } from 'sequelize';
import { formatAccessionNumber, parseAccessionNumber } from '../../../shared/domain/accession';
import { runBound } from '../../db/insert-many';
import { selectRows } from '../../db/select-rows';

/**
 * The next `count` free `YYYY.NNNN` numbers of the year, in order, skipping any already on
 * a print or in `reserved` (numbers typed in by hand for prints written in the same
 * transaction). Must run inside a write-locking (IMMEDIATE) transaction: the counter row is
 * the point of serialisation between concurrent creates.
 * Plain statements on the transaction's connection (`selectRows`, `runBound`) rather than
 * model calls or `sequelize.query`: this runs inside the write lock of every create, and
 * costs three statements however many numbers it gives.
 */
export async function assignAccessionNumbers(
  sequelize: Sequelize,
  year: number,
  count: number,
  transaction: Transaction,
  reserved: ReadonlySet<string> = new Set(),
): Promise<string[]> {
  if (count === 0) return [];
  const select = <T extends object>(sql: string, values: unknown[]) =>
    selectRows<T>(sequelize, sql, values, transaction);
  const [counter] = await select<{ last: number }>(
    'SELECT last FROM accession_counters WHERE year = ?',
    [year],
  );
  let sequence = counter ? counter.last : await highestSequence(year, select);
  const numbers: string[] = [];
  // A number typed in by hand may already hold a place in the sequence: skip it. Each round
  // asks about as many numbers as are still wanted, so a clear run costs one statement.
  while (numbers.length < count) {
    const candidates = Array.from({ length: count - numbers.length }, (_, i) =>
      formatAccessionNumber(year, sequence + 1 + i),
    );
    sequence += candidates.length;
    const inUse = new Set(
      (
        await select<{ accession_number: string }>(
          `SELECT accession_number FROM prints WHERE accession_number IN (${candidates.map(() => '?').join(', ')})`,
          candidates,
        )
      ).map((row) => row.accession_number),
    );
    numbers.push(...candidates.filter((n) => !inUse.has(n) && !reserved.has(n)));
  }
  await runBound(
    sequelize,
    'INSERT INTO accession_counters (year, last) VALUES (?, ?) ON CONFLICT (year) DO UPDATE SET last = excluded.last',
    [year, sequence],
    transaction,
  );
  return numbers;
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
