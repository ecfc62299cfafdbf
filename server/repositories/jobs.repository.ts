import { z } from 'zod';
import { JOB_NAMES, jobNameSchema, jobStateSchema } from '../../shared/schemas/jobs';
import { queryOne, queryRows, type Executor } from '../db/executor';
import { JOB_SCHEMA } from '../jobs/queue';

/** How many problem jobs the Jobs page lists, newest first. */
const LIST_LIMIT = 200;

const jobRowSchema = z.object({
  id: z.string().uuid(),
  name: jobNameSchema,
  state: jobStateSchema,
  data: z.unknown(),
  retry_count: z.number().int(),
  retry_limit: z.number().int(),
  created_on: z.date(),
  started_on: z.date().nullable(),
  start_after: z.date(),
  completed_on: z.date().nullable(),
  last_error: z.string().nullable(),
});
export type JobRow = z.infer<typeof jobRowSchema>;

// pg-boss stores a handler's error serialised ({ message, stack }), and its own as { value }.
const SELECT = `SELECT id, name, state::text AS state, data, retry_count, retry_limit, created_on, started_on, start_after, completed_on,
                       coalesce(output->>'message', output->'value'->>'message', output->>'value') AS last_error
                  FROM ${JOB_SCHEMA}.job`;

/** Our jobs that are waiting for another attempt or out of attempts, read from pg-boss's job table. */
export function listProblemJobs(ex: Executor): Promise<JobRow[]> {
  return queryRows(
    ex,
    jobRowSchema,
    `${SELECT} WHERE state IN ('retry', 'failed') AND name = ANY($1) ORDER BY created_on DESC, id LIMIT $2`,
    [JOB_NAMES, LIST_LIMIT],
  );
}

export function findProblemJob(ex: Executor, id: string): Promise<JobRow | null> {
  return queryOne(ex, jobRowSchema, `${SELECT} WHERE id = $1 AND state IN ('retry', 'failed') AND name = ANY($2)`, [id, JOB_NAMES]);
}

/** The states a queue's depth is told in: waiting, waiting to retry, running, out of attempts. */
export const QUEUE_DEPTH_STATES = ['created', 'retry', 'active', 'failed'] as const;
const depthRowSchema = z.object({ name: jobNameSchema, state: z.enum(QUEUE_DEPTH_STATES), jobs: z.number().int() });
export type QueueDepthRow = z.infer<typeof depthRowSchema>;

/** Jobs per queue and state, for the metrics (completed jobs are not depth, and are many). */
export function countQueuedJobs(ex: Executor): Promise<QueueDepthRow[]> {
  return queryRows(
    ex,
    depthRowSchema,
    `SELECT name, state::text AS state, count(*)::int AS jobs FROM ${JOB_SCHEMA}.job
      WHERE name = ANY($1) AND state::text = ANY($2) GROUP BY name, state`,
    [JOB_NAMES, QUEUE_DEPTH_STATES],
  );
}
