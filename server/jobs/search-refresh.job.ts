import { z } from 'zod';
import { defineJob } from './job';

/** After a catalog edit or a price-list commit: re-read the touched parts from PostgreSQL into the index. */
export const searchRefreshJob = defineJob({
  schema: z.object({ partIds: z.array(z.string().uuid()).min(1) }),
  // Refreshes waiting together go to the search service in one pass.
  batchSize: 20,
  policy: 'standard',
  expireInSeconds: 300,
  summarize: ({ partIds }) => `${partIds.length} part${partIds.length === 1 ? '' : 's'}`,
  async handle(deps, payloads) {
    const ids = [...new Set(payloads.flatMap((p) => p.partIds))];
    await deps.search.refresh(deps.dataSource, ids);
  },
});
