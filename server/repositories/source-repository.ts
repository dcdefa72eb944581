import type { Sequelize, Transaction } from 'sequelize';
import type {
  StoredAcquisition,
  StoredMark,
  StoredProvenanceLink,
  StoredRights,
} from '../../shared/types/registrar';
import { selectRows } from '../db/select-rows';
import { Source } from '../models';
import { decodeRow, json, selectList, stored, type Decoded, type Fields } from './decode-columns';

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

/** The registrar's columns of the given prints, with their source's name, by print id. */
export async function findRegistrarColumns(
  sequelize: Sequelize,
  ids: readonly number[],
): Promise<Map<number, RegistrarRow>> {
  if (!ids.length) return new Map();
  const rows = await selectRows<Record<string, unknown>>(
    sequelize,
    `SELECT ${selectList('p', REGISTRAR_FIELDS)}, so.name AS "sourceName"
     FROM prints p LEFT JOIN sources so ON so.id = p.source_id
     WHERE p.id IN (${ids.map(() => '?').join(', ')})`,
    [...ids],
  );
  return new Map(
    rows.map((row) => {
      const decoded = decodeRow(row, REGISTRAR_FIELDS);
      return [decoded.id, { ...decoded, sourceName: (row.sourceName as string | null) ?? null }];
    }),
  );
}

const REGISTRAR_FIELDS = {
  id: stored<number>(),
  acquisition: json<StoredAcquisition | null>(),
  provenance: json<StoredProvenanceLink[]>(),
  rightsStatement: stored<string | null>(),
  rights: json<StoredRights | null>(),
  marks: json<StoredMark[]>(),
} satisfies Fields;

export type RegistrarRow = Decoded<typeof REGISTRAR_FIELDS> & { sourceName: string | null };
