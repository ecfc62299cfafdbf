import 'reflect-metadata';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import pg from 'pg';
import { from as copyFrom } from 'pg-copy-streams';
import { normalizePartNumber } from '../shared/part-number';
import { locations } from './data/locations';

/**
 * The benchmark data set: 100,000 invented parts with specs and stock, and 300,000 interchange
 * rows, loaded with COPY in seconds. Idempotent: a second run finds the scale brand and stops.
 * Usage: DATABASE_URL=… tsx seed/scale.ts [parts] [interchangePerPart]
 */
export const SCALE_BRAND = 'Benchline';
const FOREIGN = ['Farrow OE', 'Gallant Parts', 'Hestia Motor'];

function rng(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s * 1664525 + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

/** Numbers as a supplier prints them: a prefix, a dash and digits, e.g. "BL-C 004211". */
export const scalePartNumber = (i: number): string => `BL-${i % 2 ? 'P' : 'C'} ${String(i).padStart(6, '0')}`;
export const scaleForeignNumber = (i: number, k: number): string =>
  `${['FW', 'GP', 'HM'][k]}-${(i * 7 + k * 13) % 1000}.${String(i).padStart(6, '0')}`;

function rows<T>(count: number, make: (i: number) => T): Readable {
  let i = 0;
  return new Readable({
    read() {
      let chunk = '';
      for (let n = 0; n < 2000 && i < count; n++, i++) chunk += make(i);
      this.push(i >= count && chunk === '' ? null : chunk);
      if (i >= count && chunk !== '') this.push(null);
    },
  });
}

async function copy(client: pg.PoolClient, sql: string, source: Readable): Promise<void> {
  await pipeline(source, client.query(copyFrom(sql)));
}

export async function seedScale(
  url: string,
  partCount = 100_000,
  interchangePerPart = 3,
): Promise<{ parts: number; interchange: number; ms: number }> {
  const started = Date.now();
  const pool = new pg.Pool({ connectionString: url, max: 2 });
  const client = await pool.connect();
  try {
    const existing = await client.query(`SELECT count(*)::int AS n FROM part p JOIN brand b ON b.id = p.brand_id WHERE b.name = $1`, [
      SCALE_BRAND,
    ]);
    if ((existing.rows[0] as { n: number }).n >= partCount) return { parts: 0, interchange: 0, ms: Date.now() - started };
    await client.query('BEGIN');
    const brand = await client.query(
      `INSERT INTO brand (name, name_norm, ours, heat_code_note) VALUES ($1, lower($1), true, 'Numbered 1–15, same as the heat step.')
       ON CONFLICT (name_norm) DO UPDATE SET name = EXCLUDED.name RETURNING id`,
      [SCALE_BRAND],
    );
    const brandId = (brand.rows[0] as { id: string }).id;
    await client.query(
      `INSERT INTO brand_heat_code (brand_id, code, heat_step) SELECT $1, g::text, g FROM generate_series(1, 15) g ON CONFLICT DO NOTHING`,
      [brandId],
    );
    // Part ids are made here so the spec, stock and interchange rows can refer to them in the same COPY pass.
    const ids: string[] = (await client.query(`SELECT gen_random_uuid()::text AS id FROM generate_series(1, $1)`, [partCount])).rows.map(
      (r: { id: string }) => r.id,
    );
    const rand = rng(42);
    await copy(
      client,
      `COPY part (id, brand_id, part_number, part_number_norm, kind, description, status) FROM STDIN`,
      rows(partCount, (i) => {
        const printed = scalePartNumber(i);
        const kind = i % 2 ? 'plug' : 'coil';
        const desc =
          kind === 'coil'
            ? `Scale coil ${['coil-on-plug', 'pencil', 'coil pack'][i % 3]} ${i}`
            : `Scale spark plug ${['copper', 'platinum', 'iridium'][i % 3]} ${i}`;
        return `${ids[i]}\t${brandId}\t${printed}\t${normalizePartNumber(printed)}\t${kind}\t${desc}\tactive\n`;
      }),
    );
    await copy(
      client,
      `COPY coil_spec (part_id, architecture, driver, outputs, connector_pins, connector_key, primary_ohm_min, primary_ohm_max, primary_inductance_mh, turns_ratio, available_kv, peak_current_a) FROM STDIN`,
      rows(Math.ceil(partCount / 2), (j) => {
        const i = j * 2;
        const lo = 0.3 + rand() * 0.6;
        return `${ids[i]}\tcoil-on-plug\t${j % 5 ? 'integrated' : 'external'}\t1\t${3 + (j % 2)}\t${'ABCDE'[j % 5]}\t${lo.toFixed(2)}\t${(lo + 0.15).toFixed(2)}\t${(2 + rand() * 3).toFixed(2)}\t${80 + (j % 40)}\t${35 + (j % 10)}\t${(6 + rand() * 3).toFixed(1)}\n`;
      }),
    );
    await copy(
      client,
      `COPY plug_spec (part_id, thread_mm, thread_pitch_mm, reach_mm, seat, hex_mm, heat_code, gap_mm, regappable, resistor, projected_tip, electrode) FROM STDIN`,
      rows(Math.floor(partCount / 2), (j) => {
        const i = j * 2 + 1;
        const [thread, reach, hex] = [
          [14, 19, 16],
          [12, 26.5, 14],
          [10, 19, 16],
        ][j % 3]!;
        return `${ids[i]}\t${thread}\t${thread === 10 ? 1 : 1.25}\t${reach}\tflat\t${hex}\t${4 + (j % 6)}\t${(0.7 + (j % 5) * 0.1).toFixed(1)}\tt\tt\tt\t${['copper', 'platinum', 'iridium'][j % 3]}\n`;
      }),
    );
    // The stock is the chain's first store's (the demo's first store where there is no store yet).
    const first = locations[0]!;
    await client.query(
      `INSERT INTO location (name, address, phone, opening_hours) SELECT $1, $2, $3, $4 WHERE NOT EXISTS (SELECT 1 FROM location)`,
      [first.name, first.address, first.phone, first.openingHours],
    );
    const store = await client.query(`SELECT id FROM location ORDER BY created_at, name LIMIT 1`);
    const storeId = (store.rows[0] as { id: string }).id;
    await copy(
      client,
      `COPY stock (location_id, part_id, on_hand, bin) FROM STDIN`,
      rows(partCount, (i) => `${storeId}\t${ids[i]}\t${i % 4 ? (i * 7) % 23 : 0}\tS-${i % 40}-${i % 7}\n`),
    );
    await copy(
      client,
      `COPY interchange (foreign_brand, foreign_number, foreign_number_norm, part_id, source, confidence) FROM STDIN`,
      rows(partCount * interchangePerPart, (n) => {
        const i = Math.floor(n / interchangePerPart);
        const k = n % interchangePerPart;
        const num = scaleForeignNumber(i, k);
        return `${FOREIGN[k % FOREIGN.length]}\t${num}\t${normalizePartNumber(num)}\t${ids[i]}\tsupplier list\t0.9\n`;
      }),
    );
    await client.query('COMMIT');
    await client.query('ANALYZE');
    return { parts: partCount, interchange: partCount * interchangePerPart, ms: Date.now() - started };
  } catch (err) {
    await client.query('ROLLBACK').catch(() => undefined);
    throw err;
  } finally {
    client.release();
    await pool.end();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set');
  const parts = Number(process.argv[2] ?? 100_000);
  const per = Number(process.argv[3] ?? 3);
  seedScale(url, parts, per)
    .then((r) => console.log(`seed:scale: ${r.parts} parts, ${r.interchange} interchange rows in ${(r.ms / 1000).toFixed(1)} s`))
    .catch((err: unknown) => {
      console.error(err);
      process.exit(1);
    });
}
