import { z } from 'zod';
import './messages';
import { LABEL_LAYOUTS } from '../domain/label-sheets';

/** Most labels one request prints (about twenty sheets). */
export const LABELS_LIMIT = 500;

const layout = z
  .enum(LABEL_LAYOUTS, `Choose one of: ${LABEL_LAYOUTS.join(', ')}`)
  .default('a4-3x8');
/** Labels already peeled off the first sheet. */
const skip = z.coerce.number().int().min(0).max(29).default(0);

/** `GET /api/locations/:id/labels.pdf`: the place and every place inside it. */
export const PlaceLabelsQuerySchema = z
  .object({ layout, skip, copies: z.coerce.number().int().min(1).max(30).default(1) })
  .strict();
export type PlaceLabelsQuery = z.infer<typeof PlaceLabelsQuerySchema>;

/** `GET /api/prints/labels.pdf?ids=3,4,5`: one folder label per print, in the order given. */
export const PrintLabelsQuerySchema = z
  .object({
    ids: z
      .string('List the prints: ids=3,4,5')
      .regex(/^\d+(,\d+)*$/, 'List the prints by id, separated by commas')
      .transform((value) => value.split(',').map(Number))
      .refine((ids) => ids.length <= LABELS_LIMIT, `At most ${LABELS_LIMIT} labels at a time`),
    layout,
    skip,
  })
  .strict();
export type PrintLabelsQuery = z.infer<typeof PrintLabelsQuerySchema>;
