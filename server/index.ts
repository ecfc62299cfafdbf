import 'reflect-metadata';
import type { Server } from 'node:http';
import { createApp } from './app';
import { buildDeps, closeDeps } from './bootstrap';
import { loadEnv } from './config/env';
import { startLocalServices } from './local-services';

/** Connects, starts the local stand-ins where no real service is configured, listens. */
async function main(): Promise<void> {
  const local = await startLocalServices(process.env);
  const env = loadEnv({ ...process.env, ...local.env });
  const deps = await buildDeps(env);
  if (await deps.dataSource.showMigrations()) console.warn('[arcwise] migrations are pending: run server/db/migrate.ts');
  const started = Date.now();
  const indexed = await deps.search.rebuild(deps.dataSource);
  console.log(`[arcwise] search index rebuilt from PostgreSQL: ${indexed} parts in ${Date.now() - started} ms`);
  if (env.JOB_WORKERS) await deps.jobs.startWorkers();
  console.log(`[arcwise] follow-up jobs ${env.JOB_WORKERS ? 'run in this process' : 'are only queued here (JOB_WORKERS=0)'}`);
  const app = createApp(deps);
  const server: Server = app.listen(env.PORT, env.HOST, () => {
    console.log(`[arcwise] listening on http://localhost:${env.PORT}`);
  });
  let stopping = false;
  const stop = (): void => {
    if (stopping) return;
    stopping = true;
    server.close();
    server.closeAllConnections();
    void closeDeps(deps)
      .then(() => local.close())
      .finally(() => process.exit(0));
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((err: unknown) => {
  console.error('[arcwise] failed to start:', err);
  process.exit(1);
});
