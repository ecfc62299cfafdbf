import { z } from 'zod';
import { heatStepSchema } from '../../shared/schemas/specs';
import { execute, insertReturningId, queryIds, queryOne, queryRows, type Executor } from '../db/executor';

const brandRowSchema = z.object({
  id: z.string(),
  name: z.string(),
  ours: z.boolean(),
  heat_code_note: z.string().nullable(),
  /** Hottest first. */
  heat_codes: z.array(z.object({ code: z.string(), heatStep: heatStepSchema })),
});
export type BrandRow = z.infer<typeof brandRowSchema>;

const BRAND_SELECT = `
SELECT b.id, b.name, b.ours, b.heat_code_note,
       coalesce(json_agg(json_build_object('code', h.code, 'heatStep', h.heat_step) ORDER BY h.heat_step) FILTER (WHERE h.code IS NOT NULL), '[]') AS heat_codes
  FROM brand b LEFT JOIN brand_heat_code h ON h.brand_id = b.id`;

/** Every brand with its heat table, our own lines first. */
export function listBrandRows(ex: Executor): Promise<BrandRow[]> {
  return queryRows(ex, brandRowSchema, `${BRAND_SELECT} GROUP BY b.id ORDER BY b.ours DESC, b.name`);
}

export function findBrandRow(ex: Executor, id: string): Promise<BrandRow | null> {
  return queryOne(ex, brandRowSchema, `${BRAND_SELECT} WHERE b.id = $1 GROUP BY b.id`, [id]);
}

/** The brand whose folded name is this one, if any. */
export async function brandIdByNorm(ex: Executor, nameNorm: string): Promise<string | null> {
  return (await queryIds(ex, `SELECT id FROM brand WHERE name_norm = $1`, [nameNorm]))[0] ?? null;
}

export interface NewBrand {
  name: string;
  nameNorm: string;
  ours: boolean;
  heatCodeNote: string | null;
  heatCodes: { code: string; heatStep: number }[];
}

export async function insertBrand(ex: Executor, b: NewBrand): Promise<string> {
  const id = await insertReturningId(ex, `INSERT INTO brand (name, name_norm, ours, heat_code_note) VALUES ($1,$2,$3,$4) RETURNING id`, [
    b.name,
    b.nameNorm,
    b.ours,
    b.heatCodeNote,
  ]);
  for (const h of b.heatCodes) {
    await execute(ex, `INSERT INTO brand_heat_code (brand_id, code, heat_step) VALUES ($1,$2,$3)`, [id, h.code, h.heatStep]);
  }
  return id;
}
