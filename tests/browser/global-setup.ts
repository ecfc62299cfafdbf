import 'reflect-metadata';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { createApp } from '../../server/app';
import { buildDeps, closeDeps } from '../../server/bootstrap';
import { loadEnv } from '../../server/config/env';
import { takeResponseMismatches } from '../../server/openapi/response-check';
import { startLocalServices } from '../../server/local-services';
import { seedAll } from '../../seed/seed-all';
import { buildClient, ROOT } from '../helpers/build-client';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    /** The client build the server serves. */
    distDir: string;
  }
}

/** Builds the client, then serves it with the API on the test database, as `npm start` would. */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const databaseUrl = process.env.TEST_DATABASE_URL ?? process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('Set TEST_DATABASE_URL (npm test does).');
  const outDir = path.join(ROOT, '.data', 'browser-dist');
  await buildClient(outDir);

  const local = await startLocalServices({ ...process.env, SMTP_URL: undefined, MEILI_HOST: undefined });
  const env = loadEnv({ ...process.env, ...local.env, NODE_ENV: 'test', DATABASE_URL: databaseUrl, STATIC_DIR: outDir, PORT: '0' });
  const deps = await buildDeps(env);
  await deps.dataSource.runMigrations({ transaction: 'each' });
  await seedAll(deps.dataSource);
  await deps.search.rebuild(deps.dataSource);
  await deps.jobs.startWorkers();
  const app = createApp(deps);
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const port = (server.address() as AddressInfo).port;
  // Invitation links must point at this server.
  deps.env.APP_URL = `http://localhost:${port}`;
  project.provide('baseUrl', `http://localhost:${port}`);
  project.provide('distDir', outDir);
  return async () => {
    server.closeAllConnections();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await closeDeps(deps);
    await local.close();
    // The journeys' answers were held against the API document too (NODE_ENV test).
    const mismatches = takeResponseMismatches();
    if (mismatches.length) throw new Error(`answers that do not match the API document: ${JSON.stringify(mismatches, null, 2)}`);
  };
}
