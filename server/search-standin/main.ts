/**
 * The search stand-in as a process of its own (`npm run search:standin`), which several app servers
 * can share: MEILI_PORT (default 7700), MEILI_BIND_HOST (default 127.0.0.1), and MEILI_MASTER_KEY to
 * require that key, as Meilisearch does. Started by startSearchStandin(), it reports its URL over IPC
 * and ends with its parent.
 */
import { serveSearchStandin } from './server';

const port = Number(process.env.MEILI_PORT || 7700);
if (!Number.isInteger(port) || port < 0 || port > 65535)
  throw new Error(`MEILI_PORT must be a port number, not "${process.env.MEILI_PORT}"`);
const apiKey = process.env.MEILI_MASTER_KEY || undefined;
const standin = await serveSearchStandin({ port, host: process.env.MEILI_BIND_HOST || '127.0.0.1', apiKey });

const stop = (): void => void standin.close().finally(() => process.exit(0));
process.once('SIGINT', stop);
process.once('SIGTERM', stop);
if (process.send) {
  process.send({ url: standin.url });
  process.once('disconnect', stop);
} else {
  console.log(`[arcwise] search stand-in (Meilisearch API) on ${standin.url}${apiKey ? ', master key required' : ''}`);
}
