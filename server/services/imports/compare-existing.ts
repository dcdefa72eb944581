import type { PrintCreate, PrintUpdate } from '../../../shared/schemas/print';
import type { ImportField } from '../../../shared/domain/import-fields';
import type { Print } from '../../models';

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
  return changes as PrintUpdate;
}
