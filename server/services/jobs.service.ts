import type { DataSource } from 'typeorm';
import { AppError } from '../errors';
import type { JobQueue } from '../jobs/queue';
import { findProblemJob, listProblemJobs, type JobRow } from '../repositories/jobs.repository';

export function listJobs(ds: DataSource): Promise<JobRow[]> {
  return listProblemJobs(ds.manager);
}

/** A failed job gets one more attempt; one still retrying waits for its own. */
export async function retryJob(ds: DataSource, jobs: JobQueue, id: string): Promise<JobRow> {
  const row = await findProblemJob(ds.manager, id);
  if (!row) throw AppError.notFound('Failed job');
  if (row.state !== 'failed')
    throw AppError.conflict('This job is still being retried on its own; only a failed job can be retried by hand.');
  await jobs.retry(row.name, id);
  // A worker may have taken it already: then it is as retry() left it, due now with one more attempt allowed.
  const after = await findProblemJob(ds.manager, id);
  return after ?? { ...row, state: 'retry', retry_limit: row.retry_limit + 1, start_after: new Date() };
}
