import { z } from 'zod';
import './messages';
import { requiredText } from './common';
import { PrintQuerySchema } from './print';

/** A query string of `GET /api/prints` ("q=rag&fixingMinutesMin=10"), checked like one. */
export const SearchQueryStringSchema = z
  .string()
  .trim()
  .max(2000, 'At most 2000 characters')
  .transform((value) => value.replace(/^\?/, ''))
  .refine(
    (value) => PrintQuerySchema.safeParse(Object.fromEntries(new URLSearchParams(value))).success,
    'Not a search this catalogue understands',
  );

export const SavedSearchSchema = z.object({
  name: requiredText(120, 'A name'),
  query: SearchQueryStringSchema,
});
export type SavedSearchInput = z.input<typeof SavedSearchSchema>;
export type SavedSearchCreate = z.output<typeof SavedSearchSchema>;

const printIds = z
  .array(z.number().int().positive(), 'A list of print ids')
  .max(500, 'At most 500 prints in a checklist')
  .refine((ids) => new Set(ids).size === ids.length, 'A print appears only once');

export const ChecklistSchema = z.object({
  name: requiredText(120, 'A name'),
  printIds: printIds.default([]),
});
export type ChecklistInput = z.input<typeof ChecklistSchema>;
export type ChecklistCreate = z.output<typeof ChecklistSchema>;

export const ChecklistUpdateSchema = z
  .object({ name: requiredText(120, 'A name'), printIds })
  .partial()
  .strict();
export type ChecklistUpdate = z.output<typeof ChecklistUpdateSchema>;
