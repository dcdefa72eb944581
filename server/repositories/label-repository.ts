import type { Sequelize } from 'sequelize';
import { selectRows } from '../db/select-rows';

/** What a print's folder label shows, for the live prints among `ids`. */
export async function findPrintsForLabels(
  sequelize: Sequelize,
  ids: readonly number[],
): Promise<Array<{ id: number; accessionNumber: string; title: string; maker: string | null }>> {
  const rows = await selectRows<{
    id: number;
    accession_number: string;
    title: string;
    maker: string | null;
  }>(
    sequelize,
    `SELECT id, accession_number, title, maker FROM prints
     WHERE deleted_at IS NULL AND id IN (${ids.map(() => '?').join(', ')})`,
    ids,
  );
  return rows.map((row) => ({
    id: row.id,
    accessionNumber: row.accession_number,
    title: row.title,
    maker: row.maker,
  }));
}
