import {
  looksLikeFormula,
  parseNumberCell,
  type ImportField,
} from '../../../shared/domain/import-fields';
import { PRINT_STATUSES, PROCESSES } from '../../../shared/domain/vocabulary';
import { PrintCreateSchema, type PrintCreate } from '../../../shared/schemas/print';
import type { ImportFailure } from '../../../shared/types/imports';
import { registrarCells, REGISTRAR_FIELD_OF } from './registrar-cells';

type RowError = ImportFailure['errors'][number];

/** Names and codes of the reference lists, lower-cased, to ids. */
export interface ImportLookups {
  papers: Map<string, number>;
  negatives: Map<string, number>;
  locations: Map<string, number>;
  /** Sources by lower-cased name. */
  sources: Map<string, number>;
}

/** Where each mapped field sits in a record. */
export type FieldColumns = Partial<Record<ImportField, number>>;

const NUMBER_FIELDS = ['imageWidthMm', 'imageHeightMm', 'sheetWidthMm', 'sheetHeightMm'] as const;

function matchWord<T extends string>(value: string, words: readonly T[]): T | undefined {
  return words.find((word) => word.toLowerCase() === value.trim().toLowerCase());
}

/**
 * One spreadsheet record as a print body, or the reasons it cannot be one. Every check
 * runs, so a row's errors come all at once. Paper, negative and place are looked up by
 * name or code; fixing and washing minutes become processing steps.
 */
export function rowToPrint(
  cells: readonly string[],
  columns: FieldColumns,
  lookups: ImportLookups,
): { input: PrintCreate | null; errors: RowError[] } {
  const errors: RowError[] = [];
  const cell = (field: ImportField): string => {
    const index = columns[field];
    return index === undefined ? '' : (cells[index] ?? '').trim();
  };
  for (const field of Object.keys(columns) as ImportField[]) {
    if (looksLikeFormula(cell(field))) {
      errors.push({
        field,
        message: 'Looks like a spreadsheet formula; export the values it shows instead',
      });
    }
  }
  if (errors.length) return { input: null, errors };

  const body: Record<string, unknown> = {
    accessionNumber: cell('accessionNumber') || undefined,
    title: cell('title'),
    maker: cell('maker') || null,
    madeOn: cell('madeOn') || null,
    edition: cell('edition') || null,
    description: cell('description') || null,
  };
  if (!body.accessionNumber)
    errors.push({ field: 'accessionNumber', message: 'The accession number is required' });
  const process = cell('process');
  body.process = matchWord(process, PROCESSES) ?? process;
  const status = cell('status');
  if (status) body.status = matchWord(status, PRINT_STATUSES) ?? status;
  const tags = cell('tags');
  body.tags = tags
    ? tags
        .split(/[;|]/)
        .map((tag) => tag.trim())
        .filter(Boolean)
    : [];

  for (const field of NUMBER_FIELDS) {
    const value = parseNumberCell(cell(field));
    if (Number.isNaN(value)) errors.push({ field, message: `“${cell(field)}” is not a number` });
    else body[field] = value;
  }
  for (const [field, list, key] of [
    ['paper', lookups.papers, 'paperId'],
    ['negative', lookups.negatives, 'negativeId'],
    ['location', lookups.locations, 'locationId'],
  ] as const) {
    const name = cell(field);
    if (!name) continue;
    const id = list.get(name.toLowerCase());
    if (id === undefined)
      errors.push({
        field,
        message: `No ${field === 'location' ? 'place' : field} “${name}”; add it first`,
      });
    else body[key] = id;
  }
  body.processing = processingOf(cell, errors);
  const mapped = new Set(Object.keys(columns) as ImportField[]);
  Object.assign(body, registrarCells(cell, mapped, lookups.sources, errors));

  const parsed = PrintCreateSchema.safeParse(body);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const path = issue.path.slice(0, 2).join('.');
      const field =
        issue.path[0] === 'processing'
          ? 'fixingMinutes'
          : (REGISTRAR_FIELD_OF[path] ??
            REGISTRAR_FIELD_OF[String(issue.path[0])] ??
            String(issue.path[0] ?? 'row'));
      // The source's own error is already said (an unknown or missing name).
      if (field === 'source' && errors.some((error) => error.field === 'source')) continue;
      errors.push({ field, message: issue.message });
    }
  }
  return errors.length ? { input: null, errors } : { input: parsed.data!, errors };
}

function processingOf(cell: (field: ImportField) => string, errors: RowError[]) {
  const steps: Array<{ stage: 'fixing' | 'washing'; minutes: number }> = [];
  for (const [field, stage] of [
    ['fixingMinutes', 'fixing'],
    ['washingMinutes', 'washing'],
  ] as const) {
    const minutes = parseNumberCell(cell(field));
    if (minutes === null) continue;
    if (Number.isNaN(minutes) || minutes <= 0) {
      errors.push({ field, message: `“${cell(field)}” is not a number of minutes` });
    } else steps.push({ stage, minutes });
  }
  return steps;
}
