import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, inject, it, vi } from 'vitest';
import { z } from 'zod';
import type { PartDetail } from '../../../shared/schemas/parts';
import type { SearchResponse } from '../../../shared/schemas/search';
import { insertReturningId, queryOne, type Executor } from '../../../server/db/executor';
import { readCaughtUp, readOnly } from '../../../server/db/read-only';
import { loadPartDocuments } from '../../../server/search/part-document';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { Standby } from '../../helpers/standby';
import { createTestApp, signIn, type Agent, type TestApp } from '../../helpers/test-app';

/**
 * DATABASE_REPLICA_URLS against a real streaming standby of the test database's server. The proof
 * that a read came from the standby: with the standby's replay paused, an edit committed on the
 * primary is missing from the answer (and present on the primary); once replay resumes, it shows.
 */
describe('read replicas: a streaming standby on loopback', () => {
  let standby: Standby;
  let t: TestApp;
  let buyer: { agent: Agent; token: string };
  const primaryPort = Number(new URL(inject('databaseUrl')).port);
  const tag = randomBytes(3).toString('hex').toUpperCase();

  beforeAll(async () => {
    standby = await Standby.start(inject('databaseUrl'));
    t = await createTestApp({ DATABASE_REPLICA_URLS: standby.url });
    const user = await makeUser(t.deps.dataSource, 'buyer');
    buyer = await signIn(t.app, user.email, TEST_PASSWORD);
  }, 180_000);

  afterAll(async () => {
    await t?.close();
    await standby?.stop();
  });

  const descriptionOn = async (server: Executor, partId: string): Promise<string | undefined> =>
    (await queryOne(server, z.object({ description: z.string() }), `SELECT description FROM part WHERE id = $1`, [partId]))?.description;
  const partDetail = async (id: string): Promise<PartDetail> => (await buyer.agent.get(`/api/parts/${id}`).expect(200)).body as PartDetail;

  it('is a hot standby streaming from the test database’s server, and the app knows it has a replica', async () => {
    const recovery = await queryOne(standby.standby, z.object({ recovering: z.boolean() }), `SELECT pg_is_in_recovery() AS recovering`);
    expect(recovery?.recovering).toBe(true);
    const sender = await queryOne(
      standby.primary,
      z.object({ state: z.string() }),
      `SELECT state FROM pg_stat_replication WHERE state = 'streaming' LIMIT 1`,
    );
    expect(sender?.state).toBe('streaming');
    expect(t.deps.dataSource.driver.isReplicated).toBe(true);
  });

  it('serves a part-detail read from the standby and an edit from the primary; the edit shows once the standby catches up', async () => {
    const number = `QW-RP ${parseInt(tag, 16)}`;
    const created = await buyer.agent
      .post('/api/parts')
      .set('x-csrf-token', buyer.token)
      .send({ brand: 'Quaywell', partNumber: number, kind: 'coil', description: 'Standby probe coil' })
      .expect(201);
    const id = (created.body as PartDetail).part.id;
    await standby.catchUp();
    expect((await partDetail(id)).part.description).toBe('Standby probe coil');

    await standby.pauseReplay();
    try {
      const edited = `Standby probe coil, relabelled ${tag}`;
      const patched = await buyer.agent.patch(`/api/parts/${id}`).set('x-csrf-token', buyer.token).send({ description: edited });
      // The standby refuses writes and does not have this one yet: both the write and the answer
      // after it came from the primary.
      expect(patched.status, JSON.stringify(patched.body)).toBe(200);
      expect((patched.body as PartDetail).part.description).toBe(edited);
      expect(await descriptionOn(standby.primary, id)).toBe(edited);
      expect(await descriptionOn(standby.standby, id)).toBe('Standby probe coil');

      // GET /api/parts/:id answers as the standby has it: the read went there.
      expect((await partDetail(id)).part.description).toBe('Standby probe coil');
      // So does the exact number lookup of the Counter's search.
      const search = (await buyer.agent.get('/api/search').query({ q: number }).expect(200)).body as SearchResponse;
      expect(search.hits.find((h) => h.partId === id)?.description).toBe('Standby probe coil');
    } finally {
      await standby.resumeReplay();
    }
    await vi.waitFor(async () => expect((await partDetail(id)).part.description).toBe(`Standby probe coil, relabelled ${tag}`), {
      timeout: 30_000,
      interval: 100,
    });
  });

  it('serves the vehicle picker and engine details from the standby', async () => {
    const make = `Probe ${tag}`;
    await standby.catchUp();
    await standby.pauseReplay();
    let engineId = '';
    try {
      engineId = await insertReturningId(
        standby.primary,
        `INSERT INTO engine (code, description, displacement_l, cylinders, compression_ratio, aspiration, spec_gap_mm, dwell_ms, cranking_dwell_ms)
         VALUES ($1, 'replica test engine', 1.6, 4, 10.5, 'natural', 0.9, 3, 4) RETURNING id`,
        [`RPL-${tag}`],
      );
      await standby.primary.query(`INSERT INTO vehicle (year, make, model, trim, engine_id) VALUES (1901, $1, 'Standby', '', $2)`, [
        make,
        engineId,
      ]);
      // Committed on the primary, not yet on the standby: the API answers as the standby has it.
      await buyer.agent.get(`/api/engines/${engineId}`).expect(404);
      const makes = (await buyer.agent.get('/api/vehicles/makes').query({ year: 1901 }).expect(200)).body as { makes: string[] };
      expect(makes.makes).not.toContain(make);
    } finally {
      await standby.resumeReplay();
    }
    try {
      await vi.waitFor(
        async () => {
          const engine = await buyer.agent.get(`/api/engines/${engineId}`).expect(200);
          expect((engine.body as { engine: { code: string } }).engine.code).toBe(`RPL-${tag}`);
          const makes = (await buyer.agent.get('/api/vehicles/makes').query({ year: 1901 }).expect(200)).body as { makes: string[] };
          expect(makes.makes).toContain(make);
        },
        { timeout: 30_000, interval: 100 },
      );
    } finally {
      await standby.primary.query(`DELETE FROM vehicle WHERE make = $1`, [make]);
      await standby.primary.query(`DELETE FROM engine WHERE id = $1`, [engineId]);
    }
  });

  it('a read that must see the latest writes takes the standby once it has them, the primary while it lags', async () => {
    const ds = t.deps.dataSource;
    const port = async (ex: Executor): Promise<number | undefined> =>
      (await queryOne(ex, z.object({ port: z.number().int() }), `SELECT inet_server_port() AS port`))?.port;
    const created = await buyer.agent
      .post('/api/parts')
      .set('x-csrf-token', buyer.token)
      .send({ brand: 'Quaywell', partNumber: `QW-RP ${parseInt(tag, 16) + 1}`, kind: 'coil', description: 'Document probe coil' })
      .expect(201);
    const id = (created.body as PartDetail).part.id;

    await standby.catchUp();
    expect(await readOnly(ds, port)).toBe(standby.port);
    expect(await readCaughtUp(ds, port)).toBe(standby.port);

    await standby.pauseReplay();
    try {
      await standby.primary.query(`UPDATE part SET description = 'Document probe coil, edited' WHERE id = $1`, [id]);
      // Plain read-only work still goes to the standby, which lags...
      expect(await readOnly(ds, port)).toBe(standby.port);
      // ...while a read that follows a write (the search index refresh) waits for it, then takes the primary.
      expect(await readCaughtUp(ds, port)).toBe(primaryPort);
      const [document] = await loadPartDocuments(ds, [id]);
      expect(document?.description).toBe('Document probe coil, edited');
    } finally {
      await standby.resumeReplay();
    }
  });
});
