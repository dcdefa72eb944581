import { z } from 'zod';
import './messages';

/** `GET /api/overview` takes no parameters; anything else is refused rather than ignored. */
export const OverviewQuerySchema = z.object({}).strict();
