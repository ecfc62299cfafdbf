import type { JobsResponse, JobSummary, RetryJobResponse } from '../../shared/schemas/jobs';
import { JOBS } from '../jobs';
import type { JobDefinition } from '../jobs/job';
import type { JobRow } from '../repositories/jobs.repository';

function summarize(row: JobRow): string {
  const job: JobDefinition = JOBS[row.name];
  const data = job.schema.safeParse(row.data);
  return data.success ? job.summarize(data.data) : 'unreadable payload';
}

/** The only way a pg-boss job row becomes JSON: a summary of its payload, never the payload itself. */
export function presentJob(row: JobRow): JobSummary {
  const attempted = row.started_on !== null;
  return {
    id: row.id,
    name: row.name,
    state: row.state,
    summary: summarize(row),
    // pg-boss counts retries from the second attempt on.
    attempts: attempted ? row.retry_count + 1 : 0,
    maxAttempts: row.retry_limit + 1,
    lastError: row.last_error,
    createdAt: row.created_on.toISOString(),
    lastAttemptAt: row.started_on?.toISOString() ?? null,
    nextAttemptAt: row.state === 'retry' ? row.start_after.toISOString() : null,
    failedAt: row.state === 'failed' ? (row.completed_on?.toISOString() ?? null) : null,
  };
}

export const presentJobs = (rows: JobRow[]): JobsResponse => ({ jobs: rows.map(presentJob) });
export const presentRetriedJob = (row: JobRow): RetryJobResponse => ({ job: presentJob(row) });
