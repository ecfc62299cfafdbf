import { z } from 'zod';
import { MATCHED_BY } from '../../shared/schemas/search';
import { queryIds, queryRows, queryRowsPrepared, type Executor } from '../db/executor';
import { partKindSchema } from './parts.repository';

/** The SQL behind the Counter's search: the index's documents, and the exact lookup of a number. */

// Vehicles are folded to one label per make, model and engine with the year span, so a part that
// fits 40 model years carries a few labels, not 40.
const DOCUMENT_SQL = `
WITH RECURSIVE chain AS (
  SELECT p.id AS current_id, old.id AS old_id, old.part_number_norm AS old_norm, 1 AS depth
    FROM part p JOIN part old ON old.superseded_by_id = p.id
  UNION ALL
  SELECT c.current_id, older.id, older.part_number_norm, c.depth + 1
    FROM chain c JOIN part older ON older.superseded_by_id = c.old_id
   WHERE c.depth < 20
),
veh AS (
  SELECT f.part_id, array_agg(DISTINCT e.code) AS engine_codes,
         array_agg(DISTINCT v.make || ' ' || v.model || ' ' || e.code || ' ' || v.y0 || '-' || v.y1) AS labels
    FROM fitment f
    JOIN engine e ON e.id = f.engine_id
    JOIN (SELECT engine_id, make, model, min(year) AS y0, max(year) AS y1 FROM vehicle GROUP BY engine_id, make, model) v ON v.engine_id = e.id
   GROUP BY f.part_id
)
SELECT p.id, b.name AS brand, p.part_number, p.part_number_norm, p.gtin, p.kind, p.description,
       p.superseded_by_id IS NULL AS current,
       (cs.part_id IS NOT NULL OR ps.part_id IS NOT NULL) AS has_spec,
       coalesce(s.on_hand, 0) AS on_hand,
       -- A foreign number that points at a superseded part leads on to the current one. Two
       -- index lookups rather than one OR, which would scan the whole interchange table per part.
       ARRAY(SELECT DISTINCT n FROM (
               SELECT i.foreign_number_norm AS n FROM interchange i WHERE i.part_id = p.id
               UNION ALL
               SELECT i.foreign_number_norm FROM chain c JOIN interchange i ON i.part_id = c.old_id WHERE c.current_id = p.id) x) AS interchange_numbers,
       coalesce((SELECT array_agg(DISTINCT c.old_norm) FROM chain c WHERE c.current_id = p.id), '{}') AS superseded_numbers,
       coalesce(veh.engine_codes, '{}') AS engine_codes, coalesce(veh.labels, '{}') AS vehicles,
       cs.architecture, cs.driver, cs.connector_pins, cs.connector_key, cs.primary_ohm_min, cs.primary_ohm_max,
       ps.thread_mm, ps.reach_mm, ps.seat, ps.hex_mm, hc.heat_step, ps.resistor, ps.gap_mm
  FROM part p
  JOIN brand b ON b.id = p.brand_id AND b.ours
  LEFT JOIN coil_spec cs ON cs.part_id = p.id
  LEFT JOIN plug_spec ps ON ps.part_id = p.id
  LEFT JOIN brand_heat_code hc ON hc.brand_id = p.brand_id AND hc.code = ps.heat_code
  LEFT JOIN LATERAL (SELECT sum(x.on_hand)::int AS on_hand FROM stock x WHERE x.part_id = p.id) s ON true
  LEFT JOIN veh ON veh.part_id = p.id
`;

const texts = z.array(z.string());
const numberOrNull = z.number().nullable();
const textOrNull = z.string().nullable();

const documentRowSchema = z.object({
  id: z.string(),
  brand: z.string(),
  part_number: z.string(),
  part_number_norm: z.string(),
  gtin: textOrNull,
  kind: partKindSchema,
  description: z.string(),
  current: z.boolean(),
  has_spec: z.boolean(),
  on_hand: z.number().int(),
  interchange_numbers: texts,
  superseded_numbers: texts,
  engine_codes: texts,
  vehicles: texts,
  architecture: textOrNull,
  driver: textOrNull,
  connector_pins: numberOrNull,
  connector_key: textOrNull,
  primary_ohm_min: numberOrNull,
  primary_ohm_max: numberOrNull,
  thread_mm: numberOrNull,
  reach_mm: numberOrNull,
  seat: textOrNull,
  hex_mm: numberOrNull,
  heat_step: numberOrNull,
  resistor: z.boolean().nullable(),
  gap_mm: numberOrNull,
});
export type DocumentRow = z.infer<typeof documentRowSchema>;

/** The search document rows of every part of ours, or of the given parts. */
export function documentRows(ex: Executor, partIds?: readonly string[]): Promise<DocumentRow[]> {
  return partIds
    ? queryRows(ex, documentRowSchema, `${DOCUMENT_SQL} WHERE p.id = ANY($1::uuid[])`, [partIds])
    : queryRows(ex, documentRowSchema, DOCUMENT_SQL);
}

/**
 * The parts whose documents a change to these parts touches: themselves, the parts they are
 * superseded by up the chain (whose supersededNumbers change) and those they supersede.
 */
export function chainPartIds(ex: Executor, partIds: readonly string[]): Promise<string[]> {
  return queryIds(
    ex,
    `WITH RECURSIVE up AS (
        SELECT id, superseded_by_id, 0 AS d FROM part WHERE id = ANY($1::uuid[])
        UNION SELECT p.id, p.superseded_by_id, up.d + 1 FROM part p JOIN up ON p.id = up.superseded_by_id WHERE up.d < 20
     ), down AS (
        SELECT id, 0 AS d FROM part WHERE id = ANY($1::uuid[])
        UNION SELECT p.id, down.d + 1 FROM part p JOIN down ON p.superseded_by_id = down.id WHERE down.d < 20
     )
     SELECT id FROM up UNION SELECT id FROM down`,
    [partIds],
  );
}

const exactRowSchema = z.object({
  part_id: z.string(),
  matched_by: z.enum(MATCHED_BY),
  matched_number: z.string(),
  brand: z.string(),
  part_number: z.string(),
  kind: partKindSchema,
  description: z.string(),
  on_hand: z.number().int(),
  has_spec: z.boolean(),
  /** For an interchange match, the foreign part the claim names where the catalog holds it (its verdict's original). */
  original_part_id: z.string().nullable(),
});
export type ExactNumberRow = z.infer<typeof exactRowSchema>;

/**
 * Our current parts a folded number names exactly — our number, a GTIN or an interchange number,
 * each followed along the supersession chain to the part that is current. An interchange match
 * carries the claim's foreign part in the same query, so the number path makes one round trip.
 */
export function exactNumberRows(ex: Executor, norm: string, limit: number): Promise<ExactNumberRow[]> {
  // Prepared: planning this CTE costs more than running it, and it runs on every number typed.
  return queryRowsPrepared(
    ex,
    exactRowSchema,
    'search.exact-number',
    `WITH RECURSIVE direct AS (
        SELECT p.id, 'number'::text AS by, p.part_number_norm AS num, 0 AS pri FROM part p WHERE p.part_number_norm = $1
        UNION ALL SELECT p.id, 'gtin', p.gtin, 0 FROM part p WHERE p.gtin = $1
        UNION ALL SELECT i.part_id, 'interchange', i.foreign_number_norm, 1 FROM interchange i WHERE i.foreign_number_norm = $1
      ), walk AS (
        SELECT d.id AS start_id, d.id, p.superseded_by_id, d.by, d.num, d.pri, 0 AS depth FROM direct d JOIN part p ON p.id = d.id
        UNION ALL SELECT w.start_id, p.id, p.superseded_by_id, w.by, w.num, w.pri, w.depth + 1 FROM walk w JOIN part p ON p.id = w.superseded_by_id WHERE w.depth < 20
      ), current AS (
        SELECT DISTINCT ON (w.id) w.id, CASE WHEN w.depth > 0 AND w.by = 'number' THEN 'supersession' ELSE w.by END AS by, w.num, w.pri
          FROM walk w WHERE w.superseded_by_id IS NULL ORDER BY w.id, w.pri, w.depth
      )
      SELECT c.id AS part_id, c.by AS matched_by, c.num AS matched_number, b.name AS brand, p.part_number, p.kind, p.description,
             coalesce(s.on_hand, 0) AS on_hand,
             (EXISTS (SELECT 1 FROM coil_spec x WHERE x.part_id = p.id) OR EXISTS (SELECT 1 FROM plug_spec y WHERE y.part_id = p.id)) AS has_spec,
             CASE WHEN c.by = 'interchange' THEN (
               SELECT fp.id FROM interchange i JOIN brand fb ON lower(fb.name) = lower(i.foreign_brand)
                 JOIN part fp ON fp.brand_id = fb.id AND fp.part_number_norm = i.foreign_number_norm
                WHERE i.part_id = c.id AND i.foreign_number_norm = c.num LIMIT 1) END AS original_part_id
        FROM current c JOIN part p ON p.id = c.id JOIN brand b ON b.id = p.brand_id AND b.ours
        LEFT JOIN LATERAL (SELECT sum(x.on_hand)::int AS on_hand FROM stock x WHERE x.part_id = p.id) s ON true
       ORDER BY c.pri, p.part_number LIMIT $2`,
    [norm, limit],
  );
}

const printedRowSchema = z.object({ source: z.enum(['part', 'interchange']), norm: z.string(), printed: z.string() });
export type PrintedNumberRow = z.infer<typeof printedRowSchema>;

/** How our parts and the interchange rows print these folded numbers (one spelling each). */
export function printedNumbers(ex: Executor, norms: readonly string[]): Promise<PrintedNumberRow[]> {
  return queryRows(
    ex,
    printedRowSchema,
    `SELECT 'part' AS source, part_number_norm AS norm, min(part_number) AS printed FROM part WHERE part_number_norm = ANY($1::text[]) GROUP BY 2
     UNION ALL
     SELECT 'interchange', foreign_number_norm, min(foreign_number) FROM interchange WHERE foreign_number_norm = ANY($1::text[]) GROUP BY 2`,
    [norms],
  );
}
