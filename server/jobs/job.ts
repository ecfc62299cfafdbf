import type { z } from 'zod';
import type { AppDeps } from '../deps';

/** What a job's handler may use: the app's services, not the queue that runs it. */
export type JobDeps = Pick<AppDeps, 'env' | 'dataSource' | 'search' | 'mailer' | 'logger'>;

export interface JobDefinition<S extends z.ZodType = z.ZodType> {
  /** The payload, checked when it is enqueued and again when a worker reads it back. */
  schema: S;
  /** How many waiting jobs a worker takes at once; the handler gets them together. */
  batchSize: number;
  /** pg-boss's queue policy: 'stately' keeps at most one job waiting and one running. */
  policy: 'standard' | 'stately';
  /** An attempt running longer than this counts as failed (and is retried). */
  expireInSeconds: number;
  /** A few words for the Jobs page. */
  summarize(data: z.infer<S>): string;
  /** Throws to fail the attempt: the queue retries it later with backoff. */
  handle(deps: JobDeps, payloads: z.infer<S>[]): Promise<void>;
}

export const defineJob = <S extends z.ZodType>(definition: JobDefinition<S>): JobDefinition<S> => definition;
