import http from 'node:http';
import { afterAll, beforeAll, describe, expect, inject, it, vi } from 'vitest';
import type { DataSource } from 'typeorm';
import { createDataSource } from '../../../server/db/data-source';
import { startChildServer, type ChildServer } from '../../helpers/child-server';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';

interface Answer {
  status: number;
  headers: http.IncomingHttpHeaders;
  body: string;
}

/** One request on a connection of its own (no keep-alive pool), so "a new connection" means one. */
function send(url: string, init: { method?: string; headers?: http.OutgoingHttpHeaders; body?: string } = {}): Promise<Answer> {
  return new Promise((resolve, reject) => {
    const req = http.request(url, { method: init.method ?? 'GET', headers: init.headers, agent: false }, (res) => {
      let body = '';
      res.on('data', (d: Buffer) => (body += d.toString()));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
    });
    req.on('error', reject);
    req.end(init.body);
  });
}

/** A sign-in whose body arrives in two parts: the request is under way until `finish()`. */
function slowSignIn(url: string, cookie: string, token: string, email: string): { finish(): void; answer: Promise<Answer> } {
  const body = JSON.stringify({ email, password: TEST_PASSWORD });
  const half = Math.floor(body.length / 2);
  let req!: http.ClientRequest;
  const answer = new Promise<Answer>((resolve, reject) => {
    req = http.request(
      `${url}/api/auth/login`,
      {
        method: 'POST',
        agent: false,
        headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(body), cookie, 'x-csrf-token': token },
      },
      (res) => {
        let text = '';
        res.on('data', (d: Buffer) => (text += d.toString()));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: text }));
      },
    );
    req.on('error', reject);
  });
  req.write(body.slice(0, half));
  return { finish: () => req.end(body.slice(half)), answer };
}

async function csrf(url: string): Promise<{ cookie: string; token: string }> {
  const res = await send(`${url}/api/auth/csrf`);
  const cookie = ([] as string[])
    .concat(res.headers['set-cookie'] ?? [])
    .map((c) => c.split(';')[0]!)
    .join('; ');
  return { cookie, token: (JSON.parse(res.body) as { token: string }).token };
}

const refused = async (url: string): Promise<void> => {
  const err = await send(`${url}/healthz`).then(
    (r) => new Error(`still answering: ${r.status}`),
    (e: unknown) => e,
  );
  if ((err as NodeJS.ErrnoException).code !== 'ECONNREFUSED') throw err;
};

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('SIGTERM to an app server', () => {
  let ds: DataSource;
  let email: string;
  beforeAll(async () => {
    ds = await createDataSource(inject('databaseUrl')).initialize();
    email = (await makeUser(ds, 'clerk')).email;
  });
  afterAll(() => ds.destroy());

  it('says not ready, refuses new connections, finishes the request under way, then exits 0', async () => {
    const server: ChildServer = await startChildServer('index', { SHUTDOWN_DELAY_SECONDS: '1', LOG_LEVEL: 'info' });
    try {
      expect((await send(`${server.url}/readyz`)).status).toBe(200);
      const { cookie, token } = await csrf(server.url);
      const slow = slowSignIn(server.url, cookie, token, email);
      // Sequencing, not timing: the request's head reaches the server before the signal.
      await sleep(300);

      server.signal('SIGTERM');
      // For SHUTDOWN_DELAY_SECONDS the listener stays open and readiness fails, so a balancer stops sending.
      const notReady = await vi.waitFor(
        async () => {
          const r = await send(`${server.url}/readyz`);
          if (r.status !== 503) throw new Error(`readyz ${r.status}`);
          return r;
        },
        { timeout: 2_000, interval: 50 },
      );
      expect(JSON.parse(notReady.body)).toMatchObject({ error: { code: 'unavailable', details: { stopping: true } } });
      // Then the listener closes: a new connection is refused while the sign-in is still under way.
      await vi.waitFor(() => refused(server.url), { timeout: 5_000, interval: 50 });

      slow.finish();
      const answer = await slow.answer;
      expect(answer.status, answer.body).toBe(200);
      expect((JSON.parse(answer.body) as { user: { email: string } }).user.email).toBe(email);
      expect(answer.headers.connection).toBe('close');

      expect(await server.exited).toEqual({ code: 0, signal: null });
      expect(server.output()).toContain('"msg":"stopped"');
    } finally {
      await server.ensureGone();
    }
  }, 60_000);

  it('cuts a request still under way at SHUTDOWN_TIMEOUT_SECONDS and still exits 0', async () => {
    const server = await startChildServer('index', { SHUTDOWN_TIMEOUT_SECONDS: '1', LOG_LEVEL: 'info' });
    try {
      const { cookie, token } = await csrf(server.url);
      const stuck = slowSignIn(server.url, cookie, token, email);
      await sleep(300);
      server.signal('SIGTERM');
      // Its body never ends: the server gives up on it after a second.
      await expect(stuck.answer).rejects.toThrow(/socket hang up|ECONNRESET/);
      expect(await server.exited).toEqual({ code: 0, signal: null });
      expect(server.output()).toMatch(/"cut":1,"msg":"requests cut at the shutdown time limit"/);
    } finally {
      await server.ensureGone();
    }
  }, 60_000);

  it('stops the same way on Ctrl-C followed by the TERM that npm start sends after it', async () => {
    const server = await startChildServer('index', { LOG_LEVEL: 'info' });
    try {
      server.signal('SIGINT');
      server.signal('SIGTERM');
      expect(await server.exited).toEqual({ code: 0, signal: null });
      expect(server.output()).toContain('"msg":"stopped"');
    } finally {
      await server.ensureGone();
    }
  }, 60_000);
});
