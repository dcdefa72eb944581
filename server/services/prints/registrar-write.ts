import type { Transaction } from 'sequelize';
import type { Acquisition, Mark, ProvenanceLink, Rights } from '../../../shared/schemas/registrar';
import type {
  StoredAcquisition,
  StoredMark,
  StoredProvenanceLink,
  StoredRights,
} from '../../../shared/types/registrar';
import type { FieldError } from '../../middleware/problem';
import { problems } from '../../middleware/problem';
import { Asset, Source } from '../../models';

/** The registrar's part of a print body as given (create or PATCH). */
export interface RegistrarInput {
  acquisition?: Acquisition | null;
  provenance?: ProvenanceLink[];
  rights?: Rights | null;
  marks?: Mark[];
}

/** The print's registrar columns as stored. */
export interface RegistrarColumns {
  sourceId: number | null;
  acquisition: StoredAcquisition | null;
  provenance: StoredProvenanceLink[];
  rightsStatement: string | null;
  rights: StoredRights | null;
  marks: StoredMark[];
}

const acquisitionColumns = (acquisition: Acquisition | null | undefined) =>
  acquisition
    ? {
        sourceId: acquisition.sourceId,
        acquisition: {
          method: acquisition.method,
          acquiredOn: acquisition.acquiredOn,
          reference: acquisition.reference ?? null,
          creditLine: acquisition.creditLine ?? null,
          price: acquisition.price ?? null,
        },
      }
    : { sourceId: null, acquisition: null };

const rightsColumns = (rights: Rights | null | undefined) =>
  rights
    ? {
        rightsStatement: rights.statement,
        rights: { holder: rights.holder ?? null, note: rights.note ?? null },
      }
    : { rightsStatement: null, rights: null };

const provenanceColumn = (links: readonly ProvenanceLink[]): StoredProvenanceLink[] =>
  links.map((link) => ({
    owner: link.owner,
    from: link.from ?? null,
    to: link.to ?? null,
    evidence: link.evidence ?? null,
  }));

const marksColumn = (marks: readonly Mark[]): StoredMark[] =>
  marks.map((mark) => ({
    position: mark.position,
    kind: mark.kind,
    transcription: mark.transcription,
    reading: mark.reading ?? null,
    assetId: mark.assetId ?? null,
    area: mark.area ?? null,
    private: mark.private ?? false,
  }));

/** Every registrar column of a new print (absent parts empty). */
export function newRegistrarColumns(input: RegistrarInput): RegistrarColumns {
  return {
    ...acquisitionColumns(input.acquisition),
    provenance: provenanceColumn(input.provenance ?? []),
    ...rightsColumns(input.rights),
    marks: marksColumn(input.marks ?? []),
  };
}

/** Only the columns a PATCH names: an absent part stays as stored, `null` clears it. */
export function changedRegistrarColumns(input: RegistrarInput): Partial<RegistrarColumns> {
  return {
    ...(input.acquisition !== undefined ? acquisitionColumns(input.acquisition) : {}),
    ...(input.provenance !== undefined ? { provenance: provenanceColumn(input.provenance) } : {}),
    ...(input.rights !== undefined ? rightsColumns(input.rights) : {}),
    ...(input.marks !== undefined ? { marks: marksColumn(input.marks) } : {}),
  };
}

/**
 * 422 naming a source that does not exist, or a mark's photograph that is not one of this
 * print's images (a new print has none yet, so its marks name no photograph).
 */
export async function assertRegistrarLinks(
  input: RegistrarInput,
  printId: number | null,
  transaction: Transaction,
): Promise<void> {
  const errors: FieldError[] = [];
  const sourceId = input.acquisition?.sourceId;
  if (sourceId != null && (await Source.count({ where: { id: sourceId }, transaction })) === 0) {
    errors.push({ path: 'acquisition.sourceId', message: `No source with id ${sourceId}` });
  }
  const assetIds = [...new Set((input.marks ?? []).flatMap((mark) => mark.assetId ?? []))];
  if (assetIds.length) {
    const own =
      printId === null
        ? new Set<number>()
        : new Set(
            (
              await Asset.findAll({
                where: { id: assetIds, printId },
                attributes: ['id'],
                transaction,
              })
            ).map((asset) => asset.id),
          );
    for (const [index, mark] of (input.marks ?? []).entries()) {
      if (mark.assetId != null && !own.has(mark.assetId)) {
        errors.push({
          path: `marks.${index}.assetId`,
          message: `Image ${mark.assetId} is not one of this print's photographs`,
        });
      }
    }
  }
  if (errors.length) throw problems.invalid(errors);
}
