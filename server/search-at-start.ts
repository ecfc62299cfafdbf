import type { AppDeps } from './deps';

/** Documents in the shared index; a missing index counts as empty. */
async function indexedParts(deps: Pick<AppDeps, 'search'>): Promise<number> {
  try {
    return (await deps.search.index.getStats()).numberOfDocuments;
  } catch {
    return 0;
  }
}

/**
 * Readies the search index at start. A stand-in this process started is empty: it is built here
 * before serving. A shared search service is not this server's to rebuild at every start (N
 * servers, rolling restarts): it is rebuilt through the queue only when it holds no parts (a new
 * service, or a stand-in process restarted), and catalog changes keep it current through jobs.
 * Returns what was done, for the start-up line.
 */
export async function prepareSearchIndex(deps: Pick<AppDeps, 'search' | 'dataSource' | 'jobs'>, ownStandin: boolean): Promise<string> {
  if (ownStandin) {
    const started = Date.now();
    const indexed = await deps.search.rebuild(deps.dataSource);
    return `search index rebuilt from PostgreSQL: ${indexed} parts in ${Date.now() - started} ms`;
  }
  const parts = await indexedParts(deps);
  if (parts > 0) return `shared search index holds ${parts} parts`;
  await deps.dataSource.transaction((m) => deps.jobs.enqueue(m, 'search.rebuild', { reason: 'the search service held no parts at start' }));
  return 'shared search index is empty: a rebuild is queued';
}
