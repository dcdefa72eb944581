import type { ImportField } from '../../../shared/domain/import-fields';
import { parseNumberCell } from '../../../shared/domain/import-fields';
import { MARKS_CELL_HINT, parseMarks, parseOwners } from '../../../shared/domain/registrar/cells';
import { findRightsStatement } from '../../../shared/domain/registrar/rights-statements';
import { ACQUISITION_METHODS } from '../../../shared/domain/registrar/vocabulary';
import type { ImportFailure } from '../../../shared/types/imports';

type RowError = ImportFailure['errors'][number];

const ACQUISITION_CELLS = [
  'acquisitionMethod',
  'source',
  'acquiredOn',
  'acquisitionReference',
  'creditLine',
  'price',
] as const;

/** The import field a registrar path of the print body came from (for the row's errors). */
export const REGISTRAR_FIELD_OF: Record<string, ImportField> = {
  'acquisition.method': 'acquisitionMethod',
  'acquisition.sourceId': 'source',
  'acquisition.acquiredOn': 'acquiredOn',
  'acquisition.reference': 'acquisitionReference',
  'acquisition.creditLine': 'creditLine',
  'acquisition.price': 'price',
  acquisition: 'acquisitionMethod',
  provenance: 'provenance',
  rights: 'rightsStatement',
  'rights.statement': 'rightsStatement',
  'rights.holder': 'rightsHolder',
  'rights.note': 'rightsNote',
  marks: 'inscriptions',
};

/**
 * The registrar's part of a print body from a spreadsheet row: the source by name (it must
 * exist), a rights statement by its URI or its label, owners and marks as the export
 * writes them. Absent columns leave their part out.
 */
export function registrarCells(
  cell: (field: ImportField) => string,
  mapped: ReadonlySet<ImportField>,
  sources: ReadonlyMap<string, number>,
  errors: RowError[],
): Record<string, unknown> {
  const body: Record<string, unknown> = {};
  if (ACQUISITION_CELLS.some((field) => cell(field) !== '')) {
    const method = cell('acquisitionMethod');
    const name = cell('source');
    const sourceId = name ? sources.get(name.toLowerCase()) : undefined;
    if (name && sourceId === undefined)
      errors.push({ field: 'source', message: `No source “${name}”; add it first` });
    if (!name) errors.push({ field: 'source', message: 'Name the source it came from' });
    const price = parseNumberCell(cell('price'));
    if (Number.isNaN(price))
      errors.push({ field: 'price', message: `“${cell('price')}” is not a number` });
    body.acquisition = {
      method: ACQUISITION_METHODS.find((m) => m === method.toLowerCase()) ?? method,
      sourceId: sourceId ?? 0,
      acquiredOn: cell('acquiredOn'),
      reference: cell('acquisitionReference') || null,
      creditLine: cell('creditLine') || null,
      price: Number.isNaN(price) ? null : price,
    };
  }
  if (mapped.has('provenance')) {
    body.provenance = parseOwners(cell('provenance')).map((link) => ({ ...link, evidence: null }));
  }
  const statementText = cell('rightsStatement');
  if (statementText) {
    const statement = findRightsStatement(statementText);
    if (!statement)
      errors.push({
        field: 'rightsStatement',
        message: `“${statementText}” is not a RightsStatements.org statement; use its URI (such as http://rightsstatements.org/vocab/InC/1.0/) or its label (such as In Copyright)`,
      });
    else
      body.rights = {
        statement: statement.uri,
        holder: cell('rightsHolder') || null,
        note: cell('rightsNote') || null,
      };
  } else if (cell('rightsHolder') || cell('rightsNote')) {
    errors.push({
      field: 'rightsStatement',
      message: 'Give the rights statement with its holder or note',
    });
  }
  if (mapped.has('inscriptions')) {
    const read = parseMarks(cell('inscriptions'));
    if ('unreadable' in read)
      errors.push({
        field: 'inscriptions',
        message: `Mark ${read.unreadable} cannot be read. ${MARKS_CELL_HINT}`,
      });
    else body.marks = read.marks;
  }
  return body;
}
