import { z } from 'zod';
import './messages';
import { findChemical, KNOWN_CHEMICAL_NAMES } from '../domain/chemistry/chemicals';

const known = `Choose one of: ${KNOWN_CHEMICAL_NAMES.join(', ')}`;

/** `GET /api/chemistry/solution`: a known chemical, a % w/v and a volume in millilitres. */
export const SolutionQuerySchema = z.object({
  chemical: z
    .string(known)
    .trim()
    .refine((name) => findChemical(name) !== null, known),
  percent: z.coerce
    .number('Enter a number')
    .positive('A concentration above 0 % w/v')
    .max(100, 'At most 100 % w/v'),
  volumeMl: z.coerce
    .number('Enter a number')
    .positive('A volume above 0 ml')
    .max(100_000, 'At most 100 litres'),
});
export type SolutionQuery = z.output<typeof SolutionQuerySchema>;
