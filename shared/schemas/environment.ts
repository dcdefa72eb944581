import { z } from 'zod';
import './messages';
import { isTimeZone } from '../domain/environment/time-zone';
import { isoDate, queryBoolean } from './common';

/** The column mapping of a logger export, as sent in the upload's `mapping` field (JSON). */
export const LoggerMappingSchema = z
  .object({
    timestamp: z.string().trim().min(1).max(120),
    temperature: z.string().trim().min(1).max(120),
    humidity: z.string().trim().min(1).max(120),
    dateOrder: z.enum(['ymd', 'dmy', 'mdy']).optional(),
    temperatureUnit: z.enum(['C', 'F']).optional(),
  })
  .strict();
export type LoggerMappingInput = z.output<typeof LoggerMappingSchema>;

/** The text fields of `POST /api/locations/:id/readings` besides the file. */
export const ReadingsUploadSchema = z.object({
  loggerId: z
    .string()
    .trim()
    .max(80)
    .regex(/^[\w.-]*$/, 'Letters, digits, dots and dashes only')
    .optional()
    .transform((value) => (value ? value : undefined)),
  timeZone: z
    .string()
    .trim()
    .max(64)
    .refine((value) => value === '' || isTimeZone(value), 'Use a time zone such as Europe/Berlin')
    .optional()
    .transform((value) => (value ? value : undefined)),
  mapping: z
    .string()
    .max(2000)
    .optional()
    .transform((value, ctx) => {
      if (!value) return undefined;
      try {
        const result = LoggerMappingSchema.safeParse(JSON.parse(value));
        if (result.success) return result.data;
      } catch {
        // reported below
      }
      ctx.addIssue({
        code: 'custom',
        message: 'Give the mapping as JSON: { "timestamp", "temperature", "humidity" }',
      });
      return z.NEVER;
    }),
});
export type ReadingsUpload = z.output<typeof ReadingsUploadSchema>;

export const ReadingsQuerySchema = z.object({ dryRun: queryBoolean.optional() });

/** Longest period one request may ask for (its chart draws one point a day). */
export const MAX_PERIOD_DAYS = 1830;

export const EnvironmentQuerySchema = z
  .object({ from: isoDate.optional(), to: isoDate.optional() })
  .refine((q) => !q.from || !q.to || q.from <= q.to, {
    message: 'The start must not be after the end',
    path: ['from'],
  });
export type EnvironmentQuery = z.output<typeof EnvironmentQuerySchema>;
