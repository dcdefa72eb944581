import { z } from 'zod';
import './messages';
import { parseApproximateDate } from '../domain/approximate-date';
import {
  ACQUISITION_METHODS,
  MARK_KINDS,
  MARK_POSITIONS,
  SOURCE_KINDS,
} from '../domain/registrar/vocabulary';
import { rightsStatementByUri } from '../domain/registrar/rights-statements';
import { checkDateProblem, FUTURE_DATE_MESSAGE } from '../domain/tone/check-date';
import { approximateDateError, optionalText, requiredText } from './common';
import { ImageAreaSchema } from './condition';

const readable = (value: string | null) => value === null || parseApproximateDate(value) !== null;
const notAhead = (value: string | null) => {
  const range = value === null ? null : parseApproximateDate(value);
  return range === null || checkDateProblem(range.from, null) === null;
};

/** A date that may be approximate ("c. 1890", "1920s"), never wholly in the future. */
const approximateDate = requiredText(40, 'A date')
  .refine(readable, approximateDateError)
  .refine(notAhead, FUTURE_DATE_MESSAGE);
const optionalApproximateDate = optionalText(40)
  .refine(readable, approximateDateError)
  .refine(notAhead, FUTURE_DATE_MESSAGE);

/** How the print came in (contract: `acquisition`). */
export const AcquisitionSchema = z.object({
  method: z.enum(ACQUISITION_METHODS, 'Choose how it came in'),
  sourceId: z.number('Choose a source').int().positive(),
  acquiredOn: approximateDate,
  reference: optionalText(120),
  creditLine: optionalText(300),
  /** What was paid, in the collection's currency; archivists and admins only. */
  price: z.number('Enter a number').min(0).max(1e9).optional().nullable(),
});
export type Acquisition = z.output<typeof AcquisitionSchema>;

/** One earlier owner (contract: `provenance`, oldest first). */
export const ProvenanceLinkSchema = z.object({
  owner: requiredText(200, 'An owner'),
  from: optionalApproximateDate,
  to: optionalApproximateDate,
  evidence: optionalText(1000),
});
export type ProvenanceLink = z.output<typeof ProvenanceLinkSchema>;

export const RIGHTS_STATEMENT_MESSAGE =
  'Use a RightsStatements.org URI, such as http://rightsstatements.org/vocab/InC/1.0/';

/** A RightsStatements.org statement URI, stored in its canonical form. */
export const RightsStatementUriSchema = z
  .string(RIGHTS_STATEMENT_MESSAGE)
  .trim()
  .refine((value) => rightsStatementByUri(value) !== null, RIGHTS_STATEMENT_MESSAGE)
  .transform((value) => rightsStatementByUri(value)!.uri);

export const RightsSchema = z.object({
  statement: RightsStatementUriSchema,
  holder: optionalText(200),
  note: optionalText(1000),
});
export type Rights = z.output<typeof RightsSchema>;

/** A mark or inscription on the object (contract: `marks`). */
export const MarkSchema = z
  .object({
    position: z.enum(MARK_POSITIONS, 'Choose where it is'),
    kind: z.enum(MARK_KINDS, 'Choose a kind'),
    transcription: requiredText(2000, 'A transcription'),
    reading: optionalText(2000),
    assetId: z.number().int().positive().optional().nullable(),
    area: ImageAreaSchema.optional().nullable(),
    private: z.boolean().optional().default(false),
  })
  .transform((mark) => ({
    ...mark,
    assetId: mark.assetId ?? null,
    area: mark.area ?? null,
  }))
  .refine((mark) => mark.area === null || mark.assetId !== null, {
    message: 'Choose the photograph the area is marked on',
    path: ['assetId'],
  });
export type Mark = z.output<typeof MarkSchema>;

/** The registrar's fields of the print body, each optional (and nullable where single). */
export const registrarFields = {
  acquisition: AcquisitionSchema.optional().nullable(),
  provenance: z.array(ProvenanceLinkSchema).max(50, 'At most 50 earlier owners').optional(),
  rights: RightsSchema.optional().nullable(),
  marks: z.array(MarkSchema).max(100, 'At most 100 marks').optional(),
};
export const REGISTRAR_FIELDS = ['acquisition', 'provenance', 'rights', 'marks'] as const;

/** A donor, seller or lender (contract: `/api/sources`). */
export const SourceSchema = z.object({
  name: requiredText(200, 'A name'),
  kind: z.enum(SOURCE_KINDS, 'Choose a person or an organisation'),
  contact: optionalText(2000),
});
export const SourceUpdateSchema = SourceSchema.partial().strict();
export type SourceInput = z.input<typeof SourceSchema>;
