import type { Transaction } from 'sequelize';
import { selectRows } from '../db/select-rows';
import { Source } from '../models';
import type { Sequelize } from 'sequelize';

/** Sources, by name. */
export function listSources(transaction?: Transaction): Promise<Source[]> {
  return Source.findAll({
    order: [
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
    transaction,
  });
}

export function findSource(id: number, transaction?: Transaction): Promise<Source | null> {
  return Source.findByPk(id, { transaction });
}

/** How many live prints came from each source (sources with none are absent). */
export async function printCountsBySource(
  sequelize: Sequelize,
  transaction?: Transaction,
): Promise<Map<number, number>> {
  const rows = await selectRows<{ source_id: number; prints: number }>(
    sequelize,
    `SELECT source_id, count(*) AS prints FROM prints
     WHERE source_id IS NOT NULL AND deleted_at IS NULL GROUP BY source_id`,
    [],
    transaction,
  );
  return new Map(rows.map((row) => [row.source_id, Number(row.prints)]));
}
