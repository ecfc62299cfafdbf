import 'reflect-metadata';
import { spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { createWriteStream } from 'node:fs';
import { mkdtemp, rm, stat } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { once } from 'node:events';
import pg from 'pg';
import type { DataSource } from 'typeorm';
import { gtinCheckDigit } from '../../shared/gtin';
import { createDataSource } from '../../server/db/data-source';
import { commitPriceList } from '../../server/services/price-list/commit';
import { uploadPriceList } from '../../server/services/price-list/intake.service';

/**
 * A 100,000-row supplier file end to end through the intake's own service functions (parse,
 * validate, COPY into staging, diff, commit), beside `psql \copy` of the same file into a plain
 * table in the same run (the floor). Every row is a new Quaywell number, so the commit creates
 * 100,000 parts and prices; the bench removes what it made afterwards.
 */

const HEADER = 'Part Number,Brand,Description,Cost,List,Core,Pack Qty,GTIN,Supersedes,Kind';

async function writeSupplierFile(path: string, tag: string, rows: number): Promise<void> {
  const out = createWriteStream(path);
  let chunk = `${HEADER}\n`;
  for (let i = 0; i < rows; i++) {
    const plug = i % 3 === 0;
    const cost = 300 + (i % 9000);
    const body = `2${String(i).padStart(11, '0')}`;
    chunk +=
      `${plug ? 'QB-SP' : 'QB-IC'} ${tag}-${i},Quaywell,` +
      `"${plug ? `Spark plug M14×1.25, ${12 + (i % 8)} mm reach, flat seat` : `Ignition coil, coil-on-plug, ${i % 5}-pin`}",` +
      `${(cost / 100).toFixed(2)},${((cost * 2 + 99) / 100).toFixed(2)},${i % 11 === 0 ? '15.00' : '0.00'},${plug ? 4 : 1},` +
      `${body}${gtinCheckDigit(body)},,${plug ? 'plug' : 'coil'}\n`;
    if (chunk.length > 256 * 1024) {
      if (!out.write(chunk)) await once(out, 'drain');
      chunk = '';
    }
  }
  out.end(chunk);
  await once(out, 'finish');
}

/** `psql \copy` of the file into a plain table: what PostgreSQL's own client does with the same bytes. */
async function timePsqlCopy(databaseUrl: string, path: string, table: string): Promise<number> {
  const url = new URL(databaseUrl);
  const run = (sql: string): Promise<number> =>
    new Promise((resolve, reject) => {
      const started = performance.now();
      const child = spawn(
        'psql',
        [
          '-h',
          url.hostname,
          '-p',
          url.port || '5432',
          '-U',
          decodeURIComponent(url.username),
          '-d',
          url.pathname.slice(1),
          '-v',
          'ON_ERROR_STOP=1',
          '-qc',
          sql,
        ],
        { env: { ...process.env, PGPASSWORD: decodeURIComponent(url.password) }, stdio: ['ignore', 'ignore', 'pipe'] },
      );
      let stderr = '';
      child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
      child.on('error', reject);
      child.on('close', (code) => (code === 0 ? resolve(performance.now() - started) : reject(new Error(`psql failed: ${stderr}`))));
    });
  await run(
    `CREATE TABLE ${table} (part_number text, brand text, description text, cost numeric(12,2), list numeric(12,2), core numeric(12,2), pack_qty integer, gtin text, supersedes text, kind text)`,
  );
  try {
    return await run(`\\copy ${table} FROM '${path}' WITH (FORMAT csv, HEADER true)`);
  } finally {
    await run(`DROP TABLE ${table}`);
  }
}

/** Peak resident memory while `work` runs, sampled every 20 ms. */
async function withPeakRss<T>(work: () => Promise<T>): Promise<{ result: T; peakRssMb: number }> {
  let peak = process.memoryUsage().rss;
  const timer = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 20);
  try {
    const result = await work();
    return { result, peakRssMb: Math.round(Math.max(peak, process.memoryUsage().rss) / 1024 / 1024) };
  } finally {
    clearInterval(timer);
  }
}

async function removeBenchData(ds: DataSource, supplierId: string, listId: string | null): Promise<void> {
  if (listId) {
    await ds.query(
      `DELETE FROM part p USING price_list_row r
        WHERE r.price_list_id = $1 AND r.change = 'new' AND p.brand_id = r.brand_id AND p.part_number_norm = r.part_number_norm`,
      [listId],
    );
    await ds.query(`DELETE FROM price_list_row WHERE price_list_id = $1`, [listId]);
    await ds.query(`DELETE FROM audit_log WHERE entity_id = $1`, [listId]);
  }
  await ds.query(`DELETE FROM supplier WHERE id = $1`, [supplierId]);
}

export interface PriceListImportBenchResult {
  rows: number;
  bytes: number;
  stageMs: number;
  commitMs: number;
  importRowsPerSecond: number;
  copyMs: number;
  copyRowsPerSecond: number;
  ratio: number;
  peakRssMb: number;
}

export async function runPriceListImportBench(databaseUrl: string, rows = 100_000): Promise<PriceListImportBenchResult> {
  const ds = await createDataSource(databaseUrl).initialize();
  const pool = new pg.Pool({ connectionString: databaseUrl, max: 4 });
  const dir = await mkdtemp(join(tmpdir(), 'arcwise-import-bench-'));
  const tag = randomUUID().slice(0, 8).toUpperCase();
  const path = join(dir, 'supplier.csv');
  const supplierId = (
    (await ds.query(`INSERT INTO supplier (key, name) VALUES ($1, $2) RETURNING id`, [
      `bench-${tag.toLowerCase()}`,
      `Bench supplier ${tag}`,
    ])) as {
      id: string;
    }[]
  )[0]?.id;
  if (!supplierId) throw new Error('bench supplier not created');
  let listId: string | null = null;
  try {
    await writeSupplierFile(path, tag, rows);
    const bytes = (await stat(path)).size;
    const copyBefore = await timePsqlCopy(databaseUrl, path, `bench_copy_${tag.toLowerCase()}`);

    const { result, peakRssMb } = await withPeakRss(async () => {
      const started = performance.now();
      const list = await uploadPriceList(
        { dataSource: ds, pool },
        {
          supplierId,
          fileName: 'bench.csv',
          filePath: path,
          sizeBytes: bytes,
          actorId: null,
          maxFileBytes: 500 * 1024 * 1024,
          flagThresholdPct: 15,
        },
      );
      listId = list.id;
      const staged = performance.now();
      if (list.counts?.new !== rows) throw new Error(`expected ${rows} new rows, got ${JSON.stringify(list.counts)}`);
      const outcome = await commitPriceList(ds, list.id, null);
      if (outcome.applied.pricesWritten !== rows) throw new Error(`commit wrote ${outcome.applied.pricesWritten} prices`);
      return { stageMs: staged - started, commitMs: performance.now() - staged };
    });

    const copyAfter = await timePsqlCopy(databaseUrl, path, `bench_copy_${tag.toLowerCase()}`);
    const copyMs = Math.min(copyBefore, copyAfter);
    const importMs = result.stageMs + result.commitMs;
    const figures: PriceListImportBenchResult = {
      rows,
      bytes,
      stageMs: Math.round(result.stageMs),
      commitMs: Math.round(result.commitMs),
      importRowsPerSecond: Math.round((rows / importMs) * 1000),
      copyMs: Math.round(copyMs),
      copyRowsPerSecond: Math.round((rows / copyMs) * 1000),
      ratio: Math.round((importMs / copyMs) * 100) / 100,
      peakRssMb,
    };
    const n = (v: number) => v.toLocaleString('en-US');
    console.log(
      `price-list import end to end: ${n(figures.importRowsPerSecond)} rows/s ` +
        `(stage: parse + validate + COPY + diff ${n(figures.stageMs)} ms, commit ${n(figures.commitMs)} ms; ` +
        `${n(rows)} rows, ${(bytes / 1e6).toFixed(1)} MB)\n` +
        `psql \\copy of the same file: ${n(figures.copyRowsPerSecond)} rows/s (${n(figures.copyMs)} ms)\n` +
        `ratio ${figures.ratio} × the \\copy time (goal ≤ 2), peak RSS ${figures.peakRssMb} MB (goal < 300)`,
    );
    return figures;
  } finally {
    await removeBenchData(ds, supplierId, listId).catch((err: unknown) => console.error('bench clean-up failed:', err));
    await rm(dir, { recursive: true, force: true });
    await pool.end();
    await ds.destroy();
  }
}
