import { parseNumberCell } from '@shared/domain/import-fields';
import type { PrintCreateInput } from '@shared/schemas/print';
import type { PrintView } from '@shared/types/catalogue';

/**
 * Empty inputs mean "not given"; a number (a decimal comma too) is read as one; anything
 * else ("ten") stays not-a-number, so the schema says "Enter … as a number" instead of
 * pretending the field was left empty.
 */
export const asNumber = (value: unknown) => {
  if (value === '' || value === null || value === undefined) return null;
  if (typeof value === 'number') return value;
  return parseNumberCell(String(value));
};

export const EMPTY_PRINT: PrintCreateInput = {
  title: '',
  process: 'salt print',
  status: 'in storage',
  tags: [],
  processing: [],
  acquisition: null,
  provenance: [],
  rights: null,
  marks: [],
};

/** A saved record as the form's starting values. */
export function formValuesOf(print: PrintView): PrintCreateInput {
  return {
    accessionNumber: print.accessionNumber,
    title: print.title,
    maker: print.maker,
    madeOn: print.madeOn,
    process: print.process,
    paperId: print.paper?.id ?? null,
    negativeId: print.negative?.id ?? null,
    locationId: print.location?.id ?? null,
    imageWidthMm: print.imageWidthMm,
    imageHeightMm: print.imageHeightMm,
    sheetWidthMm: print.sheetWidthMm,
    sheetHeightMm: print.sheetHeightMm,
    edition: print.edition,
    status: print.status,
    description: print.description,
    tags: print.tags,
    processing: print.processing.map((step) => ({
      stage: step.stage,
      chemical: step.chemical,
      concentrationPercent: step.concentrationPercent,
      solutionBatchId: step.solutionBatch?.id ?? null,
      method: step.method,
      coats: step.coats,
      minutes: step.minutes,
      temperatureC: step.temperatureC,
      lightSource: step.lightSource,
      notes: step.notes,
    })),
    ...registrarValuesOf(print),
  };
}

/** The registrar's fields of a saved record, as the form edits them. */
function registrarValuesOf(print: PrintView): Partial<PrintCreateInput> {
  const acquisition = print.acquisition;
  return {
    acquisition: acquisition && {
      method: acquisition.method,
      sourceId: acquisition.sourceId,
      acquiredOn: acquisition.acquiredOn,
      reference: acquisition.reference,
      creditLine: acquisition.creditLine,
      price: acquisition.price ?? null,
    },
    provenance: print.provenance.map((link) => ({ ...link })),
    rights: print.rights && {
      statement: print.rights.statement,
      holder: print.rights.holder,
      note: print.rights.note,
    },
    marks: print.marks.map((mark) => ({ ...mark })),
  };
}
