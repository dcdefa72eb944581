import { ImportJob } from '../models';

/** The latest imports, newest first, without their failed and preview rows. */
export function findRecentImportJobs(limit: number) {
  return ImportJob.findAll({
    attributes: { exclude: ['failed', 'preview'] },
    order: [['id', 'DESC']],
    limit,
  });
}

export function findImportJobById(id: number) {
  return ImportJob.findByPk(id);
}
