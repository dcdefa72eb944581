import type { ImportField } from '../../../shared/domain/import-fields';
import { looksMisread, MISREAD_MESSAGE } from '../../../shared/domain/text-encoding';
import type { ImportFailure, ImportPreviewRow } from '../../../shared/types/imports';
import type { AppContext } from '../../context';
import { writeTransaction } from '../../db/write-transaction';
import { ImportJob, Print, User } from '../../models';
import { updatePrint } from '../prints/change-print';
import { changesFor } from './compare-existing';
import { readRecords, type CsvEncoding } from './csv-source';
import { importKey } from './import-file';
import { HeapBetweenBatches } from './memory-between-batches';
import { loadLookups } from './import-lookups';
import { rowToPrint, type FieldColumns } from './row-to-print';
import { createBatch, type NewRow } from './write-batch';

/** Rows per transaction: big enough for multi-row inserts to pay, small enough for steady progress. */
const BATCH_ROWS = 1000;
/** A dry run previews this many rows in full, and every invalid row. */
const PREVIEW_ROWS = 500;
const PREVIEW_LIMIT = 5000;

/** Stored with each failure so the failed rows can be downloaded as they were. */
export type StoredFailure = ImportFailure & { values: string[] };

export interface ImportPlan {
  jobId: number;
  path: string;
  encoding: CsvEncoding;
  headers: string[];
  mapping: Record<string, ImportField>;
  dryRun: boolean;
  user: User;
}

class ImportRun {
  private readonly columns: FieldColumns = {};
  private readonly mapped: ImportField[];
  private readonly seen = new Map<string, number>();
  private readonly failed: StoredFailure[] = [];
  private readonly preview: ImportPreviewRow[] = [];
  private counts = { processed: 0, imported: 0, updated: 0, unchanged: 0 };
  private batch: Array<NewRow & { values: string[] }> = [];
  private readonly heap = new HeapBetweenBatches();

  constructor(
    private readonly ctx: AppContext,
    private readonly plan: ImportPlan,
    private readonly lookups: Awaited<ReturnType<typeof loadLookups>>,
  ) {
    for (const [column, field] of Object.entries(plan.mapping)) {
      this.columns[field] = plan.headers.indexOf(column);
    }
    this.mapped = Object.values(plan.mapping);
  }

  async run(): Promise<void> {
    let row = 0;
    for await (const cells of readRecords(this.plan.path, this.plan.encoding)) {
      row += 1;
      if (row === 1) continue;
      this.take(row, cells);
      if (this.batch.length >= BATCH_ROWS) {
        await this.flush();
        this.heap.settle();
        // A committed batch is a safe point: what is in stays in, the rest is refused below.
        if (this.ctx.background.stopping) throw new Error(STOPPED_BY_SHUTDOWN);
      }
    }
    await this.flush();
  }

  private take(row: number, cells: string[]): void {
    const { input, errors } = rowToPrint(cells, this.columns, this.lookups);
    errors.push(...this.misread(cells));
    const accession = input?.accessionNumber ?? null;
    if (accession !== null) {
      const first = this.seen.get(accession.toLowerCase());
      if (first !== undefined) {
        errors.push({
          field: 'accessionNumber',
          message: `${accession} is already on row ${first} of this file`,
        });
      } else this.seen.set(accession.toLowerCase(), row);
    }
    if (!input || errors.length) {
      this.fail(row, cells, errors);
      return;
    }
    this.batch.push({ row, input: { ...input, accessionNumber: accession! }, values: cells });
  }

  /** Mapped cells whose text was decoded in the wrong encoding: never stored garbled. */
  private misread(cells: string[]): ImportFailure['errors'] {
    return (Object.entries(this.columns) as Array<[ImportField, number]>)
      .filter(([, index]) => looksMisread(cells[index] ?? ''))
      .map(([field]) => ({ field, message: MISREAD_MESSAGE }));
  }

  private fail(row: number, values: string[], errors: ImportFailure['errors']): void {
    this.failed.push({ row, errors, values });
    this.counts.processed += 1;
    if (this.plan.dryRun && this.preview.length < PREVIEW_LIMIT) {
      const cell = (field: ImportField) => {
        const index = this.columns[field];
        return index === undefined ? null : (values[index] ?? null);
      };
      this.preview.push({
        row,
        accessionNumber: cell('accessionNumber'),
        title: cell('title'),
        action: 'invalid',
        errors,
      });
    }
  }

  private async flush(): Promise<void> {
    const rows = this.batch;
    this.batch = [];
    if (rows.length === 0) return this.save('running');
    const existing = new Map(
      (
        await Print.findAll({
          where: { accessionNumber: rows.map((item) => item.input.accessionNumber) },
          paranoid: false,
        })
      ).map((print) => [print.accessionNumber.toLowerCase(), print]),
    );
    const creates: Array<NewRow & { values: string[] }> = [];
    for (const item of rows) {
      const print = existing.get(item.input.accessionNumber.toLowerCase());
      if (!print) {
        creates.push(item);
        this.note(item, 'create');
      } else if (print.deletedAt) {
        this.fail(item.row, item.values, [
          {
            field: 'accessionNumber',
            message: `${print.accessionNumber} belongs to a deleted print; restore it first`,
          },
        ]);
      } else {
        await this.applyChanges(item, print);
      }
    }
    if (!this.plan.dryRun) await this.create(creates);
    else this.counts.processed += creates.length;
    await this.save('running');
  }

  private async applyChanges(item: NewRow & { values: string[] }, print: Print): Promise<void> {
    const changes = changesFor(print, item.input, this.mapped);
    const action = Object.keys(changes).length === 0 ? 'unchanged' : 'update';
    this.note(item, action);
    this.counts.processed += 1;
    if (action === 'unchanged') {
      this.counts.unchanged += 1;
      return;
    }
    if (this.plan.dryRun) return;
    try {
      await updatePrint({ ...this.ctx, user: this.plan.user }, print.id, changes);
      this.counts.updated += 1;
    } catch (error) {
      this.counts.processed -= 1;
      this.fail(item.row, item.values, [{ field: 'row', message: (error as Error).message }]);
    }
  }

  private note(item: NewRow, action: ImportPreviewRow['action']): void {
    if (!this.plan.dryRun || this.preview.length >= PREVIEW_ROWS) return;
    const { row, input } = item;
    this.preview.push({
      row,
      accessionNumber: input.accessionNumber,
      title: input.title,
      action,
      errors: [],
    });
  }

  private async create(rows: Array<NewRow & { values: string[] }>): Promise<void> {
    const context = { ...this.ctx, user: this.plan.user };
    // The batch's prints are in the search index when this returns (noted as changed).
    const { created, failed } = await createBatch(context, rows, this.plan.jobId);
    this.counts.imported += created.length;
    this.counts.processed += created.length;
    for (const { row, message } of failed) {
      const values = rows.find((item) => item.row === row)?.values ?? [];
      this.fail(row, values, [{ field: 'row', message }]);
    }
  }

  async save(status: 'running' | 'done'): Promise<void> {
    await writeTransaction(this.ctx.sequelize, (transaction) =>
      ImportJob.update(
        {
          status,
          ...this.counts,
          failed: [...this.failed].sort((a, b) => a.row - b.row),
          preview: [...this.preview].sort((a, b) => a.row - b.row),
          finishedAt: status === 'done' ? new Date() : null,
        },
        { where: { id: this.plan.jobId }, transaction },
      ),
    );
  }
}

/** Counts the data rows (records after the header). */
export async function countRows(path: string, encoding: CsvEncoding): Promise<number> {
  let records = 0;
  for await (const _record of readRecords(path, encoding)) records += 1;
  return Math.max(records - 1, 0);
}

const STOPPED_BY_SHUTDOWN =
  'The server was stopped during the import; run it again (rows already imported are recognised by accession number).';

/**
 * The `csv-import` job: takes a queued import once (queued → running, so a second delivery
 * of the job does nothing), reads its file from storage on whichever instance this is, and
 * removes the file when the import has finished or failed.
 */
export async function runQueuedImport(ctx: AppContext, jobId: number): Promise<void> {
  const key = importKey(jobId);
  try {
    const [taken] = await writeTransaction(ctx.sequelize, (transaction) =>
      ImportJob.update(
        { status: 'running' },
        { where: { id: jobId, status: 'queued' }, transaction },
      ),
    );
    if (taken === 0) return;
    const job = (await ImportJob.findByPk(jobId))!;
    const user = job.createdBy === null ? null : await User.findByPk(job.createdBy);
    const path = await ctx.images.storage.localPath(key).catch(() => null);
    if (!user || !path) {
      await markImportFailed(
        ctx,
        jobId,
        user
          ? 'The file could not be read back from storage; upload it again.'
          : 'The person who started the import no longer has an account.',
      );
      return;
    }
    const plan: ImportPlan = {
      jobId,
      path,
      encoding: job.encoding as CsvEncoding,
      headers: job.headers,
      mapping: job.mapping as Record<string, ImportField>,
      dryRun: job.dryRun,
      user,
    };
    await runImport(ctx, plan, job.rows);
  } finally {
    await ctx.images.storage.delete(key).catch(() => undefined);
  }
}

/** Marks an import failed with its reason (never throws: it runs where something already failed). */
export function markImportFailed(ctx: AppContext, jobId: number, error: string): Promise<unknown> {
  return writeTransaction(ctx.sequelize, (transaction) =>
    ImportJob.update(
      { status: 'failed', error, finishedAt: new Date() },
      { where: { id: jobId }, transaction },
    ),
  ).catch(() => undefined);
}

/** Runs an import or dry run, keeping progress in its job row. */
export async function runImport(ctx: AppContext, plan: ImportPlan, rows: number): Promise<void> {
  try {
    await writeTransaction(ctx.sequelize, (transaction) =>
      ImportJob.update({ status: 'running', rows }, { where: { id: plan.jobId }, transaction }),
    );
    const job = new ImportRun(ctx, plan, await loadLookups());
    await job.run();
    await job.save('done');
  } catch (error) {
    await markImportFailed(ctx, plan.jobId, (error as Error).message);
  }
}
