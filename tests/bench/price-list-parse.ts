import { createReadStream } from 'node:fs';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse } from 'csv-parse';
import { gtinCheckDigit } from '../../shared/gtin';
import { parsePriceList } from '../../server/services/price-list/parse';

/**
 * Parse + validate throughput of the price-list intake on a generated 100,000-row, 12-column
 * supplier file, read from disk as an upload would be, beside csv-parse alone on the same file
 * (the floor this code adds to). No database: the COPY side is measured by the import bench.
 */

const HEADER = 'Part No.,Brand,Description,Net,Retail,Core Chg,Pack,UPC,Supersedes,Type,Reach mm,Gap mm';

export function generatePriceList(rows: number): string {
  const lines = [HEADER];
  for (let i = 0; i < rows; i++) {
    const body = `20914${String(i).padStart(7, '0')}`;
    const plug = i % 3 === 0;
    const cost = 300 + (i % 9000);
    lines.push(
      [
        `${plug ? 'QW-SP' : 'QW-IC'} ${100000 + i}`,
        i % 7 === 0 ? 'Norrow' : 'Quaywell',
        plug ? `"Spark plug M14×1.25, ${(12 + (i % 8)).toFixed(1)} mm reach, flat seat"` : `"Ignition coil, coil-on-plug, ${i % 5}-pin"`,
        (cost / 100).toFixed(2),
        ((cost * 2 + 99) / 100).toFixed(2),
        i % 11 === 0 ? '15.00' : '0.00',
        plug ? '4' : '1',
        `${body}${gtinCheckDigit(body)}`,
        i % 20 === 0 ? `QW-OLD ${i}` : '',
        plug ? 'plug' : 'coil',
        plug ? String(12 + (i % 8)) : '',
        plug ? '0.8' : '',
      ].join(','),
    );
  }
  return `${lines.join('\r\n')}\r\n`;
}

interface Timing {
  rows: number;
  ms: number;
  /** CPU time of this process: steadier than wall time on a machine shared with other work. */
  cpuMs: number;
}

function cpuMsSince(start: NodeJS.CpuUsage): number {
  const used = process.cpuUsage(start);
  return (used.user + used.system) / 1000;
}

async function timeIntake(path: string): Promise<Timing> {
  const started = performance.now();
  const cpu = process.cpuUsage();
  const { events } = await parsePriceList(createReadStream(path, { highWaterMark: 64 * 1024 }));
  let rows = 0;
  for await (const event of events) {
    if (event.type === 'row') rows++;
    else if (event.type === 'rejected') throw new Error(`bench file rejected line ${event.line}: ${event.errors[0]?.message}`);
  }
  return { rows, ms: performance.now() - started, cpuMs: cpuMsSince(cpu) };
}

async function timeCsvParseAlone(path: string): Promise<Timing> {
  const started = performance.now();
  const cpu = process.cpuUsage();
  let rows = 0;
  for await (const record of createReadStream(path, { highWaterMark: 64 * 1024 }).pipe(parse({ relax_column_count: true }))) {
    if (Array.isArray(record)) rows++;
  }
  return { rows: rows - 1, ms: performance.now() - started, cpuMs: cpuMsSince(cpu) };
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)] ?? 0;
}

export interface ParseBenchResult {
  rows: number;
  bytes: number;
  intakeRowsPerSecond: number;
  intakeRowsPerCpuSecond: number;
  csvParseRowsPerSecond: number;
  peakRssMb: number;
}

export async function runParseBench(rows = 100_000, runs = 3): Promise<ParseBenchResult> {
  const dir = await mkdtemp(join(tmpdir(), 'arcwise-parse-bench-'));
  const path = join(dir, 'supplier.csv');
  try {
    const text = generatePriceList(rows);
    await writeFile(path, text);
    await timeIntake(path); // warm-up: JIT and module loading stay out of the figures
    const intake: number[] = [];
    const intakeCpu: number[] = [];
    const alone: number[] = [];
    let peakRss = 0;
    for (let run = 0; run < runs; run++) {
      const a = await timeIntake(path);
      peakRss = Math.max(peakRss, process.memoryUsage().rss);
      const b = await timeCsvParseAlone(path);
      if (a.rows !== rows || b.rows !== rows) throw new Error(`expected ${rows} rows, got ${a.rows} / ${b.rows}`);
      intake.push((a.rows / a.ms) * 1000);
      intakeCpu.push((a.rows / a.cpuMs) * 1000);
      alone.push((b.rows / b.ms) * 1000);
    }
    const result: ParseBenchResult = {
      rows,
      bytes: Buffer.byteLength(text),
      intakeRowsPerSecond: Math.round(median(intake)),
      intakeRowsPerCpuSecond: Math.round(median(intakeCpu)),
      csvParseRowsPerSecond: Math.round(median(alone)),
      peakRssMb: Math.round(peakRss / 1024 / 1024),
    };
    console.log(
      `price-list parse+validate: ${result.intakeRowsPerSecond.toLocaleString('en-US')} rows/s ` +
        `(${result.intakeRowsPerCpuSecond.toLocaleString('en-US')} per CPU-second) ` +
        `(csv-parse alone ${result.csvParseRowsPerSecond.toLocaleString('en-US')} rows/s; ` +
        `${rows.toLocaleString('en-US')} rows, ${(result.bytes / 1e6).toFixed(1)} MB, median of ${runs}, peak RSS ${result.peakRssMb} MB)`,
    );
    return result;
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

if (process.argv[1] && import.meta.url.endsWith(process.argv[1].replace(/^.*[\\/]/, ''))) {
  await runParseBench();
}
