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
 * table in the same run (the floor). First every row is a new Quaywell number, so the commit
 * creates 100,000 parts and prices; then a second file moves every one of those prices. The bench
 * removes what it made afterwards.
 */

const HEADER = 'Part Number,Brand,Description,Cost,List,Core,Pack Qty,GTIN,Supersedes,Kind';

export async function writeSupplierFile(path: string, tag: string, rows: number, priceShiftCents = 0): Promise<void> {
  const out = createWriteStream(path);
  let chunk = `${HEADER}\n`;
  for (let i = 0; i < rows; i++) {
    const plug = i % 3 === 0;
    const cost = 300 + (i % 9000) + priceShiftCents;
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

export async function removeBenchData(ds: DataSource, supplierId: string, listIds: string[]): Promise<void> {
  for (const listId of listIds) {
    await ds.query(
      `DELETE FROM part p USING price_list_row r
        WHERE r.price_list_id = $1 AND r.change = 'new' AND p.brand_id = r.brand_id AND p.part_number_norm = r.part_number_norm`,
      [listId],
    );
    await ds.query(`DELETE FROM price_list_row WHERE price_list_id = $1`, [listId]);
    await ds.query(`DELETE FROM audit_log WHERE entity_id = $1`, [listId]);
  }
  // The supplier's lists, prices and kept files go with it (ON DELETE CASCADE).
  await ds.query(`DELETE FROM supplier WHERE id = $1`, [supplierId]);
}

export interface ImportTiming {
  stageMs: number;
  commitMs: number;
  rowsPerSecond: number;
  /** End-to-end time over the \copy time. */
  ratio: number;
}

export interface PriceListImportBenchResult {
  rows: number;
  bytes: number;
  copyMs: number;
  copyRowsPerSecond: number;
  /** Every row a new part: the commit inserts 100,000 parts and prices (the case the goal names). */
  newParts: ImportTiming;
  /** The same parts again, every price moved: the weekly case, updates only. */
  priceUpdate: ImportTiming;
  peakRssMb: number;
}

type Intake = { dataSource: DataSource; pool: pg.Pool };

/** Upload (parse, validate, COPY, diff) and commit of one file, timed apart. */
async function importFile(
  intake: Intake,
  supplierId: string,
  path: string,
  expectNew: number,
): Promise<{ listId: string; stageMs: number; commitMs: number }> {
  const bytes = (await stat(path)).size;
  const started = performance.now();
  const list = await uploadPriceList(intake, {
    supplierId,
    fileName: 'bench.csv',
    filePath: path,
    sizeBytes: bytes,
    actorId: null,
    maxFileBytes: 500 * 1024 * 1024,
    flagThresholdPct: 15,
  });
  const staged = performance.now();
  if (list.counts?.new !== expectNew) throw new Error(`expected ${expectNew} new rows, got ${JSON.stringify(list.counts)}`);
  const outcome = await commitPriceList(intake.dataSource, list.id, null);
  if (outcome.applied.pricesWritten !== list.counts.total) throw new Error(`commit wrote ${outcome.applied.pricesWritten} prices`);
  return { listId: list.id, stageMs: staged - started, commitMs: performance.now() - staged };
}

function timing(rows: number, copyMs: number, t: { stageMs: number; commitMs: number }): ImportTiming {
  const total = t.stageMs + t.commitMs;
  return {
    stageMs: Math.round(t.stageMs),
    commitMs: Math.round(t.commitMs),
    rowsPerSecond: Math.round((rows / total) * 1000),
    ratio: Math.round((total / copyMs) * 10) / 10,
  };
}

export async function runPriceListImportBench(databaseUrl: string, rows = 100_000): Promise<PriceListImportBenchResult> {
  const ds = await createDataSource(databaseUrl).initialize();
  const pool = new pg.Pool({ connectionString: databaseUrl, max: 4 });
  const dir = await mkdtemp(join(tmpdir(), 'arcwise-import-bench-'));
  const tag = randomUUID().slice(0, 8).toUpperCase();
  const first = join(dir, 'supplier.csv');
  const second = join(dir, 'supplier-new-prices.csv');
  const supplierRows = (await ds.query(`INSERT INTO supplier (key, name) VALUES ($1, $2) RETURNING id`, [
    `bench-${tag.toLowerCase()}`,
    `Bench supplier ${tag}`,
  ])) as { id: string }[];
  const supplierId = supplierRows[0]?.id;
  if (!supplierId) throw new Error('bench supplier not created');
  const listIds: string[] = [];
  try {
    await writeSupplierFile(first, tag, rows);
    await writeSupplierFile(second, tag, rows, 7);
    const bytes = (await stat(first)).size;
    const table = `bench_copy_${tag.toLowerCase()}`;
    const copyBefore = await timePsqlCopy(databaseUrl, first, table);

    const { result, peakRssMb } = await withPeakRss(async () => {
      const created = await importFile({ dataSource: ds, pool }, supplierId, first, rows);
      listIds.push(created.listId);
      const updated = await importFile({ dataSource: ds, pool }, supplierId, second, 0);
      listIds.push(updated.listId);
      return { created, updated };
    });

    const copyMs = Math.min(copyBefore, await timePsqlCopy(databaseUrl, first, table));
    const figures: PriceListImportBenchResult = {
      rows,
      bytes,
      copyMs: Math.round(copyMs),
      copyRowsPerSecond: Math.round((rows / copyMs) * 1000),
      newParts: timing(rows, copyMs, result.created),
      priceUpdate: timing(rows, copyMs, result.updated),
      peakRssMb,
    };
    const n = (v: number) => v.toLocaleString('en-US');
    const line = (label: string, t: ImportTiming) =>
      `${label}: ${n(t.rowsPerSecond)} rows/s (stage: parse + validate + COPY + diff ${n(t.stageMs)} ms, commit ${n(t.commitMs)} ms), ` +
      `${t.ratio} × the \\copy time`;
    console.log(
      `price-list import, ${n(rows)} rows, ${(bytes / 1e6).toFixed(1)} MB, end to end through the intake services:\n` +
        `  ${line('all new parts', figures.newParts)}\n` +
        `  ${line('all prices moved', figures.priceUpdate)}\n` +
        `  psql \\copy of the same file into a plain table: ${n(figures.copyRowsPerSecond)} rows/s (${n(figures.copyMs)} ms)\n` +
        `  goal ≤ 2 × the \\copy time; peak RSS ${figures.peakRssMb} MB (goal < 300)`,
    );
    return figures;
  } finally {
    await removeBenchData(ds, supplierId, listIds).catch((err: unknown) => console.error('bench clean-up failed:', err));
    await rm(dir, { recursive: true, force: true });
    await pool.end();
    await ds.destroy();
  }
}
