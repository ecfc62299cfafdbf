import { z } from 'zod';
import { defineJob } from './job';

/** The whole index from PostgreSQL, when a change touched too many parts to refresh them one by one. */
export const searchRebuildJob = defineJob({
  schema: z.object({ reason: z.string().min(1).max(200) }),
  batchSize: 1,
  // A rebuild reads everything: one waiting behind the running one is enough.
  policy: 'stately',
  expireInSeconds: 3600,
  summarize: ({ reason }) => `Whole index, ${reason}`,
  async handle(deps) {
    await deps.search.rebuild(deps.dataSource);
  },
});
