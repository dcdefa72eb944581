import { mkdirSync } from 'node:fs';
import { rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { stringify } from 'csv-stringify/sync';
import { Router, type NextFunction, type Request, type Response } from 'express';
import multer from 'multer';
import { importFieldLabel, PROBLEMS_COLUMN } from '../../shared/domain/import-fields';
import { IdParamsSchema } from '../../shared/schemas/common';
import type { ImportEncoding } from '../../shared/domain/text-encoding';
import {
  ImportInspectionQuerySchema,
  ImportMappingSchema,
  ImportQuerySchema,
} from '../../shared/schemas/imports';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { problems } from '../middleware/problem';
import { multipartLimits, multipartProblem } from '../middleware/multipart';
import { fieldErrors, parsed, validate } from '../middleware/validate';
import { findImportJob, recentImportJobs } from '../services/imports/import-jobs';
import { presentImportJob, presentImportJobSummary } from '../presenters/imports';
import type { StoredFailure } from '../services/imports/run-import';
import { inspectCsv, startImport, type UploadedCsv } from '../services/imports/start-import';

const uploadDir = join(tmpdir(), 'printwarden-imports');
const limitMb = () => Number(process.env.UPLOAD_LIMIT_MB ?? 500);

/** One CSV file in the `file` field, streamed to a temporary file (never held in memory). */
function receiveCsv(req: Request, res: Response, next: NextFunction) {
  mkdirSync(uploadDir, { recursive: true });
  const upload = multer({
    dest: uploadDir,
    // The mapping is the one field: column names to fields, a few kilobytes at most.
    limits: multipartLimits({
      fileSize: limitMb() * 1024 * 1024,
      fields: 4,
      fieldSize: 64 * 1024,
    }),
  });
  upload.single('file')(req, res, (error: unknown) => {
    if (error) return next(multipartProblem(error, `Files of up to ${limitMb()} MB are accepted.`));
    if (!req.file) return next(problems.invalid([{ path: 'file', message: 'Choose a CSV file' }]));
    next();
  });
}

const uploaded = (req: Request): UploadedCsv => ({
  path: req.file!.path,
  originalName: req.file!.originalname,
});

/** Text a spreadsheet would run as a formula gets a leading apostrophe (OWASP, "CSV Injection"). */
const defuse = (value: string) => (/^[=+\-@\t\r]/.test(value) ? `'${value}` : value);

/** `/api/imports`: CSV imports and dry runs, their progress and their failed rows. */
export function importsRouter(ctx: AppContext): Router {
  const router = Router();

  router.get('/', requireAbility('imports:write'), async (_req, res) => {
    const jobs = await recentImportJobs();
    res.json({ items: jobs.map(presentImportJobSummary) });
  });

  router.post(
    '/inspection',
    requireAbility('imports:write'),
    validate(ImportInspectionQuerySchema, 'query'),
    receiveCsv,
    async (req, res) => {
      const { encoding } = parsed<{ encoding?: ImportEncoding }>(res, 'query');
      res.json(await inspectCsv(uploaded(req), encoding));
    },
  );

  router.post(
    '/',
    requireAbility('imports:write'),
    validate(ImportQuerySchema, 'query'),
    receiveCsv,
    async (req, res) => {
      const file = uploaded(req);
      let mapping: unknown;
      try {
        mapping = JSON.parse(String(req.body?.mapping ?? ''));
      } catch {
        mapping = undefined;
      }
      const result = ImportMappingSchema.safeParse(mapping);
      if (!result.success) {
        await rm(file.path, { force: true });
        throw problems.invalid(
          mapping === undefined
            ? [{ path: 'mapping', message: 'Send the mapping as JSON: { "column": "field" }' }]
            : fieldErrors(result.error).map((error) => ({
                ...error,
                path: `mapping.${error.path}`,
              })),
        );
      }
      const { dryRun = false, encoding } = parsed<{ dryRun?: boolean; encoding?: ImportEncoding }>(
        res,
        'query',
      );
      const job = await startImport(ctx, file, result.data, {
        dryRun,
        encoding,
        user: currentUser(req),
      });
      res.status(202).location(`/api/imports/${job.id}`).json({ id: job.id });
    },
  );

  router.get(
    '/:id',
    requireAbility('imports:write'),
    validate(IdParamsSchema, 'params'),
    async (_req, res) => {
      const job = await findImportJob(parsed<{ id: number }>(res, 'params').id);
      res.json(presentImportJob(job));
    },
  );

  router.get(
    '/:id/failed.csv',
    requireAbility('imports:write'),
    validate(IdParamsSchema, 'params'),
    async (_req, res) => {
      const job = await findImportJob(parsed<{ id: number }>(res, 'params').id);
      const headers = job.headers.filter((header) => header !== PROBLEMS_COLUMN);
      const rows = (job.failed as StoredFailure[]).map((failure) => [
        ...headers.map(
          (_header, index) => failure.values[job.headers.indexOf(headers[index]!)] ?? '',
        ),
        failure.errors
          .map((error) => `${importFieldLabel(error.field)}: ${error.message}`)
          .join('; '),
      ]);
      res
        .type('text/csv; charset=utf-8')
        .attachment(`import-${job.id}-failed-rows.csv`)
        .send(
          stringify([[...headers, PROBLEMS_COLUMN], ...rows], {
            cast: { string: defuse },
            bom: true,
          }),
        );
    },
  );

  return router;
}
