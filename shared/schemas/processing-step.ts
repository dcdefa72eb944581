import { z } from 'zod';
import './messages';
import { STAGES, STAGES_NEEDING_MINUTES } from '../domain/vocabulary';
import { optionalId, optionalText } from './common';

/** Water-based baths and rooms: below freezing or above 60 °C is a typing slip (from memory). */
export const TEMPERATURE_RANGE_C = { min: 0, max: 60 } as const;
/** A week: the longest plausible single step (a slow dry-down). */
export const MAX_STEP_MINUTES = 7 * 24 * 60;

export const ProcessingStepSchema = z
  .object({
    stage: z.enum(STAGES, 'Choose a stage'),
    chemical: optionalText(120),
    concentrationPercent: z
      .number('Enter the concentration as a number')
      .min(0, 'A concentration is 0–100 % w/v')
      .max(100, 'A concentration is 0–100 % w/v')
      .optional()
      .nullable(),
    solutionBatchId: optionalId,
    method: optionalText(60),
    coats: z
      .number('Enter coats as a whole number')
      .int('Enter coats as a whole number')
      .min(1, 'At least 1 coat')
      .max(20, 'At most 20 coats')
      .optional()
      .nullable(),
    minutes: z
      .number('Enter minutes as a number')
      .positive('Minutes must be more than 0')
      .max(MAX_STEP_MINUTES, 'At most a week (10080 min)')
      .optional()
      .nullable(),
    temperatureC: z
      .number('Enter the temperature as a number')
      .min(
        TEMPERATURE_RANGE_C.min,
        `Between ${TEMPERATURE_RANGE_C.min} and ${TEMPERATURE_RANGE_C.max} °C`,
      )
      .max(
        TEMPERATURE_RANGE_C.max,
        `Between ${TEMPERATURE_RANGE_C.min} and ${TEMPERATURE_RANGE_C.max} °C`,
      )
      .optional()
      .nullable(),
    lightSource: optionalText(60),
    notes: optionalText(2000),
  })
  .superRefine((step, ctx) => {
    if (STAGES_NEEDING_MINUTES.has(step.stage) && step.minutes == null) {
      ctx.addIssue({
        code: 'custom',
        path: ['minutes'],
        message: `A ${step.stage} step needs its minutes`,
      });
    }
  });

export type ProcessingStepInput = z.input<typeof ProcessingStepSchema>;
export type ProcessingStep = z.output<typeof ProcessingStepSchema>;
