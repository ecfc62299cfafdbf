/**
 * Runs the search stand-in on its own: `npx tsx server/search-standin/main.ts`.
 * MEILI_STANDIN_PORT (default 7701), MEILI_STANDIN_HOST (default 127.0.0.1) and, when the app's
 * client sends a key, MEILI_API_KEY to require it.
 */
import { startSearchStandin } from './server';

const DEFAULT_PORT = 7701;

async function main(): Promise<void> {
  const portText = process.env.MEILI_STANDIN_PORT;
  const port = portText ? Number(portText) : DEFAULT_PORT;
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    throw new Error(`MEILI_STANDIN_PORT must be a port number, got "${portText ?? ''}"`);
  }
  const apiKey = process.env.MEILI_API_KEY || undefined;
  const standin = await startSearchStandin({ port, host: process.env.MEILI_STANDIN_HOST ?? '127.0.0.1', apiKey });
  console.log(`Search stand-in (Meilisearch API) listening on ${standin.url}${apiKey ? ' (API key required)' : ''}`);

  const stop = (): void => {
    standin.close().then(
      () => process.exit(0),
      (error: unknown) => {
        console.error(error);
        process.exit(1);
      },
    );
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
