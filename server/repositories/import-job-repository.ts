import { ImportJob } from '../models';

/** The latest imports, newest first. */
export function findRecentImportJobs(limit: number) {
  return ImportJob.findAll({ order: [['id', 'DESC']], limit });
}

export function findImportJobById(id: number) {
  return ImportJob.findByPk(id);
}
