import { z } from 'zod';
import './messages';
import { TONE_METHODS, TONE_STATUSES } from '../domain/vocabulary';
import { isoDate, optionalText, pastIsoDate } from './common';

export { TONE_METHODS };
export const OBSERVERS = ['2', '10'] as const;

export const ReadingSchema = z.object({
  patch: z.string().trim().min(1, 'Name the patch').max(40, 'At most 40 characters'),
  L: z.number().min(0, 'L* is 0 to 100').max(100, 'L* is 0 to 100'),
  a: z.number().min(-128, 'a* is −128 to 128').max(128, 'a* is −128 to 128'),
  b: z.number().min(-128, 'b* is −128 to 128').max(128, 'b* is −128 to 128'),
});

const readings = z
  .array(ReadingSchema)
  .min(1, 'Give at least one reading')
  .max(24, 'At most 24 patches')
  .superRefine((list, ctx) => {
    const seen = new Set<string>();
    list.forEach((reading, index) => {
      if (seen.has(reading.patch)) {
        ctx.addIssue({ code: 'custom', path: [index, 'patch'], message: 'Patch named twice' });
      }
      seen.add(reading.patch);
    });
  });

export const ToneCheckCreateSchema = z.object({
  checkedOn: pastIsoDate,
  method: z.enum(TONE_METHODS).default('spectrophotometer'),
  instrument: optionalText(200),
  illuminant: z.string().trim().min(1).max(10).default('D50'),
  observer: z.enum(OBSERVERS).default('2'),
  baseline: z.boolean().default(false),
  notes: optionalText(2000),
  readings,
});
export type ToneCheckCreate = z.output<typeof ToneCheckCreateSchema>;
export type ToneCheckCreateInput = z.input<typeof ToneCheckCreateSchema>;

export const ToneCheckUpdateSchema = z
  .object({
    checkedOn: pastIsoDate,
    method: z.enum(TONE_METHODS),
    instrument: optionalText(200),
    illuminant: z.string().trim().min(1).max(10),
    observer: z.enum(OBSERVERS),
    baseline: z.boolean(),
    notes: optionalText(2000),
    readings,
  })
  .partial()
  .refine((body) => Object.keys(body).length > 0, 'Change at least one field');
export type ToneCheckUpdate = z.output<typeof ToneCheckUpdateSchema>;
export type ToneCheckUpdateInput = z.input<typeof ToneCheckUpdateSchema>;

const optionalId = z.coerce.number().int().positive().optional();

export const ToneWatchQuerySchema = z.object({
  status: z.enum(TONE_STATUSES).optional(),
  locationId: optionalId,
  paperId: optionalId,
  /** `all` includes steady prints; by default only those needing attention. */
  scope: z.enum(['attention', 'all']).default('attention'),
});
export type ToneWatchQuery = z.output<typeof ToneWatchQuerySchema>;

export const CheckRoundQuerySchema = z
  .object({ from: isoDate, to: isoDate })
  .refine((q) => q.from <= q.to, { message: 'The period ends before it starts', path: ['to'] });
export type CheckRoundQuery = z.output<typeof CheckRoundQuerySchema>;

export const CohortQuerySchema = z.object({
  by: z.enum(['fixing', 'washing', 'paper', 'batch', 'place', 'light']),
});
export type CohortQuery = z.output<typeof CohortQuerySchema>;
