import { z } from 'zod';
import './messages';

/** `GET /api/overview` takes no parameters; anything else is refused rather than ignored. */
export const OverviewQuerySchema = z.object({}).strict();

/** `POST /api/overview/seen`: marks one kind of start-page change seen up to now. */
export const OverviewSeenSchema = z.object({ kind: z.literal('status-changed') }).strict();
export type OverviewSeenInput = z.infer<typeof OverviewSeenSchema>;
