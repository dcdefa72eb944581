/**
 * Where an import's uploaded CSV waits for its job: in the storage of originals, so the
 * instance that takes the job reads it wherever the upload arrived. Removed when the import
 * has finished or failed.
 */
export function importKey(jobId: number): string {
  return `imports/${jobId}.csv`;
}
