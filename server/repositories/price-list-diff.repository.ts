import { z } from 'zod';
import { execute, queryOne, type Executor } from '../db/executor';

/**
 * The comparison of a staged list with the catalog and the supplier's current prices, in a few
 * set-based statements (no row-by-row work): each staged row becomes new, changed, unchanged or
 * rejected (unknown brand, no kind for a new number, kind against the catalog's, unknown heat
 * code), and its supersession is checked. Run in the staging transaction, under the supplier's
 * lock (services/price-list/diff.ts says in which order).
 */

const CLASSIFY_SQL = `
UPDATE price_list_row r SET
  brand_id = d.brand_id,
  part_id = d.part_id,
  part_kind = d.part_kind,
  old_cost_cents = d.old_cost, old_list_cents = d.old_list, old_core_cents = d.old_core, old_pack_qty = d.old_pack,
  change = CASE
    WHEN d.reject_field IS NOT NULL THEN 'rejected'
    WHEN d.part_id IS NULL THEN 'new'
    WHEN d.old_cost IS NULL THEN 'changed'
    WHEN r.cost_cents <> d.old_cost OR r.list_cents <> d.old_list
      OR coalesce(r.core_cents, d.old_core) <> d.old_core OR coalesce(r.pack_qty, d.old_pack) <> d.old_pack THEN 'changed'
    ELSE 'unchanged' END,
  reject_field = d.reject_field,
  reject_message = d.reject_message,
  cost_change_pct = CASE WHEN d.reject_field IS NULL AND d.old_cost > 0 THEN (r.cost_cents - d.old_cost) * 100.0 / d.old_cost END,
  list_change_pct = CASE WHEN d.reject_field IS NULL AND d.old_list > 0 THEN (r.list_cents - d.old_list) * 100.0 / d.old_list END,
  flagged = coalesce(d.reject_field IS NULL AND (
    (d.old_cost > 0 AND abs(r.cost_cents - d.old_cost) * 100.0 / d.old_cost > $3)
    OR (d.old_list > 0 AND abs(r.list_cents - d.old_list) * 100.0 / d.old_list > $3)), false),
  supersedes_part_id = NULL,
  supersession = NULL
FROM (
  SELECT c.*,
         CASE WHEN c.brand_id IS NULL THEN 'brand'
              WHEN c.same_part > 1 THEN 'partNumber'
              WHEN c.part_id IS NULL AND c.kind IS NULL THEN 'kind'
              WHEN c.part_id IS NOT NULL AND c.kind IS NOT NULL AND c.kind <> c.part_kind THEN 'kind'
              WHEN c.part_id IS NULL AND c.heat_code IS NOT NULL AND NOT c.heat_code_known THEN 'heatCode' END AS reject_field,
         CASE WHEN c.brand_id IS NULL THEN format('unknown brand "%s": add it to the catalog first', c.brand)
              -- The parser folds brands by case and spacing; the catalog may fold two more spellings into one brand.
              WHEN c.same_part > 1 THEN format('the same part (%s %s) is on %s lines, %s to %s; all of them are rejected',
                                               c.brand_name, c.part_number_norm, c.same_part, c.first_line, c.last_line)
              WHEN c.part_id IS NULL AND c.kind IS NULL
                THEN format('%s is a new number and the file does not say whether it is a coil or a plug', c.part_number)
              WHEN c.part_id IS NOT NULL AND c.kind IS NOT NULL AND c.kind <> c.part_kind
                THEN format('the file says %s, but the catalog has %s as a %s', c.kind, c.catalog_number, c.part_kind)
              WHEN c.part_id IS NULL AND c.heat_code IS NOT NULL AND NOT c.heat_code_known
                THEN format('heat code "%s" is not in the %s heat table', c.heat_code, c.brand_name) END AS reject_message
    FROM (
      SELECT r0.line, r0.brand, r0.part_number, r0.part_number_norm, r0.kind, b.id AS brand_id, b.name AS brand_name,
             p.id AS part_id, p.kind AS part_kind, p.part_number AS catalog_number,
             sp.cost_cents AS old_cost, sp.list_cents AS old_list, sp.core_cents AS old_core, sp.pack_qty AS old_pack,
             r0.plug->>'heatCode' AS heat_code, hc.code IS NOT NULL AS heat_code_known,
             count(*) OVER w AS same_part, min(r0.line) OVER w AS first_line, max(r0.line) OVER w AS last_line
        FROM price_list_row r0
        LEFT JOIN brand b ON b.name_norm = r0.brand_norm
        LEFT JOIN part p ON p.brand_id = b.id AND p.part_number_norm = r0.part_number_norm
        LEFT JOIN supplier_price sp ON sp.supplier_id = $2 AND sp.part_id = p.id
        LEFT JOIN brand_heat_code hc ON hc.brand_id = b.id AND hc.code = r0.plug->>'heatCode'
       WHERE r0.price_list_id = $1 AND NOT r0.retracted
      WINDOW w AS (PARTITION BY b.id, r0.part_number_norm)
    ) c
) d
WHERE r.price_list_id = $1 AND r.line = d.line`;

const CATALOG_ERRORS_SQL = `
INSERT INTO price_list_row_error (price_list_id, line, "column", field, message, source)
SELECT price_list_id, line, $2::jsonb ->> reject_field, reject_field, reject_message, 'catalog'
  FROM price_list_row WHERE price_list_id = $1 AND change = 'rejected'`;

/**
 * "This row's part supersedes the number named": the old number must be in the catalog or in the
 * file, be the same kind, be claimed by one row only, and not already point here. Rows that fail
 * keep their price; only the link is skipped, with the reason shown in the preview.
 */
const SUPERSESSION_SQL = `
WITH s AS (
  SELECT r.line, r.part_id, old.id AS old_id, old.kind AS old_kind, old.superseded_by_id AS old_successor,
         f.line AS file_line, coalesce(f.part_kind, f.kind) AS file_kind, coalesce(r.part_kind, r.kind) AS own_kind,
         count(*) OVER (PARTITION BY r.brand_id, r.supersedes_norm) AS claims
    FROM price_list_row r
    LEFT JOIN part old ON old.brand_id = r.brand_id AND old.part_number_norm = r.supersedes_norm
    LEFT JOIN price_list_row f ON f.price_list_id = r.price_list_id AND f.brand_id = r.brand_id
         AND f.part_number_norm = r.supersedes_norm AND NOT f.retracted AND f.change <> 'rejected'
   WHERE r.price_list_id = $1 AND r.supersedes_norm IS NOT NULL AND NOT r.retracted AND r.change <> 'rejected'
)
UPDATE price_list_row r SET supersedes_part_id = s.old_id,
  supersession = CASE
    WHEN s.old_id IS NULL AND s.file_line IS NULL THEN 'not-found'
    WHEN coalesce(s.old_kind, s.file_kind) <> s.own_kind THEN 'kind-mismatch'
    WHEN s.claims > 1 THEN 'conflict'
    WHEN s.old_successor IS NOT NULL AND s.old_successor = s.part_id THEN 'already'
    ELSE 'link' END
FROM s WHERE r.price_list_id = $1 AND r.line = s.line`;

/**
 * Links that would close a loop once made (A supersedes B while B's chain leads back to A),
 * walking the graph as it will be: the file's links replace the catalog's for the numbers they
 * name. Parts are keyed by brand and number, since new parts have no id yet.
 */
const LOOPS_SQL = `
WITH RECURSIVE link AS (
  SELECT line, brand_id, supersedes_norm AS old_norm, part_number_norm AS new_norm
    FROM price_list_row WHERE price_list_id = $1 AND supersession = 'link'
), walk AS (
  SELECT l.line, l.brand_id AS start_brand, l.old_norm AS start_norm, l.brand_id, l.new_norm AS norm, 1 AS depth FROM link l
  UNION ALL
  SELECT w.line, w.start_brand, w.start_norm, nxt.brand_id, nxt.norm, w.depth + 1
    FROM walk w
    CROSS JOIN LATERAL (
      SELECT l.brand_id, l.new_norm AS norm FROM link l WHERE l.brand_id = w.brand_id AND l.old_norm = w.norm
      UNION ALL
      SELECT s.brand_id, s.part_number_norm FROM part o JOIN part s ON s.id = o.superseded_by_id
       WHERE o.brand_id = w.brand_id AND o.part_number_norm = w.norm
         AND NOT EXISTS (SELECT 1 FROM link l2 WHERE l2.brand_id = o.brand_id AND l2.old_norm = o.part_number_norm)
    ) nxt
   WHERE w.depth < 64 AND NOT (w.brand_id = w.start_brand AND w.norm = w.start_norm)
)
UPDATE price_list_row r SET supersession = 'loop'
 WHERE r.price_list_id = $1 AND r.line IN (SELECT line FROM walk WHERE brand_id = start_brand AND norm = start_norm)`;

const COUNTS_SQL = `
SELECT count(*) FILTER (WHERE change = 'new')::int AS new,
       count(*) FILTER (WHERE change = 'changed')::int AS changed,
       count(*) FILTER (WHERE change = 'unchanged')::int AS unchanged,
       count(*) FILTER (WHERE change = 'changed' AND old_cost_cents IS NULL)::int AS first_prices,
       count(*) FILTER (WHERE supersession = 'link')::int AS supersessions,
       count(*) FILTER (WHERE flagged)::int AS flagged,
       (SELECT count(DISTINCT line) FROM price_list_row_error e WHERE e.price_list_id = $1)::int AS rejected
  FROM price_list_row WHERE price_list_id = $1 AND NOT retracted`;

const countsRowSchema = z.object({
  new: z.number().int(),
  changed: z.number().int(),
  unchanged: z.number().int(),
  first_prices: z.number().int(),
  supersessions: z.number().int(),
  flagged: z.number().int(),
  rejected: z.number().int(),
});
export type DiffCountsRow = z.infer<typeof countsRowSchema>;

/** Drops the reasons of an earlier comparison. */
export async function deleteCatalogRejections(ex: Executor, listId: string): Promise<void> {
  await execute(ex, `DELETE FROM price_list_row_error WHERE price_list_id = $1 AND source = 'catalog'`, [listId]);
}

/**
 * Rows written in this transaction have no statistics yet, so the planner takes the list for a
 * few rows and may nest loops over it, which is quadratic when it is large; hash joins are linear
 * for every size of list. Set for the rest of the transaction (on again for walks up chains).
 */
export async function allowNestedLoops(ex: Executor, allowed: boolean): Promise<void> {
  await execute(ex, `SET LOCAL enable_nestloop = ${allowed ? 'on' : 'off'}`);
}

/** Each row new, changed, unchanged or rejected, with the old prices beside the new. */
export async function classifyRows(ex: Executor, listId: string, supplierId: string, flagThresholdPct: number): Promise<void> {
  await execute(ex, CLASSIFY_SQL, [listId, supplierId, flagThresholdPct]);
}

/** The rejected rows' reasons, under the header each field was read from. */
export async function recordCatalogRejections(ex: Executor, listId: string, headers: Record<string, string>): Promise<void> {
  await execute(ex, CATALOG_ERRORS_SQL, [listId, JSON.stringify(headers)]);
}

export async function checkSupersessions(ex: Executor, listId: string): Promise<void> {
  await execute(ex, SUPERSESSION_SQL, [listId]);
}

export async function markSupersessionLoops(ex: Executor, listId: string): Promise<void> {
  await execute(ex, LOOPS_SQL, [listId]);
}

export async function diffCounts(ex: Executor, listId: string): Promise<DiffCountsRow> {
  const row = await queryOne(ex, countsRowSchema, COUNTS_SQL, [listId]);
  if (!row) throw new Error('price-list counts query returned nothing');
  return row;
}
