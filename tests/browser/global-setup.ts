import 'reflect-metadata';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { build } from 'vite';
import type { TestProject } from 'vitest/node';
import { createApp } from '../../server/app';
import { buildDeps, closeDeps } from '../../server/bootstrap';
import { loadEnv } from '../../server/config/env';
import { takeResponseMismatches } from '../../server/openapi/response-check';
import { startLocalServices } from '../../server/local-services';
import { seedAll } from '../../seed/seed-all';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

const ROOT = path.resolve(import.meta.dirname, '../..');

/** Builds the client, then serves it with the API on the test database, as `npm start` would. */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const databaseUrl = process.env.TEST_DATABASE_URL ?? process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('Set TEST_DATABASE_URL (npm test does).');
  const outDir = path.join(ROOT, '.data', 'browser-dist');
  // Vite takes NODE_ENV from the environment; the test run's "test" would give React's dev build.
  const nodeEnv = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  await build({
    root: ROOT,
    mode: 'production',
    configFile: path.join(ROOT, 'vite.config.ts'),
    logLevel: 'warn',
    build: { outDir, emptyOutDir: true, sourcemap: false },
  });
  if (nodeEnv === undefined) delete process.env.NODE_ENV;
  else process.env.NODE_ENV = nodeEnv;

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
