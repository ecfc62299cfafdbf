import { spawn, type ChildProcess } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { testServicesEnv } from './services-env';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));

export interface ChildServer {
  /** http://127.0.0.1:<port> of its HTTP side. */
  url: string;
  pid: number;
  /** Everything it printed so far (start-up lines and JSON log lines). */
  output(): string;
  /** Resolves with the exit code (null when a signal ended it) and the signal. */
  exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
  signal(signal: NodeJS.Signals): void;
  /** SIGKILL to its whole process group, then waits for it to be gone. */
  kill(): Promise<void>;
  /** For a test's clean-up: kills it if it is still running. */
  ensureGone(): Promise<void>;
}

/**
 * Starts `server/index.ts` (an app server) or `server/worker.ts` as its own node process on
 * loopback, on the test run's database, mail catcher and search service, as `npm start` and
 * `npm run worker` run them; resolves once it listens (port 0: the port it printed).
 */
export async function startChildServer(entry: 'index' | 'worker', env: Record<string, string> = {}): Promise<ChildServer> {
  const child: ChildProcess = spawn(process.execPath, ['--import', 'tsx', `server/${entry}.ts`], {
    cwd: ROOT,
    // Leads its own process group, so SIGKILL reaches all of it.
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: {
      ...process.env,
      ...testServicesEnv(),
      TSX_TSCONFIG_PATH: `${ROOT}/tsconfig.json`,
      HOST: '127.0.0.1',
      PORT: '0',
      WORKER_PORT: '0',
      ...env,
    },
  });
  let out = '';
  let running = true;
  child.stdout?.on('data', (d: Buffer) => (out += d.toString()));
  child.stderr?.on('data', (d: Buffer) => (out += d.toString()));
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) =>
    child.on('exit', (code, signal) => {
      running = false;
      resolve({ code, signal });
    }),
  );
  const port = await new Promise<number>((resolve, reject) => {
    const found = (): boolean => {
      const m = /(?:listening on http:\/\/localhost:|health and metrics on port )(\d+)/.exec(out);
      if (m) resolve(Number(m[1]));
      return Boolean(m);
    };
    child.stdout?.on('data', found);
    void exited.then(() => reject(new Error(`server/${entry}.ts ended before listening:\n${out}`)));
    setTimeout(() => reject(new Error(`server/${entry}.ts did not listen within 60 s:\n${out}`)), 60_000).unref();
  });
  const pid = child.pid ?? 0;
  const kill = async (): Promise<void> => {
    process.kill(-pid, 'SIGKILL');
    await exited;
  };
  return {
    url: `http://127.0.0.1:${port}`,
    pid,
    output: () => out,
    exited,
    signal: (s) => process.kill(pid, s),
    kill,
    async ensureGone() {
      if (running) await kill();
    },
  };
}
