/**
 * Starts the search stand-in on loopback: by default as a child process of its own, so that its
 * indexing and searching do not share the app's event loop; `inProcess` serves it from this one.
 */
import { fork } from 'node:child_process';
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { fileURLToPath } from 'node:url';
import { createStandinApp, createState } from './app';

export interface SearchStandinOptions {
  port?: number; // 0 picks a free port
  host?: string;
  apiKey?: string; // as Meilisearch's master key: every route but /health then wants `Authorization: Bearer <apiKey>`
  inProcess?: boolean;
}

export interface RunningSearchStandin {
  url: string;
  close(): Promise<void>;
}

// A young generation large enough for a search's short-lived results, else promoted and collected with the whole index.
const NODE_FLAGS = ['--max-semi-space-size=64', '--import', 'tsx'];
const MAIN = fileURLToPath(new URL('./main.ts', import.meta.url));
const ROOT = fileURLToPath(new URL('../..', import.meta.url));

export async function serveSearchStandin(options: SearchStandinOptions): Promise<RunningSearchStandin> {
  const host = options.host ?? '127.0.0.1';
  const server = createServer(createStandinApp(createState(), options.apiKey));
  // Longer than the SDK's keep-alive, so a busy moment never closes a socket it is about to reuse.
  server.keepAliveTimeout = 60_000;
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, host, () => resolve());
  });
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://${host.includes(':') ? `[${host}]` : host}:${port}`,
    close: () =>
      new Promise<void>((resolve, reject) => {
        server.close((error) => (error ? reject(error) : resolve()));
        server.closeAllConnections();
      }),
  };
}

async function forkSearchStandin(options: SearchStandinOptions): Promise<RunningSearchStandin> {
  const env = {
    ...process.env,
    MEILI_PORT: String(options.port ?? 0),
    MEILI_BIND_HOST: options.host ?? '127.0.0.1',
    MEILI_MASTER_KEY: options.apiKey ?? '',
  };
  const child = fork(MAIN, [], { cwd: ROOT, env, execArgv: NODE_FLAGS, stdio: ['ignore', 'inherit', 'inherit', 'ipc'] });
  const url = await new Promise<string>((resolve, reject) => {
    child.once('message', (m: { url?: string }) => (m.url ? resolve(m.url) : reject(new Error('search stand-in sent no url'))));
    child.once('exit', (code) => reject(new Error(`search stand-in exited with ${code} before listening`)));
  });
  return {
    url,
    close: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null || child.signalCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}

export function startSearchStandin(options: SearchStandinOptions = {}): Promise<RunningSearchStandin> {
  return options.inProcess ? serveSearchStandin(options) : forkSearchStandin(options);
}
