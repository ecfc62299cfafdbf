import 'reflect-metadata';
import type { AddressInfo } from 'node:net';
import { buildDeps, closeDeps } from './bootstrap';
import { loadEnv } from './config/env';
import { drainable, onStopSignals } from './lifecycle';
import { createOpsApp } from './ops-app';
import { prepareSearchIndex } from './search-at-start';

/**
 * `npm run worker`: runs the follow-up jobs (search index, mail) for app servers started with
 * JOB_WORKERS=0, on the same database, search service and SMTP server (MEILI_HOST and SMTP_URL must
 * name shared ones: a stand-in of its own would index for nobody). Serves only /healthz, /readyz
 * and /metrics on WORKER_PORT. On SIGTERM it stops taking jobs and waits for those running.
 */
async function main(): Promise<void> {
  const env = loadEnv({ ...process.env, JOB_WORKERS: '1' });
  const deps = await buildDeps(env);
  console.log(`[arcwise] worker: ${await prepareSearchIndex(deps, false)}`);
  await deps.jobs.startWorkers();
  const server = createOpsApp(deps).listen(env.WORKER_PORT, env.HOST, () => {
    console.log(`[arcwise] worker running follow-up jobs; health and metrics on port ${(server.address() as AddressInfo).port}`);
  });
  const http = drainable(server);
  onStopSignals(deps.logger, env.SHUTDOWN_TIMEOUT_SECONDS * 1000 + 30_000, async () => {
    deps.lifecycle.stopping = true;
    await http.drain(env.SHUTDOWN_TIMEOUT_SECONDS * 1000);
    await closeDeps(deps);
  });
}

main().catch((err: unknown) => {
  console.error('[arcwise] worker failed to start:', err);
  process.exit(1);
});
