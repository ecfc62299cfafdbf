import type { DataSource } from 'typeorm';
import { vi } from 'vitest';
import type { JobName } from '../../shared/schemas/jobs';
import { JOB_SCHEMA } from '../../server/jobs/queue';

export interface QueuedJob {
  id: string;
  state: string;
  retry_count: number;
  data: Record<string, unknown>;
}

const SELECT = `SELECT id, state::text AS state, retry_count, data FROM ${JOB_SCHEMA}.job`;

/** Our jobs in pg-boss's table whose payload contains `payload`, oldest first. */
export async function queuedJobs(ds: DataSource, name: JobName, payload: object): Promise<QueuedJob[]> {
  return (await ds.query(`${SELECT} WHERE name = $1 AND data @> $2::jsonb ORDER BY created_on, id`, [
    name,
    JSON.stringify(payload),
  ])) as QueuedJob[];
}

/** The one job with this payload, enqueued by the write just made. */
export async function onlyJob(ds: DataSource, name: JobName, payload: object): Promise<QueuedJob> {
  const jobs = await queuedJobs(ds, name, payload);
  if (jobs.length !== 1) throw new Error(`${jobs.length} ${name} jobs with ${JSON.stringify(payload)}, expected one`);
  return jobs[0]!;
}

/** Polls until the job is in one of `states` (workers run in the background). */
export function waitForJobState(ds: DataSource, id: string, states: string[], timeout = 20_000): Promise<QueuedJob> {
  return vi.waitFor(
    async () => {
      const job = ((await ds.query(`${SELECT} WHERE id = $1`, [id])) as QueuedJob[])[0];
      if (!job || !states.includes(job.state))
        throw new Error(`job ${id} is ${job?.state ?? 'missing'}, waiting for ${states.join(' or ')}`);
      return job;
    },
    { timeout, interval: 100 },
  );
}
