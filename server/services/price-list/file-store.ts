import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { Readable } from 'node:stream';
import type pg from 'pg';
import type { DataSource } from 'typeorm';

/** Pieces of 1 MiB: big enough for few round trips, small enough to stream back without holding the file. */
const CHUNK_BYTES = 1024 * 1024;

export async function sha256OfFile(path: string): Promise<string> {
  const hash = createHash('sha256');
  for await (const chunk of createReadStream(path, { highWaterMark: CHUNK_BYTES })) hash.update(chunk as Buffer);
  return hash.digest('hex');
}

/** Keeps the uploaded bytes with the list (inside the caller's transaction), so a new mapping can re-read them. */
export async function storeFileChunks(client: pg.PoolClient, listId: string, path: string): Promise<void> {
  let seq = 0;
  for await (const chunk of createReadStream(path, { highWaterMark: CHUNK_BYTES })) {
    await client.query(`INSERT INTO price_list_file_chunk (price_list_id, seq, data) VALUES ($1, $2, $3)`, [listId, seq++, chunk]);
  }
}

/** The stored bytes as a stream, one piece in memory at a time. */
export function readFileChunks(ds: DataSource, listId: string): Readable {
  async function* pieces(): AsyncGenerator<Buffer> {
    for (let seq = 0; ; seq++) {
      const rows = (await ds.query(`SELECT data FROM price_list_file_chunk WHERE price_list_id = $1 AND seq = $2`, [listId, seq])) as {
        data: Buffer;
      }[];
      const piece = rows[0];
      if (!piece) return;
      yield piece.data;
    }
  }
  return Readable.from(pieces());
}

export async function hasStoredFile(ds: DataSource, listId: string): Promise<boolean> {
  const rows = (await ds.query(`SELECT 1 FROM price_list_file_chunk WHERE price_list_id = $1 AND seq = 0`, [listId])) as unknown[];
  return rows.length > 0;
}
