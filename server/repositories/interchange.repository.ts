import { z } from 'zod';
import { insertReturningId, queryOne, queryRows, type Executor } from '../db/executor';

const claimRowSchema = z.object({
  id: z.string(),
  part_id: z.string(),
  foreign_brand: z.string(),
  foreign_number: z.string(),
  source: z.string(),
  confidence: z.number(),
});
export type InterchangeClaimRow = z.infer<typeof claimRowSchema>;

export function findClaim(ex: Executor, id: string): Promise<InterchangeClaimRow | null> {
  return queryOne(
    ex,
    claimRowSchema,
    `SELECT id, part_id, foreign_brand, foreign_number, source, confidence FROM interchange WHERE id = $1`,
    [id],
  );
}

export interface NewClaim {
  brand: string;
  number: string;
  numberNorm: string;
  partId: string;
  source: string;
  confidence: number;
}

export function insertClaim(ex: Executor, c: NewClaim): Promise<string> {
  return insertReturningId(
    ex,
    `INSERT INTO interchange (foreign_brand, foreign_number, foreign_number_norm, part_id, source, confidence) VALUES ($1,$2,$3,$4,$5,$6) RETURNING id`,
    [c.brand, c.number, c.numberNorm, c.partId, c.source, c.confidence],
  );
}

const partClaimRowSchema = z.object({
  id: z.string(),
  brand: z.string(),
  number: z.string(),
  source: z.string(),
  confidence: z.number(),
  /** The foreign part itself, where the catalog holds it under that brand and number. */
  original_part_id: z.string().nullable(),
});
export type PartClaimRow = z.infer<typeof partClaimRowSchema>;

/** The claims that another brand's number equals this part. */
export function claimsOfPart(ex: Executor, partId: string): Promise<PartClaimRow[]> {
  return queryRows(
    ex,
    partClaimRowSchema,
    `SELECT i.id, i.foreign_brand AS brand, i.foreign_number AS number, i.source, i.confidence,
            (SELECT fp.id FROM part fp JOIN brand fb ON fb.id = fp.brand_id
              WHERE fp.part_number_norm = i.foreign_number_norm AND lower(fb.name) = lower(i.foreign_brand) LIMIT 1) AS original_part_id
       FROM interchange i WHERE i.part_id = $1 ORDER BY i.foreign_brand, i.foreign_number`,
    [partId],
  );
}

const originalRowSchema = z.object({ part_id: z.string(), foreign_number_norm: z.string(), original_part_id: z.string() });
export type ClaimOriginalRow = z.infer<typeof originalRowSchema>;

/** For claims (our part, foreign number), the foreign part where the catalog holds it: one query for all. */
export function claimOriginals(ex: Executor, partIds: readonly string[], foreignNorms: readonly string[]): Promise<ClaimOriginalRow[]> {
  return queryRows(
    ex,
    originalRowSchema,
    `SELECT i.part_id, i.foreign_number_norm, fp.id AS original_part_id
       FROM interchange i JOIN brand fb ON lower(fb.name) = lower(i.foreign_brand)
       JOIN part fp ON fp.brand_id = fb.id AND fp.part_number_norm = i.foreign_number_norm
      WHERE i.part_id = ANY($1::uuid[]) AND i.foreign_number_norm = ANY($2::text[])`,
    [partIds, foreignNorms],
  );
}

const engineIdRowSchema = z.object({ engine_id: z.string() });

/**
 * The engine a foreign number is judged on: where the parts it is said to equal are fitted,
 * the most trusted claim first.
 */
export async function referenceEngineId(ex: Executor, foreignNorm: string): Promise<string | null> {
  const row = await queryOne(
    ex,
    engineIdRowSchema,
    `SELECT f.engine_id FROM interchange i JOIN fitment f ON f.part_id = i.part_id
      WHERE i.foreign_number_norm = $1 ORDER BY i.confidence DESC, f.engine_id LIMIT 1`,
    [foreignNorm],
  );
  return row?.engine_id ?? null;
}
