import { z } from 'zod';
import { execute, queryExists, queryOne, type Executor } from '../db/executor';

/** The uploaded bytes of a list, kept in numbered pieces until it is committed or discarded. */

export async function insertFileChunk(ex: Executor, listId: string, seq: number, data: Buffer): Promise<void> {
  await execute(ex, `INSERT INTO price_list_file_chunk (price_list_id, seq, data) VALUES ($1, $2, $3)`, [listId, seq, data]);
}

const chunkRowSchema = z.object({ data: z.instanceof(Buffer) });

export async function findFileChunk(ex: Executor, listId: string, seq: number): Promise<Buffer | null> {
  const row = await queryOne(ex, chunkRowSchema, `SELECT data FROM price_list_file_chunk WHERE price_list_id = $1 AND seq = $2`, [
    listId,
    seq,
  ]);
  return row?.data ?? null;
}

export function hasFileChunks(ex: Executor, listId: string): Promise<boolean> {
  return queryExists(ex, `SELECT 1 FROM price_list_file_chunk WHERE price_list_id = $1 AND seq = 0`, [listId]);
}

export async function deleteFileChunks(ex: Executor, listId: string): Promise<void> {
  await execute(ex, `DELETE FROM price_list_file_chunk WHERE price_list_id = $1`, [listId]);
}
