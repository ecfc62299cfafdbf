import { z } from 'zod';

/** The follow-up jobs that run after a commit, each worked by the job queue in PostgreSQL. */
export const JOB_NAMES = ['search.refresh', 'search.rebuild', 'mail.send', 'mail.transfer'] as const;
export const jobNameSchema = z.enum(JOB_NAMES);
export type JobName = z.infer<typeof jobNameSchema>;

export const JOB_LABELS: Record<JobName, string> = {
  'search.refresh': 'Search index refresh',
  'search.rebuild': 'Search index rebuild',
  'mail.send': 'E-mail',
  'mail.transfer': 'Transfer e-mail',
};

/** The states the Jobs page lists: waiting for another attempt, or out of attempts. */
export const JOB_STATES = ['retry', 'failed'] as const;
export const jobStateSchema = z.enum(JOB_STATES);
export type JobState = z.infer<typeof jobStateSchema>;

export const jobSummarySchema = z.object({
  id: z.string().uuid(),
  name: jobNameSchema,
  state: jobStateSchema,
  /** What the job is about, in a few words ("3 parts", "Invitation e-mail to …"). */
  summary: z.string(),
  attempts: z.number().int().min(0),
  maxAttempts: z.number().int().min(1),
  lastError: z.string().nullable(),
  createdAt: z.string(),
  lastAttemptAt: z.string().nullable(),
  /** When a retrying job runs again; null once it failed for good. */
  nextAttemptAt: z.string().nullable(),
  failedAt: z.string().nullable(),
});
export type JobSummary = z.infer<typeof jobSummarySchema>;

export const jobsResponseSchema = z.object({ jobs: z.array(jobSummarySchema) });
export type JobsResponse = z.infer<typeof jobsResponseSchema>;

export const jobIdParamSchema = z.object({ id: z.string().uuid() });

export const retryJobResponseSchema = z.object({ job: jobSummarySchema });
export type RetryJobResponse = z.infer<typeof retryJobResponseSchema>;
