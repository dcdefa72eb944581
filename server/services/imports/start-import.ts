import { rm } from 'node:fs/promises';
import { Op } from 'sequelize';
import { guessMapping, layoutKey, type ImportField } from '../../../shared/domain/import-fields';
import type { ImportEncoding } from '../../../shared/domain/text-encoding';
import type { ImportInspection } from '../../../shared/types/imports';
import type { AppContext } from '../../context';
import { dialectOf } from '../../db/dialect';
import { writeTransaction } from '../../db/write-transaction';
import { HttpProblem, problems } from '../../middleware/problem';
import { ImportJob, ImportMapping, type User } from '../../models';
import { detectEncoding, readHeaders, readRecords, type CsvEncoding } from './csv-source';
import { importKey } from './import-file';
import { countRows, markImportFailed } from './run-import';

/** Larger files are refused before anything is read into the catalogue. */
export const MAX_IMPORT_ROWS = 100_000;

export interface UploadedCsv {
  path: string;
  originalName: string;
}

async function headersOf(
  file: UploadedCsv,
  choice: ImportEncoding = 'auto',
): Promise<{ encoding: CsvEncoding; headers: string[] }> {
  const encoding = choice === 'auto' ? await detectEncoding(file.path) : choice;
  const headers = await readHeaders(file.path, encoding);
  if (!headers || headers.every((header) => header === '')) {
    throw problems.invalid([{ path: 'file', message: 'The file is empty: no header row' }]);
  }
  const blank = headers.findIndex((header) => header === '');
  if (blank >= 0) {
    throw problems.invalid([
      { path: 'file', message: `Column ${blank + 1} has no name in the header row` },
    ]);
  }
  return { encoding, headers };
}

/** What a file holds and how its columns map, for the mapping step: the saved mapping of this layout, else a guess. */
export async function inspectCsv(
  file: UploadedCsv,
  choice: ImportEncoding = 'auto',
): Promise<ImportInspection> {
  try {
    const { encoding, headers } = await headersOf(file, choice);
    const sample: Array<Record<string, string>> = [];
    let index = 0;
    for await (const cells of readRecords(file.path, encoding)) {
      index += 1;
      if (index === 1) continue;
      sample.push(
        Object.fromEntries(headers.map((header, column) => [header, cells[column] ?? ''])),
      );
      if (sample.length >= 5) break;
    }
    const saved = await ImportMapping.findOne({ where: { headersKey: layoutKey(headers) } });
    const usable = saved && Object.keys(saved.mapping).every((column) => headers.includes(column));
    return {
      encoding,
      headers,
      sample,
      mapping: usable ? saved.mapping : guessMapping(headers),
      savedMapping: Boolean(usable),
    };
  } finally {
    await rm(file.path, { force: true });
  }
}

/**
 * Checks the file and mapping, keeps the mapping for next time, records the job, moves the
 * file into storage and queues the `csv-import` job (run once, on any instance). Any problem
 * found in the file answers 422 before a job exists.
 */
export async function startImport(
  ctx: AppContext,
  file: UploadedCsv,
  mapping: Record<string, ImportField>,
  options: { dryRun: boolean; user: User; encoding?: ImportEncoding },
): Promise<ImportJob> {
  try {
    const { encoding, headers } = await headersOf(file, options.encoding);
    const missing = Object.keys(mapping).filter((column) => !headers.includes(column));
    if (missing.length) {
      throw problems.invalid(
        missing.map((column) => ({
          path: `mapping.${column}`,
          message: `The file has no column “${column}”`,
        })),
      );
    }
    const rows = await countRows(file.path, encoding);
    if (rows === 0)
      throw problems.invalid([{ path: 'file', message: 'The file has a header but no rows' }]);
    if (rows > MAX_IMPORT_ROWS) {
      throw new HttpProblem(
        413,
        'Too many rows',
        `The file has ${rows} rows; import at most ${MAX_IMPORT_ROWS} at a time.`,
      );
    }
    const job = await writeTransaction(ctx.sequelize, async (transaction) => {
      const key = layoutKey(headers);
      const saved = await ImportMapping.findOne({ where: { headersKey: key }, transaction });
      if (saved) await saved.update({ mapping }, { transaction });
      else await ImportMapping.create({ headersKey: key, mapping }, { transaction });
      return ImportJob.create(
        {
          status: 'queued',
          dryRun: options.dryRun,
          fileName: file.originalName,
          encoding,
          mapping,
          headers,
          rows,
          error: null,
          createdBy: options.user.id,
          finishedAt: null,
        },
        { transaction },
      );
    });
    try {
      // A file left under this number by an earlier database (a restored backup) goes first.
      await ctx.images.storage.delete(importKey(job.id));
      await ctx.images.storage.putFile(importKey(job.id), file.path);
      await ctx.jobs.send('csv-import', { jobId: job.id });
    } catch (error) {
      await markImportFailed(
        ctx,
        job.id,
        'The file could not be handed to the import; upload it again.',
      );
      await ctx.images.storage.delete(importKey(job.id)).catch(() => undefined);
      throw error;
    }
    return job;
  } catch (error) {
    await rm(file.path, { force: true });
    throw error;
  }
}

/** An import that has saved nothing for this long is no longer running anywhere. */
const SILENT_IMPORT_MS = 10 * 60_000;

/** Jobs a restart cut short can never finish: say so rather than show them running for ever. */
export async function failInterruptedImports(ctx: AppContext): Promise<void> {
  // On a database several instances share, a queued import waits in the job queue, and
  // another instance may be running one now: only a running import that has saved no
  // progress for a while (every batch saves) was cut short. On one instance, the queue
  // went with the process.
  const shared = dialectOf(ctx.sequelize).severalInstances;
  const where = shared
    ? { status: 'running', updatedAt: { [Op.lt]: new Date(Date.now() - SILENT_IMPORT_MS) } }
    : { status: ['queued', 'running'] };
  const cut = await ImportJob.findAll({ where, attributes: ['id'] });
  if (cut.length === 0) return;
  await writeTransaction(ctx.sequelize, (transaction) =>
    ImportJob.update(
      {
        status: 'failed',
        error:
          'The server restarted during the import; run it again (rows already imported are recognised by accession number).',
        finishedAt: new Date(),
      },
      { where: { id: cut.map((job) => job.id), status: ['queued', 'running'] }, transaction },
    ),
  );
  for (const { id } of cut) await ctx.images.storage.delete(importKey(id)).catch(() => undefined);
}
