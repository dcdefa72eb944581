import { z } from 'zod';
import './messages';
import { LOAN_KINDS, LOAN_STAGES } from '../domain/loans';
import { isoDate, optionalText, requiredText } from './common';

const band = (min: number, max: number, unit: string) =>
  z
    .object({
      min: z.number().min(min, `At least ${min} ${unit}`).max(max, `At most ${max} ${unit}`),
      max: z.number().min(min, `At least ${min} ${unit}`).max(max, `At most ${max} ${unit}`),
    })
    .strict()
    .refine((value) => value.min <= value.max, {
      message: 'The lower end must not be above the upper',
      path: ['max'],
    });

const fields = {
  title: requiredText(200, 'A title'),
  kind: z.enum(LOAN_KINDS, 'Choose loan or exhibition'),
  venue: requiredText(300, 'The venue or borrower'),
  contact: optionalText(1000),
  startsOn: isoDate,
  endsOn: isoDate,
  hoursPerDay: z.number('Enter the hours open a day').positive('Above 0').max(24, 'At most 24'),
  maxLux: z.number('Enter the maximum illuminance').positive('Above 0').max(100_000),
  /** Ultraviolet in microwatts per lumen. */
  maxUv: z.number().min(0).max(1000).nullable().optional(),
  temperatureC: band(-10, 40, '°C').nullable().optional(),
  humidityPercent: band(0, 100, '%').nullable().optional(),
  printIds: z.array(z.number().int().positive()).max(1000, 'At most 1,000 prints'),
};

const datesInOrder = (value: { startsOn?: string; endsOn?: string }) =>
  !value.startsOn || !value.endsOn || value.startsOn <= value.endsOn;
const ORDER = { message: 'The end must not come before the start', path: ['endsOn'] };

/** `POST /api/loans`. */
export const LoanCreateSchema = z
  .object({ ...fields, printIds: fields.printIds.default([]) })
  .strict()
  .refine(datesInOrder, ORDER);
export type LoanCreate = z.output<typeof LoanCreateSchema>;

/** The agreed conditions: only conservators and admins change or sign them. */
export const CONDITION_FIELDS = ['maxLux', 'maxUv', 'temperatureC', 'humidityPercent'] as const;

/** `PATCH /api/loans/:id`: any field, a stage, signing the conditions, condition reports. */
export const LoanUpdateSchema = z
  .object({
    ...fields,
    stage: z.enum(LOAN_STAGES),
    conditionsSigned: z.boolean(),
    conditionReports: z
      .array(
        z
          .object({
            printId: z.number().int().positive(),
            departureReportId: z.number().int().positive().nullable().optional(),
            returnReportId: z.number().int().positive().nullable().optional(),
          })
          .strict(),
      )
      .max(1000),
  })
  .partial()
  .strict()
  .refine(datesInOrder, ORDER);
export type LoanUpdate = z.output<typeof LoanUpdateSchema>;
