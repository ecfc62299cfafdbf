import type { z } from 'zod';
import type { JobName } from '../../shared/schemas/jobs';
import type { JobDefinition } from './job';
import { mailSendJob } from './mail-send.job';
import { mailTransferJob } from './mail-transfer.job';
import { searchRebuildJob } from './search-rebuild.job';
import { searchRefreshJob } from './search-refresh.job';

/** Every job the queue knows, by the name it is enqueued under (the names live in shared/schemas/jobs.ts). */
export const JOBS = {
  'search.refresh': searchRefreshJob,
  'search.rebuild': searchRebuildJob,
  'mail.send': mailSendJob,
  'mail.transfer': mailTransferJob,
} satisfies Record<JobName, JobDefinition>;

export type JobPayload<N extends JobName> = z.infer<(typeof JOBS)[N]['schema']>;
