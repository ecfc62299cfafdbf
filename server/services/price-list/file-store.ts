import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { Readable } from 'node:stream';
import type { DataSource } from 'typeorm';
import type { Executor } from '../../db/executor';
import { findFileChunk, hasFileChunks, insertFileChunk } from '../../repositories/price-list-files.repository';

/** Pieces of 1 MiB: big enough for few round trips, small enough to stream back without holding the file. */
const CHUNK_BYTES = 1024 * 1024;

export async function sha256OfFile(path: string): Promise<string> {
  const hash = createHash('sha256');
  for await (const chunk of createReadStream(path, { highWaterMark: CHUNK_BYTES })) hash.update(chunk as Buffer);
  return hash.digest('hex');
}

/** Keeps the uploaded bytes with the list (inside the caller's transaction), so a new mapping can re-read them. */
export async function storeFileChunks(ex: Executor, listId: string, path: string): Promise<void> {
  let seq = 0;
  for await (const chunk of createReadStream(path, { highWaterMark: CHUNK_BYTES })) {
    await insertFileChunk(ex, listId, seq++, chunk as Buffer);
  }
}

/** The stored bytes as a stream, one piece in memory at a time. */
export function readFileChunks(ds: DataSource, listId: string): Readable {
  async function* pieces(): AsyncGenerator<Buffer> {
    for (let seq = 0; ; seq++) {
      const piece = await findFileChunk(ds.manager, listId, seq);
      if (!piece) return;
      yield piece;
    }
  }
  return Readable.from(pieces());
}

export function hasStoredFile(ds: DataSource, listId: string): Promise<boolean> {
  return hasFileChunks(ds.manager, listId);
}
