import { z } from 'zod';
import { partStatusSchema } from '../../shared/schemas/parts';
import { PART_KINDS, type PartKind } from '../../shared/schemas/specs';
import { execute, insertReturningId, queryExists, queryIds, queryOne, queryRows, type Executor } from '../db/executor';

export const partKindSchema = z.enum(PART_KINDS);

/** A part as lists and details show it: with its brand's name and whether a spec is on file. */
const partRowSchema = z.object({
  id: z.string(),
  brand: z.string(),
  ours: z.boolean(),
  part_number: z.string(),
  kind: partKindSchema,
  description: z.string(),
  gtin: z.string().nullable(),
  status: partStatusSchema,
  superseded_by_id: z.string().nullable(),
  has_spec: z.boolean(),
});
export type PartRow = z.infer<typeof partRowSchema>;

const PART_ROW_SQL = `
  SELECT p.id, b.name AS brand, b.ours, p.part_number, p.kind, p.description, p.gtin, p.status, p.superseded_by_id,
         (EXISTS (SELECT 1 FROM coil_spec c WHERE c.part_id = p.id) OR EXISTS (SELECT 1 FROM plug_spec s WHERE s.part_id = p.id)) AS has_spec
    FROM part p JOIN brand b ON b.id = p.brand_id`;

export async function findPartRows(ex: Executor, ids: readonly string[]): Promise<Map<string, PartRow>> {
  if (!ids.length) return new Map();
  const rows = await queryRows(ex, partRowSchema, `${PART_ROW_SQL} WHERE p.id = ANY($1::uuid[])`, [ids]);
  return new Map(rows.map((r) => [r.id, r]));
}

const chainRowSchema = z.object({ id: z.string(), part_number: z.string() });
export type ChainRow = z.infer<typeof chainRowSchema>;

/** The part itself, then its successor, and so on to the current part. */
export function supersessionUp(ex: Executor, id: string): Promise<ChainRow[]> {
  return queryRows(
    ex,
    chainRowSchema,
    `WITH RECURSIVE up AS (
       SELECT id, part_number, superseded_by_id, 0 AS depth FROM part WHERE id = $1
       UNION ALL SELECT p.id, p.part_number, p.superseded_by_id, up.depth + 1 FROM part p JOIN up ON p.id = up.superseded_by_id WHERE up.depth < 20)
     SELECT id, part_number FROM up ORDER BY depth`,
    [id],
  );
}

/** What the part replaced, and what those replaced, nearest first. */
export function supersessionDown(ex: Executor, id: string): Promise<ChainRow[]> {
  return queryRows(
    ex,
    chainRowSchema,
    `WITH RECURSIVE down AS (
       SELECT id, part_number, superseded_by_id, 0 AS depth FROM part WHERE superseded_by_id = $1
       UNION ALL SELECT p.id, p.part_number, p.superseded_by_id, down.depth + 1 FROM part p JOIN down ON p.superseded_by_id = down.id WHERE down.depth < 20)
     SELECT id, part_number FROM down ORDER BY depth`,
    [id],
  );
}

const lockedPartSchema = z.object({ id: z.string(), kind: partKindSchema, brand_id: z.string(), superseded_by_id: z.string().nullable() });
export type LockedPart = z.infer<typeof lockedPartSchema>;

/** The part, locked until the caller's transaction ends. */
export function lockPart(ex: Executor, id: string): Promise<LockedPart | null> {
  return queryOne(ex, lockedPartSchema, `SELECT id, kind, brand_id, superseded_by_id FROM part WHERE id = $1 FOR UPDATE`, [id]);
}

const kindRowSchema = z.object({ kind: partKindSchema });

export async function partKindOf(ex: Executor, id: string): Promise<PartKind | null> {
  return (await queryOne(ex, kindRowSchema, `SELECT kind FROM part WHERE id = $1`, [id]))?.kind ?? null;
}

/** True when following `successorId`'s chain upwards reaches `partId`. */
export function chainReaches(ex: Executor, successorId: string, partId: string): Promise<boolean> {
  return queryExists(
    ex,
    `WITH RECURSIVE up AS (SELECT id, superseded_by_id, 0 AS d FROM part WHERE id = $1
       UNION ALL SELECT p.id, p.superseded_by_id, up.d + 1 FROM part p JOIN up ON p.id = up.superseded_by_id WHERE up.d < 50)
     SELECT 1 FROM up WHERE id = $2`,
    [successorId, partId],
  );
}

export interface NewPart {
  brandId: string;
  partNumber: string;
  partNumberNorm: string;
  kind: PartKind;
  description: string;
  gtin: string | null;
}

export function insertPart(ex: Executor, p: NewPart): Promise<string> {
  return insertReturningId(
    ex,
    `INSERT INTO part (brand_id, part_number, part_number_norm, kind, description, gtin) VALUES ($1,$2,$3,$4,$5,$6) RETURNING id`,
    [p.brandId, p.partNumber, p.partNumberNorm, p.kind, p.description, p.gtin],
  );
}

export interface PartChanges {
  description?: string;
  status?: z.infer<typeof partStatusSchema>;
  gtin?: string | null;
  supersededById?: string | null;
}

const COLUMN_OF: Record<keyof PartChanges, string> = {
  description: 'description',
  status: 'status',
  gtin: 'gtin',
  supersededById: 'superseded_by_id',
};

/** Writes the fields given (undefined ones are left as they are). */
export async function updatePart(ex: Executor, id: string, changes: PartChanges): Promise<void> {
  const sets: string[] = [];
  const args: unknown[] = [id];
  for (const field of Object.keys(COLUMN_OF) as (keyof PartChanges)[]) {
    const value = changes[field];
    if (value === undefined) continue;
    args.push(value);
    sets.push(`${COLUMN_OF[field]} = $${args.length}`);
  }
  if (sets.length) await execute(ex, `UPDATE part SET ${sets.join(', ')}, updated_at = now() WHERE id = $1`, args);
}

/** Our current, active parts of a kind that carry a spec: the candidates a clerk could offer instead of another. */
export function currentSpecPartIds(ex: Executor, kind: PartKind, exceptId: string): Promise<string[]> {
  const specTable = kind === 'coil' ? 'coil_spec' : 'plug_spec';
  return queryIds(
    ex,
    `SELECT p.id FROM part p JOIN brand b ON b.id = p.brand_id AND b.ours JOIN ${specTable} s ON s.part_id = p.id
      WHERE p.kind = $1 AND p.superseded_by_id IS NULL AND p.status = 'active' AND p.id <> $2`,
    [kind, exceptId],
  );
}
