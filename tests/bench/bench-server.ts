import 'reflect-metadata';
import type { AddressInfo } from 'node:net';
import { createApp } from '../../server/app';
import { buildDeps } from '../../server/bootstrap';
import { loadEnv } from '../../server/config/env';
import { startLocalServices } from '../../server/local-services';

/**
 * The app as `npm start` runs it, in a process of its own so that the load generator does not
 * share its event loop; `npm run bench` has prepared its database. Prints "READY <port> <documents> <ms>" once it serves.
 */
async function main(): Promise<void> {
  const local = await startLocalServices({ ...process.env, SMTP_URL: undefined, MEILI_HOST: undefined });
  const env = loadEnv({ ...process.env, ...local.env, PORT: '0', NODE_ENV: 'production', LOGIN_MAX_PER_CLIENT: '1000' });
  const deps = await buildDeps(env);
  const t0 = Date.now();
  const indexed = await deps.search.rebuild(deps.dataSource);
  const server = createApp(deps).listen(0, '127.0.0.1', () => {
    console.log(`READY ${(server.address() as AddressInfo).port} ${indexed} ${Date.now() - t0}`);
  });
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
