import { z } from 'zod';
import './messages';
import { impossibleDateMessage } from '../domain/calendar';
import { FUTURE_DATE_MESSAGE, todayIso } from '../domain/tone/check-date';

/** Optional text: trimmed; an empty string means "not given". */
export const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `At most ${max} characters`)
    .optional()
    .nullable()
    .transform((value) => (value ? value : null));

export const requiredText = (max: number, label = 'This field') =>
  z.string().trim().min(1, `${label} is required`).max(max, `At most ${max} characters`);

/** An id of another record, or null to clear the link. */
export const optionalId = z.number().int().positive().optional().nullable();

/**
 * A schema message for date text: the plain reason when the text is shaped like a date but
 * names a day that does not exist (2024-02-31), else `hint` with the forms accepted.
 */
const dateError = (hint: string) => ({
  error: (issue: { input?: unknown }) => impossibleDateMessage(issue.input) ?? hint,
});

/** For dates of making, which may be approximate (see `parseApproximateDate`). */
export const approximateDateError = dateError(
  'Use a date like 2026-05-14, 2026-05, 2026, c. 2026, 2024–2026 or 2020s',
);

export const isoDate = z.iso.date(dateError('Use a date like 2026-05-14'));

/** A date of something that has happened: today or earlier. */
// Only for a real date: zod runs a refinement after a failed format check too, and text such
// as 31/02/2024 would then also be called a future date (it sorts after today's).
export const pastIsoDate = isoDate.refine((value) => value <= todayIso(), {
  message: FUTURE_DATE_MESSAGE,
  when: (payload) => payload.issues.length === 0,
});

/** Query-string booleans: "true"/"1" and "false"/"0". */
export const queryBoolean = z
  .enum(['true', 'false', '1', '0'])
  .transform((value) => value === 'true' || value === '1');

/** Path parameters such as `/prints/:id`. */
export const IdParamsSchema = z.object({ id: z.coerce.number().int().positive() });
