import { z } from 'zod';
import './messages';
import { findChemical, KNOWN_CHEMICAL_NAMES } from '../domain/chemistry/chemicals';
import { CHEMISTRY_SETTINGS } from '../domain/chemistry/settings';

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

const setting = (key: keyof typeof CHEMISTRY_SETTINGS) =>
  z
    .number('Enter a number')
    .min(CHEMISTRY_SETTINGS[key].min, `At least ${CHEMISTRY_SETTINGS[key].min}`)
    .max(CHEMISTRY_SETTINGS[key].max, `At most ${CHEMISTRY_SETTINGS[key].max}`)
    .nullable()
    .optional();

/** A PATCH of the chemistry settings; null puts a setting back to its default. */
export const ChemistrySettingsUpdateSchema = z
  .object({
    fixerCapacitySheetsPerLitre: setting('fixerCapacitySheetsPerLitre'),
    sensitiserMlPer8x10: setting('sensitiserMlPer8x10'),
  })
  .strict();
export type ChemistrySettingsUpdate = z.output<typeof ChemistrySettingsUpdateSchema>;
