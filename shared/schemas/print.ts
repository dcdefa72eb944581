import { z } from 'zod';
import './messages';
import { parseApproximateDate } from '../domain/approximate-date';
import { checkDateProblem, FUTURE_DATE_MESSAGE } from '../domain/tone/check-date';
import { PRINT_STATUSES, PROCESSES, TONE_STATUSES } from '../domain/vocabulary';
import {
  approximateDateError,
  isoDate,
  optionalId,
  optionalText,
  queryBoolean,
  requiredText,
} from './common';
import { ProcessingStepSchema } from './processing-step';
import { registrarFields, RightsStatementUriSchema } from './registrar';

const ACCESSION_FORMAT = /^[A-Za-z0-9][A-Za-z0-9./-]{0,31}$/;
/** Two metres: larger than any hand-coated print we expect, small enough to catch typos. */
const MAX_SIZE_MM = 2000;
/** Highest list page (`page`); above it 422. */
export const MAX_PAGE = 10_000;

const sizeMm = z
  .number('Enter the size in millimetres as a number')
  .positive('Must be more than 0')
  .max(MAX_SIZE_MM, `At most ${MAX_SIZE_MM} mm`)
  .optional()
  .nullable();

const tags = z
  .array(z.string().trim().toLowerCase().min(1).max(40, 'A tag is at most 40 characters'))
  .max(30, 'At most 30 tags')
  .transform((list) => [...new Set(list)]);

const madeOn = optionalText(40)
  .refine((value) => value === null || parseApproximateDate(value) !== null, approximateDateError)
  // The same "not after today" rule as every dated record; an approximate date is refused
  // only when all of its range lies ahead ("2020s" is fine, "2031" is not).
  .refine((value) => {
    const range = value === null ? null : parseApproximateDate(value);
    return range === null || checkDateProblem(range.from, null) === null;
  }, FUTURE_DATE_MESSAGE);

const printFields = {
  accessionNumber: z
    .string()
    .trim()
    .regex(ACCESSION_FORMAT, 'Letters, digits, dots, dashes; e.g. 2026.0001')
    .optional(),
  title: requiredText(200, 'A title'),
  maker: optionalText(120),
  madeOn,
  process: z.enum(PROCESSES, 'Choose a process'),
  paperId: optionalId,
  negativeId: optionalId,
  locationId: optionalId,
  imageWidthMm: sizeMm,
  imageHeightMm: sizeMm,
  sheetWidthMm: sizeMm,
  sheetHeightMm: sizeMm,
  edition: optionalText(120),
  status: z.enum(PRINT_STATUSES, 'Choose a status').default('in storage'),
  description: optionalText(5000),
  tags: tags.default([]),
  processing: z.array(ProcessingStepSchema).max(40, 'At most 40 steps').default([]),
  ...registrarFields,
};

type Sizes = Partial<
  Record<'imageWidthMm' | 'imageHeightMm' | 'sheetWidthMm' | 'sheetHeightMm', number | null>
>;

/**
 * The image lies on its sheet, so the sheet is at least as wide and as high as the image.
 * Said on the sheet's field, where the slip usually is.
 */
export function sheetSizeIssues(sizes: Sizes): Array<{ path: string; message: string }> {
  const issues: Array<{ path: string; message: string }> = [];
  for (const [sheet, image, side] of [
    ['sheetWidthMm', 'imageWidthMm', 'wide'],
    ['sheetHeightMm', 'imageHeightMm', 'high'],
  ] as const) {
    const sheetMm = sizes[sheet];
    const imageMm = sizes[image];
    if (typeof sheetMm === 'number' && typeof imageMm === 'number' && sheetMm < imageMm) {
      issues.push({
        path: sheet,
        message: `The sheet must be at least as ${side} as the image (${imageMm} mm)`,
      });
    }
  }
  return issues;
}

/** The print's fields without the cross-field rules, for forms that take a few of them. */
export const PrintFieldsSchema = z.object(printFields);

export const PrintCreateSchema = z.object(printFields).superRefine(
  (print, ctx) => {
    if (typeof print !== 'object' || print === null) return;
    for (const issue of sheetSizeIssues(print)) {
      ctx.addIssue({ code: 'custom', path: [issue.path], message: issue.message });
    }
  },
  // Also when other fields are wrong, so every message shows at once (values are checked).
  { when: () => true },
);
export type PrintCreateInput = z.input<typeof PrintCreateSchema>;
export type PrintCreate = z.output<typeof PrintCreateSchema>;

/** A partial update; `processing`, when present, replaces the whole history. */
export const PrintUpdateSchema = z
  .object({
    ...printFields,
    status: z.enum(PRINT_STATUSES, 'Choose a status'),
    tags,
    processing: z.array(ProcessingStepSchema).max(40, 'At most 40 steps'),
  })
  .partial()
  .strict();
export type PrintUpdate = z.output<typeof PrintUpdateSchema>;

/** The fields a curator may change on a print (design §2). */
export const CURATORIAL_FIELDS = ['title', 'description', 'tags'] as const;

export const PRINT_SORTS = [
  'relevance',
  'accession',
  '-accession',
  'madeOn',
  '-madeOn',
  'title',
  '-title',
] as const;
export type PrintSort = (typeof PRINT_SORTS)[number];

const minutesFilter = z.coerce.number().min(0).max(100_000).optional();

const RANGES = [
  ['fixingMinutesMin', 'fixingMinutesMax', 'fixing minutes'],
  ['washingMinutesMin', 'washingMinutesMax', 'washing minutes'],
  ['madeFrom', 'madeTo', 'dates made'],
] as const;

/**
 * A range whose end comes before its start ("washing 30 to 10") matches nothing: say so on
 * its end field rather than answer with an empty list.
 */
export function invertedRanges(
  query: Partial<Record<(typeof RANGES)[number][0 | 1], number | string>>,
): Array<{ path: string[]; message: string }> {
  const issues: Array<{ path: string[]; message: string }> = [];
  for (const [from, to, label] of RANGES) {
    const low = query[from];
    const high = query[to];
    if (low !== undefined && high !== undefined && high < low) {
      issues.push({
        path: [to],
        message: `The range of ${label} ends (${high}) before it starts (${low}): swap the two values.`,
      });
    }
  }
  return issues;
}

export const PrintQuerySchema = z
  .object({
    q: z.string().trim().max(200).optional(),
    process: z.enum(PROCESSES).optional(),
    paperId: z.coerce.number().int().positive().optional(),
    sourceId: z.coerce.number().int().positive().optional(),
    rightsStatement: RightsStatementUriSchema.optional(),
    fixingMinutesMin: minutesFilter,
    fixingMinutesMax: minutesFilter,
    washingMinutesMin: minutesFilter,
    washingMinutesMax: minutesFilter,
    toneStatus: z.enum(TONE_STATUSES).optional(),
    madeFrom: isoDate.optional(),
    madeTo: isoDate.optional(),
    processingRisk: queryBoolean.optional(),
    deleted: queryBoolean.optional(),
    sort: z.enum(PRINT_SORTS).optional(),
    // Deep pages cost a heap of offset + pageSize; nobody pages past 10,000 by hand.
    page: z.coerce.number().int().min(1).max(MAX_PAGE, `At most page ${MAX_PAGE}`).default(1),
    pageSize: z.coerce.number().int().min(1).max(100).default(25),
  })
  .superRefine((query, ctx) => {
    for (const issue of invertedRanges(query)) ctx.addIssue({ code: 'custom', ...issue });
  });
export type PrintQuery = z.output<typeof PrintQuerySchema>;
