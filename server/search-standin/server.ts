/**
 * Starts the local Meilisearch stand-in: an HTTP server that speaks the part of Meilisearch's
 * API the `meilisearch` SDK uses, on loopback, for when MEILI_HOST is not set.
 */
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { searchFastPath } from './search-fast-path';
import { createStandinApp } from './standin-app';
import { createStandinState, type StandinState } from './standin-state';

export interface SearchStandinOptions {
  /** 0 picks a free port. */
  port?: number;
  host?: string;
  /** When set, every route but /health wants `Authorization: Bearer <apiKey>`. */
  apiKey?: string;
}

export interface RunningSearchStandin {
  url: string;
  port: number;
  /** Resolves once every task enqueued so far has been applied. */
  whenIdle(): Promise<void>;
  close(): Promise<void>;
}

export async function startSearchStandin(options: SearchStandinOptions = {}): Promise<RunningSearchStandin> {
  const host = options.host ?? '127.0.0.1';
  const state: StandinState = createStandinState();
  const app = createStandinApp(state, options.apiKey);
  // Searches, the hot path, skip Express; everything else (and any unusual search) goes to it.
  const fastSearch = searchFastPath(state, options.apiKey);
  const server = createServer((req, res) => {
    if (!fastSearch(req, res)) app(req, res);
  });
  // The SDK keeps connections alive between polls; a short timeout lets close() finish promptly.
  server.keepAliveTimeout = 5_000;

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, host, () => {
      server.off('error', reject);
      resolve();
    });
  });

  const { port } = server.address() as AddressInfo;
  const urlHost = host.includes(':') ? `[${host}]` : host;
  return {
    url: `http://${urlHost}:${port}`,
    port,
    whenIdle: () => state.tasks.whenIdle(),
    close: () =>
      new Promise<void>((resolve, reject) => {
        server.close((error) => (error ? reject(error) : resolve()));
        server.closeAllConnections();
      }),
  };
}
