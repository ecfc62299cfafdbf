import pg from 'pg';
import { summarise, type LatencySummary } from './stats';

/**
 * The floor for free-text search: PostgreSQL's own text search on the same parts, built here for
 * the bench only — a `tsvector` under a GIN index for the words, and `pg_trgm` over the table of
 * the words they contain to correct a typo'd word first, as PostgreSQL's documentation of pg_trgm
 * suggests for text search ("Text Search Integration"). Kept in tables of the bench's own so the
 * app's schema carries nothing the app does not use.
 */
const TABLE = 'bench_text_anchor';
const LEXICON = 'bench_text_lexicon';

export async function prepareTextAnchor(url: string): Promise<void> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    await client.query('CREATE EXTENSION IF NOT EXISTS pg_trgm');
    const exists = await client.query(`SELECT to_regclass($1) IS NOT NULL AS ok`, [TABLE]);
    if ((exists.rows[0] as { ok: boolean }).ok) return;
    await client.query(
      `CREATE TABLE ${TABLE} AS
         SELECT p.id, b.name || ' ' || p.part_number || ' ' || p.description || ' ' ||
                coalesce((SELECT string_agg(i.foreign_number, ' ') FROM interchange i WHERE i.part_id = p.id), '') AS words
           FROM part p JOIN brand b ON b.id = p.brand_id AND b.ours`,
    );
    await client.query(`ALTER TABLE ${TABLE} ADD COLUMN doc tsvector`);
    await client.query(`UPDATE ${TABLE} SET doc = to_tsvector('simple', words)`);
    await client.query(`CREATE INDEX ON ${TABLE} USING gin (doc)`);
    // Words only: a typo'd number is the number path's job, not the words'.
    await client.query(
      `CREATE TABLE ${LEXICON} AS SELECT DISTINCT word FROM (SELECT unnest(tsvector_to_array(doc)) AS word FROM ${TABLE}) w WHERE word ~ '^[a-z]{3,}$'`,
    );
    await client.query(`CREATE INDEX ON ${LEXICON} USING gist (word gist_trgm_ops)`);
    await client.query(`ANALYZE ${TABLE}`);
    await client.query(`ANALYZE ${LEXICON}`);
  } finally {
    await client.end();
  }
}

/**
 * Each query as PostgreSQL answers it: all its words through the GIN index, ranked; when that
 * finds nothing, each word replaced by the nearest word of the lexicon by trigram distance first.
 */
const ANCHOR_SQL = `
  WITH exact AS (SELECT plainto_tsquery('simple', $1) AS tsq),
  typed AS (SELECT w FROM regexp_split_to_table(lower($1), '\\s+') w WHERE w <> ''),
  fixed AS (
    SELECT coalesce((SELECT l.word FROM ${LEXICON} l WHERE l.word % typed.w ORDER BY l.word <-> typed.w LIMIT 1), typed.w) AS w
      FROM typed),
  corrected AS (SELECT plainto_tsquery('simple', string_agg(w, ' ')) AS tsq FROM fixed)
  (SELECT t.id FROM ${TABLE} t, exact q WHERE t.doc @@ q.tsq ORDER BY ts_rank(t.doc, q.tsq) DESC LIMIT 20)
  UNION ALL
  (SELECT t.id FROM ${TABLE} t, corrected q
    WHERE t.doc @@ q.tsq AND NOT EXISTS (SELECT 1 FROM ${TABLE} x, exact e WHERE x.doc @@ e.tsq)
    ORDER BY ts_rank(t.doc, q.tsq) DESC LIMIT 20)
  LIMIT 20`;

export async function textAnchorLoad(url: string, words: string[], connections: number, seconds: number): Promise<LatencySummary> {
  const pool = new pg.Pool({ connectionString: url, max: connections });
  const latencies: number[] = [];
  const deadline = Date.now() + seconds * 1000;
  let n = 0;
  const worker = async () => {
    const client = await pool.connect();
    try {
      while (Date.now() < deadline) {
        const t0 = performance.now();
        await client.query(ANCHOR_SQL, [words[n++ % words.length]]);
        latencies.push(performance.now() - t0);
      }
    } finally {
      client.release();
    }
  };
  await Promise.all(Array.from({ length: connections }, worker));
  await pool.end();
  return summarise(latencies, seconds);
}
