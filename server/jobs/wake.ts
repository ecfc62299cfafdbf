import pg from 'pg';
import type { Logger } from '../observability/logger';

/** NOTIFY channel of new and retried jobs; the payload is the job's name. */
export const WAKE_CHANNEL = 'arcwise_jobs';

export interface JobWakeListener {
  close(): Promise<void>;
}

/**
 * Workers poll for due jobs; this wakes them at once instead. A NOTIFY sent inside a transaction
 * is delivered when it commits, so a worker (in this process or another) never wakes for a job
 * that is not there yet. Without this connection the workers still find every job by polling.
 */
export async function listenForNewJobs(databaseUrl: string, logger: Logger, onJob: (name: string) => void): Promise<JobWakeListener> {
  const client = new pg.Client({ connectionString: databaseUrl, application_name: 'arcwise-job-wake' });
  client.on('notification', (n) => {
    if (n.channel === WAKE_CHANNEL && n.payload) onJob(n.payload);
  });
  client.on('error', (err) => logger.error({ error: err.message }, 'job wake-up connection lost; workers keep polling'));
  await client.connect();
  await client.query(`LISTEN ${WAKE_CHANNEL}`);
  return { close: () => client.end() };
}
