import { z } from 'zod';
import './messages';
import { CHEMISTRY_SETTINGS } from '../domain/chemistry/settings';
import { ENVIRONMENT_SETTING_SOURCES } from '../domain/environment/settings';
import {
  LIGHT_LIMIT_MAX,
  LIGHT_SETTING_KEYS,
  type LightSettingKey,
} from '../domain/light/settings';

const positive = z.number().positive('Must be above 0').max(1000);
const months = z.number().int('Whole months').min(1, 'At least 1 month').max(240);

const chemistry = (key: keyof typeof CHEMISTRY_SETTINGS) =>
  z
    .number('Enter a number')
    .min(CHEMISTRY_SETTINGS[key].min, `At least ${CHEMISTRY_SETTINGS[key].min}`)
    .max(CHEMISTRY_SETTINGS[key].max, `At most ${CHEMISTRY_SETTINGS[key].max}`)
    .nullable()
    .optional();

const environment = (key: keyof typeof ENVIRONMENT_SETTING_SOURCES) =>
  z
    .number('Enter a number')
    .min(ENVIRONMENT_SETTING_SOURCES[key].min, `At least ${ENVIRONMENT_SETTING_SOURCES[key].min}`)
    .max(ENVIRONMENT_SETTING_SOURCES[key].max, `At most ${ENVIRONMENT_SETTING_SOURCES[key].max}`);

/**
 * `PATCH /api/settings`: any part of any area. Unknown areas and keys are refused (422);
 * a chemistry value of null puts that setting back to its default.
 */
export const SettingsPatchSchema = z
  .object({
    tone: z
      .object({
        watchDE00: positive,
        noticeableDE00: positive,
        fadingDensity: positive,
        darkeningL: positive,
        yellowingB: positive,
        projectionYears: positive,
        repeatabilityLab: z.number().min(0, 'At least 0').max(10, 'At most 10'),
        repeatabilityDensity: z.number().min(0, 'At least 0').max(1, 'At most 1'),
      })
      .partial()
      .strict(),
    schedule: z
      .object({ steadyMonths: months, watchMonths: months, changingMonths: months })
      .partial()
      .strict(),
    chemistry: z
      .object({
        fixerCapacitySheetsPerLitre: chemistry('fixerCapacitySheetsPerLitre'),
        sensitiserMlPer8x10: chemistry('sensitiserMlPer8x10'),
      })
      .strict(),
    environment: z
      .object({
        excursionHours: environment('excursionHours'),
        lifeAtReferenceYears: environment('lifeAtReferenceYears'),
      })
      .partial()
      .strict(),
    light: z
      .object(
        Object.fromEntries(
          LIGHT_SETTING_KEYS.map((key) => [
            key,
            z
              .number('Enter a number')
              .positive('Must be above 0')
              .max(LIGHT_LIMIT_MAX, `At most ${LIGHT_LIMIT_MAX}`),
          ]),
        ) as Record<LightSettingKey, z.ZodNumber>,
      )
      .partial()
      .strict(),
  })
  .partial()
  .strict();
export type SettingsPatch = z.output<typeof SettingsPatchSchema>;
