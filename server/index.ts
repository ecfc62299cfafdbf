import 'reflect-metadata';
import type { AddressInfo } from 'node:net';
import { createApp } from './app';
import { buildDeps, closeDeps } from './bootstrap';
import { loadEnv } from './config/env';
import { drainable, onStopSignals } from './lifecycle';
import { startLocalServices } from './local-services';
import { prepareSearchIndex } from './search-at-start';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Connects, starts the local stand-ins where no real service is configured, listens; drains on SIGTERM. */
async function main(): Promise<void> {
  const local = await startLocalServices(process.env);
  const env = loadEnv({ ...process.env, ...local.env });
  const deps = await buildDeps(env);
  if (await deps.dataSource.showMigrations()) console.warn('[arcwise] migrations are pending: run server/db/migrate.ts');
  console.log(`[arcwise] ${await prepareSearchIndex(deps, Boolean(local.env.MEILI_HOST))}`);
  if (env.JOB_WORKERS) await deps.jobs.startWorkers();
  console.log(`[arcwise] follow-up jobs ${env.JOB_WORKERS ? 'run in this process' : 'are only queued here (JOB_WORKERS=0)'}`);
  const server = createApp(deps).listen(env.PORT, env.HOST, () => {
    console.log(`[arcwise] listening on http://localhost:${(server.address() as AddressInfo).port}`);
  });
  const http = drainable(server);
  const graceMs = env.SHUTDOWN_TIMEOUT_SECONDS * 1000;
  const delayMs = env.SHUTDOWN_DELAY_SECONDS * 1000;
  // Requests, then jobs (pg-boss waits for running ones, up to its own 20 s), then the pools.
  onStopSignals(deps.logger, delayMs + graceMs + 30_000, async () => {
    deps.lifecycle.stopping = true;
    await sleep(delayMs);
    const cut = await http.drain(graceMs);
    if (cut > 0) deps.logger.warn({ cut }, 'requests cut at the shutdown time limit');
    await closeDeps(deps);
    await local.close();
  });
}

main().catch((err: unknown) => {
  console.error('[arcwise] failed to start:', err);
  process.exit(1);
});
