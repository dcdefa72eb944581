import type { Sequelize } from 'sequelize';
import { formatMarks, formatOwners } from '../../../shared/domain/registrar/cells';
import { rightsStatementByUri } from '../../../shared/domain/registrar/rights-statements';
import { findRegistrarColumns } from '../../repositories/source-repository';

/** The registrar's columns of a checklist CSV, named as the import maps them back. */
export const REGISTRAR_CSV_COLUMNS = [
  'acquisitionMethod',
  'source',
  'acquiredOn',
  'acquisitionReference',
  'creditLine',
  'provenance',
  'rightsStatement',
  'rightsHolder',
  'rightsNote',
  'inscriptions',
] as const;
export type RegistrarCsvCells = Record<(typeof REGISTRAR_CSV_COLUMNS)[number], string>;

/**
 * Cells of the given prints for the CSV export (curator+): no price, and no mark kept
 * private. The rights statement is written as its URI.
 */
export async function registrarCsvCells(
  sequelize: Sequelize,
  ids: readonly number[],
): Promise<Map<number, RegistrarCsvCells>> {
  const rows = await findRegistrarColumns(sequelize, ids);
  const cells = new Map<number, RegistrarCsvCells>();
  for (const [id, row] of rows) {
    cells.set(id, {
      acquisitionMethod: row.acquisition?.method ?? '',
      source: row.acquisition ? (row.sourceName ?? '') : '',
      acquiredOn: row.acquisition?.acquiredOn ?? '',
      acquisitionReference: row.acquisition?.reference ?? '',
      creditLine: row.acquisition?.creditLine ?? '',
      provenance: formatOwners(row.provenance ?? []),
      rightsStatement: row.rightsStatement
        ? (rightsStatementByUri(row.rightsStatement)?.uri ?? '')
        : '',
      rightsHolder: row.rights?.holder ?? '',
      rightsNote: row.rights?.note ?? '',
      inscriptions: formatMarks((row.marks ?? []).filter((mark) => !mark.private)),
    });
  }
  return cells;
}
