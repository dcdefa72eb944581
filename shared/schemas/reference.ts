import { z } from 'zod';
import './messages';
import { BATCH_KINDS, NEGATIVE_KINDS } from '../domain/vocabulary';
import { isoDate, optionalId, optionalText, requiredText } from './common';

export const PaperSchema = z.object({
  name: requiredText(120, 'A name'),
  manufacturer: optionalText(120),
  fibre: optionalText(120),
  weightGsm: z.number('Enter a number').positive().max(1000).optional().nullable(),
  surface: optionalText(60),
  sizing: optionalText(120),
  notes: optionalText(2000),
});
export const PaperUpdateSchema = PaperSchema.partial().strict();
export type PaperInput = z.input<typeof PaperSchema>;

export const NegativeSchema = z.object({
  code: requiredText(40, 'A code'),
  kind: z.enum(NEGATIVE_KINDS, 'Choose a kind'),
  format: optionalText(60),
  subject: optionalText(200),
  /** Density range (Dmax − Dmin) of the negative, measured by transmission. */
  densityRange: z.number('Enter a number').min(0).max(5).optional().nullable(),
  notes: optionalText(2000),
});
export const NegativeUpdateSchema = NegativeSchema.partial().strict();
export type NegativeInput = z.input<typeof NegativeSchema>;

export const LocationSchema = z.object({
  code: requiredText(40, 'A code'),
  name: requiredText(120, 'A name'),
  parentId: optionalId,
  notes: optionalText(2000),
});
export const LocationUpdateSchema = LocationSchema.partial().strict();
export type LocationInput = z.input<typeof LocationSchema>;

export const SolutionBatchSchema = z.object({
  code: requiredText(40, 'A code'),
  kind: z.enum(BATCH_KINDS, 'Choose a kind'),
  chemical: requiredText(120, 'A chemical'),
  concentrationPercent: z.number().min(0).max(100).optional().nullable(),
  volumeMl: z.number().positive().max(100_000).optional().nullable(),
  madeOn: isoDate.optional().nullable(),
  madeBy: optionalText(120),
  notes: optionalText(2000),
  exhaustedOn: isoDate.optional().nullable(),
});
export type SolutionBatchInput = z.input<typeof SolutionBatchSchema>;
