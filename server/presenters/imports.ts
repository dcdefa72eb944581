import type { ImportJobView } from '../../shared/types/imports';
import type { ImportJob } from '../models';
import type { StoredFailure } from '../services/imports/run-import';

/** An import's progress; the failed rows' cells stay on the server (see failed.csv). */
export function presentImportJob(job: ImportJob): ImportJobView {
  return {
    ...presentImportJobSummary(job),
    failed: (job.failed as StoredFailure[]).map(({ row, errors }) => ({ row, errors })),
    preview: job.preview,
  };
}

/**
 * An import in the list of recent ones: its progress without its failed and preview rows,
 * which are not read from the database for it (a file of bad rows makes them megabytes).
 */
export function presentImportJobSummary(job: ImportJob): ImportJobView {
  return {
    id: job.id,
    status: job.status,
    dryRun: job.dryRun,
    fileName: job.fileName,
    encoding: job.encoding,
    rows: job.rows,
    processed: job.processed,
    imported: job.imported,
    updated: job.updated,
    unchanged: job.unchanged,
    failed: [],
    preview: [],
    error: job.error,
    createdAt: job.createdAt.toISOString(),
    finishedAt: job.finishedAt ? job.finishedAt.toISOString() : null,
  };
}
