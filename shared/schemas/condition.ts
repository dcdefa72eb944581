import { z } from 'zod';
import './messages';
import { CONDITION_GRADES, OBSERVATION_TERMS, SEVERITIES } from '../domain/condition';
import { optionalText, pastIsoDate, requiredText } from './common';

/** A region of an image, as fractions of its width and height (0–1), so it fits any size. */
export const ImageAreaSchema = z
  .object({
    x: z.number().min(0).max(1),
    y: z.number().min(0).max(1),
    width: z.number().positive().max(1),
    height: z.number().positive().max(1),
  })
  .refine((area) => area.x + area.width <= 1.0001 && area.y + area.height <= 1.0001, {
    message: 'The marked area must lie inside the image',
  });
export type ImageArea = z.infer<typeof ImageAreaSchema>;

const assetId = z.number().int().positive();

export const ObservationSchema = z.object({
  term: z.enum(OBSERVATION_TERMS, 'Choose a term'),
  location: requiredText(120, 'Where on the print'),
  severity: z.enum(SEVERITIES, 'Choose a severity'),
});
export type Observation = z.infer<typeof ObservationSchema>;

/** Room conditions at the time of the examination. Ranges a store room could plausibly show (from memory). */
export const EnvironmentSchema = z.object({
  temperatureC: z
    .number('Enter a number')
    .min(-10, 'At least −10 °C')
    .max(45, 'At most 45 °C')
    .nullable()
    .optional(),
  rh: z
    .number('Enter a number')
    .min(0, 'RH is 0–100 %')
    .max(100, 'RH is 0–100 %')
    .nullable()
    .optional(),
});

export const ConditionReportCreateSchema = z.object({
  reportedOn: pastIsoDate,
  // A report without a grade says nothing, yet would become the print's latest condition.
  grade: z.enum(CONDITION_GRADES, 'Choose a grade'),
  observations: z.array(ObservationSchema).max(60, 'At most 60 observations').default([]),
  notes: optionalText(5000),
  recommendation: optionalText(2000),
  environment: EnvironmentSchema.nullable().optional(),
  assetIds: z.array(assetId).max(24, 'At most 24 images').optional(),
  /** Marked areas per attached image; an image listed here need not be in `assetIds`. */
  images: z
    .array(
      z.object({
        assetId,
        area: ImageAreaSchema.nullable().optional(),
        caption: optionalText(200),
      }),
    )
    .max(24, 'At most 24 images')
    .optional(),
});
export type ConditionReportCreateInput = z.input<typeof ConditionReportCreateSchema>;
export type ConditionReportCreate = z.output<typeof ConditionReportCreateSchema>;

/** A correction: any field of a report; images given replace the attached ones. */
export const ConditionReportUpdateSchema = ConditionReportCreateSchema.partial()
  .extend({ observations: z.array(ObservationSchema).max(60, 'At most 60 observations') })
  .partial()
  .refine((body) => Object.keys(body).length > 0, 'Change at least one field');
export type ConditionReportUpdateInput = z.input<typeof ConditionReportUpdateSchema>;
export type ConditionReportUpdate = z.output<typeof ConditionReportUpdateSchema>;

export const TreatmentCreateSchema = z.object({
  treatedOn: pastIsoDate,
  action: requiredText(500, 'The action'),
  materials: optionalText(1000),
  notes: optionalText(5000),
  assetIds: z.array(assetId).max(24, 'At most 24 images').optional(),
  beforeAssetIds: z.array(assetId).max(12).optional(),
  afterAssetIds: z.array(assetId).max(12).optional(),
});
export type TreatmentCreateInput = z.input<typeof TreatmentCreateSchema>;
export type TreatmentCreate = z.output<typeof TreatmentCreateSchema>;
