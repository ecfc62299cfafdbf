import { randomUUID } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { performance } from 'node:perf_hooks';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PRICE_LIST_LIMITS } from '../../../shared/price-list/fields';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, type TestApp } from '../../helpers/test-app';

/** The cookies a response sets, as one Cookie header, merged over the ones held. */
function keepCookies(held: Map<string, string>, res: Response): void {
  for (const c of res.headers.getSetCookie()) {
    const pair = c.split(';')[0]!;
    held.set(pair.slice(0, pair.indexOf('=')), pair);
  }
}

/** A signed-in buyer as a browser holds it: cookies and the session's CSRF token. */
async function signInOver(base: string, email: string): Promise<{ cookie: string; token: string }> {
  const held = new Map<string, string>();
  const cookie = () => [...held.values()].join('; ');
  const first = await fetch(`${base}/api/auth/csrf`);
  keepCookies(held, first);
  const { token } = (await first.json()) as { token: string };
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': token, cookie: cookie() },
    body: JSON.stringify({ email, password: TEST_PASSWORD }),
  });
  expect(login.status).toBe(200);
  keepCookies(held, login);
  const again = await fetch(`${base}/api/auth/csrf`, { headers: { cookie: cookie() } });
  keepCookies(held, again);
  return { cookie: cookie(), token: ((await again.json()) as { token: string }).token };
}

interface Timed {
  status: number;
  body: { error: { code: string; message: string; details: { reason: string } } };
  /** From the last byte of the upload handed to the socket to the first byte of the answer; negative when the answer came first. */
  answerAfterUploadMs: number;
}

/** POSTs a multipart upload by hand, so the end of the upload and the answer can each be timed. */
function timedUpload(base: string, auth: { cookie: string; token: string }, supplierId: string, file: Buffer): Promise<Timed> {
  const boundary = `----arcwise${randomUUID()}`;
  const head = Buffer.from(
    `--${boundary}\r\nContent-Disposition: form-data; name="supplierId"\r\n\r\n${supplierId}\r\n` +
      `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="huge.csv"\r\nContent-Type: text/csv\r\n\r\n`,
  );
  const tail = Buffer.from(`\r\n--${boundary}--\r\n`);
  const url = new URL('/api/price-lists', base);
  return new Promise((resolve, reject) => {
    let uploadEnded = Number.NaN;
    let answered = Number.NaN;
    const req = http.request(url, {
      method: 'POST',
      headers: {
        'content-type': `multipart/form-data; boundary=${boundary}`,
        'content-length': String(head.length + file.length + tail.length),
        cookie: auth.cookie,
        'x-csrf-token': auth.token,
      },
    });
    req.on('error', reject);
    req.on('response', (res) => {
      answered = performance.now();
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => {
        const settle = () =>
          resolve({
            status: res.statusCode ?? 0,
            body: JSON.parse(Buffer.concat(chunks).toString('utf8')) as Timed['body'],
            answerAfterUploadMs: answered - uploadEnded,
          });
        if (Number.isNaN(uploadEnded)) req.once('finish', settle);
        else settle();
      });
    });
    req.on('finish', () => {
      uploadEnded = performance.now();
    });
    // Written in pieces with back-pressure, as a browser's upload arrives.
    const pieces: Buffer[] = [head];
    for (let i = 0; i < file.length; i += 256 * 1024) pieces.push(file.subarray(i, i + 256 * 1024));
    pieces.push(tail);
    const writeNext = (): void => {
      for (;;) {
        const piece = pieces.shift();
        if (piece === undefined) {
          req.end();
          return;
        }
        if (!req.write(piece)) {
          req.once('drain', writeNext);
          return;
        }
      }
    };
    writeNext();
  });
}

describe('the row limit is checked while the file streams in', () => {
  let t: TestApp;
  let server: http.Server;
  let base: string;
  beforeAll(async () => {
    t = await createTestApp();
    server = http.createServer(t.app);
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  });
  afterAll(async () => {
    server.closeAllConnections();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await t.close();
  });

  it(`a ${(PRICE_LIST_LIMITS.maxDataRows + 1).toLocaleString('en-US')}-row file is refused within 5 s of its upload ending, leaving nothing behind`, async () => {
    const buyer = await makeUser(t.deps.dataSource, 'buyer');
    const auth = await signInOver(base, buyer.email);
    const made = await fetch(`${base}/api/suppliers`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', cookie: auth.cookie, 'x-csrf-token': auth.token },
      body: JSON.stringify({ name: `Row limit ${randomUUID().slice(0, 8)}` }),
    });
    expect(made.status).toBe(201);
    const supplierId = ((await made.json()) as { supplier: { id: string } }).supplier.id;

    const rows = PRICE_LIST_LIMITS.maxDataRows + 1;
    const lines = ['Part No,Brand,Cost,List'];
    for (let i = 0; i < rows; i++) lines.push(`RL-${String(i).padStart(7, '0')},Rowline,1.00,2.00`);
    const file = Buffer.from(`${lines.join('\n')}\n`);

    const res = await timedUpload(base, auth, supplierId, file);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({
      code: 'bad_request',
      message: `The file has more than ${PRICE_LIST_LIMITS.maxDataRows.toLocaleString('en-US')} rows.`,
      details: { reason: 'too-many-rows' },
    });
    // The requirement: refused within 5 s of the upload ending (it took 76 s when every row was staged first).
    expect(res.answerAfterUploadMs).toBeLessThan(5000);

    const history = await fetch(`${base}/api/price-lists?supplierId=${supplierId}`, { headers: { cookie: auth.cookie } });
    expect(((await history.json()) as { total: number }).total).toBe(0);
  }, 120_000);
});
