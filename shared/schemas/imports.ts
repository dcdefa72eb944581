import { z } from 'zod';
import './messages';
import { IMPORT_FIELDS, REQUIRED_IMPORT_FIELDS } from '../domain/import-fields';
import { IMPORT_ENCODINGS } from '../domain/text-encoding';
import { queryBoolean } from './common';

/** Column → field; each field at most once, the required ones present. */
export const ImportMappingSchema = z
  .record(z.string().max(200), z.enum(IMPORT_FIELDS, 'Not a field Printwarden imports'))
  .superRefine((mapping, ctx) => {
    const fields = Object.values(mapping);
    for (const field of REQUIRED_IMPORT_FIELDS) {
      if (!fields.includes(field)) {
        ctx.addIssue({ code: 'custom', path: [field], message: `Map a column to ${field}` });
      }
    }
    const seen = new Set<string>();
    for (const [column, field] of Object.entries(mapping)) {
      if (seen.has(field)) {
        ctx.addIssue({ code: 'custom', path: [column], message: `${field} is mapped twice` });
      }
      seen.add(field);
    }
  });
export type ImportMappingInput = z.infer<typeof ImportMappingSchema>;

/** `?dryRun=1` checks without writing; `encoding` overrides the sniffed one. */
export const ImportQuerySchema = z.object({
  dryRun: queryBoolean.optional(),
  encoding: z.enum(IMPORT_ENCODINGS, 'Choose auto, utf-8 or windows-1252').optional(),
});
export const ImportInspectionQuerySchema = ImportQuerySchema.pick({ encoding: true });
