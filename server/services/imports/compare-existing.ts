import type { PrintCreate, PrintUpdate } from '../../../shared/schemas/print';
import type { ImportField } from '../../../shared/domain/import-fields';
import type { Print } from '../../models';
import { changedRegistrarColumns } from '../prints/registrar-write';

/** Catalogue fields an import may change on an existing print (the processing history is left alone). */
const ATTRIBUTE_OF: Partial<Record<ImportField, keyof PrintCreate>> = {
  title: 'title',
  process: 'process',
  maker: 'maker',
  madeOn: 'madeOn',
  paper: 'paperId',
  negative: 'negativeId',
  location: 'locationId',
  imageWidthMm: 'imageWidthMm',
  imageHeightMm: 'imageHeightMm',
  sheetWidthMm: 'sheetWidthMm',
  sheetHeightMm: 'sheetHeightMm',
  edition: 'edition',
  status: 'status',
  description: 'description',
  tags: 'tags',
};

/**
 * The registrar's parts an import may change on an existing print. Marks are left alone:
 * a cell cannot hold their photograph areas or privacy, which a replacement would lose.
 */
const REGISTRAR_PART_OF: Partial<Record<ImportField, 'acquisition' | 'provenance' | 'rights'>> = {
  acquisitionMethod: 'acquisition',
  source: 'acquisition',
  acquiredOn: 'acquisition',
  acquisitionReference: 'acquisition',
  creditLine: 'acquisition',
  price: 'acquisition',
  provenance: 'provenance',
  rightsStatement: 'rights',
  rightsHolder: 'rights',
  rightsNote: 'rights',
};

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** The mapped fields whose imported value differs from the stored print: an update body, empty when unchanged. */
export function changesFor(
  existing: Print,
  input: PrintCreate,
  mapped: readonly ImportField[],
): PrintUpdate {
  const changes: Record<string, unknown> = {};
  for (const field of mapped) {
    const attribute = ATTRIBUTE_OF[field];
    if (!attribute) continue;
    const next = input[attribute];
    if (!same(existing.get(attribute as keyof Print), next)) changes[attribute] = next;
  }
  for (const part of new Set(mapped.flatMap((field) => REGISTRAR_PART_OF[field] ?? []))) {
    const next = { [part]: input[part] ?? (part === 'provenance' ? [] : null) };
    const columns = Object.entries(changedRegistrarColumns(next));
    if (columns.some(([column, value]) => !same(existing.get(column as keyof Print), value)))
      Object.assign(changes, next);
  }
  return changes as PrintUpdate;
}
