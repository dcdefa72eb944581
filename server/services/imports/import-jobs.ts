import type { ImportJob } from '../../models';
import { problems } from '../../middleware/problem';
import { findImportJobById, findRecentImportJobs } from '../../repositories/import-job-repository';

/** The last ten imports, newest first. */
export function recentImportJobs() {
  return findRecentImportJobs(10);
}

/** One import with its progress and failed rows; 404 when there is none. */
export async function findImportJob(id: number): Promise<ImportJob> {
  const job = await findImportJobById(id);
  if (!job) throw problems.notFound('The import');
  return job;
}
