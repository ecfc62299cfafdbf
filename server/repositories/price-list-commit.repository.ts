import { z } from 'zod';
import { queryCount, queryOne, type Executor } from '../db/executor';

/**
 * The commit's statements: a staged list's valid rows merged into the catalog, set-based — new
 * parts (with their spec when the file gave a whole one), the supplier's prices, the supersession
 * links. Each answers how many rows it wrote; services/price-list/commit.ts runs them in one
 * transaction and checks the counts.
 */

/**
 * New parts and their prices in one statement: the prices join the RETURNING rows of the part
 * insert by hash instead of looking each new part up again in the index.
 */
const INSERT_PARTS_AND_PRICES_SQL = `
WITH new_part AS (
  INSERT INTO part (brand_id, part_number, part_number_norm, kind, description, gtin)
  SELECT r.brand_id, r.part_number, r.part_number_norm, r.kind, left(coalesce(r.description, ''), 500), r.gtin
    FROM price_list_row r WHERE r.price_list_id = $1 AND r.change = 'new'
  ON CONFLICT (brand_id, part_number_norm) DO NOTHING
  RETURNING id, brand_id, part_number_norm
), new_price AS (
  INSERT INTO supplier_price (supplier_id, part_id, cost_cents, list_cents, core_cents, pack_qty, effective_date, price_list_id, updated_at)
  SELECT $2, np.id, r.cost_cents, r.list_cents, coalesce(r.core_cents, 0), coalesce(r.pack_qty, 1), current_date, $1, now()
    FROM new_part np
    JOIN price_list_row r ON r.price_list_id = $1 AND r.change = 'new' AND r.brand_id = np.brand_id AND r.part_number_norm = np.part_number_norm
  RETURNING 1
) SELECT (SELECT count(*) FROM new_part)::int AS parts, (SELECT count(*) FROM new_price)::int AS prices`;

// Parts are found again by brand and number: a row's part may have been created just now.
const ROW_PART_JOIN = `JOIN part p ON p.brand_id = r.brand_id AND p.part_number_norm = r.part_number_norm`;

const INSERT_COIL_SPECS_SQL = `
WITH ins AS (
  INSERT INTO coil_spec (part_id, architecture, driver, outputs, connector_pins, connector_key, primary_ohm_min, primary_ohm_max,
                         primary_inductance_mh, secondary_kohm_min, secondary_kohm_max, turns_ratio, available_kv, peak_current_a)
  SELECT p.id, c.architecture, c.driver, c.outputs, c."connectorPins", c."connectorKey", c."primaryOhmMin", c."primaryOhmMax",
         c."primaryInductanceMh", c."secondaryKohmMin", c."secondaryKohmMax", c."turnsRatio", c."availableKv", c."peakCurrentA"
    FROM price_list_row r ${ROW_PART_JOIN}
   CROSS JOIN LATERAL jsonb_to_record(r.coil) AS c(architecture text, driver text, outputs smallint, "connectorPins" smallint,
         "connectorKey" text, "primaryOhmMin" float8, "primaryOhmMax" float8, "primaryInductanceMh" float8, "secondaryKohmMin" float8,
         "secondaryKohmMax" float8, "turnsRatio" float8, "availableKv" float8, "peakCurrentA" float8)
   WHERE r.price_list_id = $1 AND r.change = 'new' AND r.coil IS NOT NULL AND p.kind = 'coil'
  ON CONFLICT (part_id) DO NOTHING
  RETURNING 1
) SELECT count(*)::int AS n FROM ins`;

const INSERT_PLUG_SPECS_SQL = `
WITH ins AS (
  INSERT INTO plug_spec (part_id, thread_mm, thread_pitch_mm, reach_mm, seat, hex_mm, heat_code, gap_mm, regappable, resistor,
                         resistor_kohm, projected_tip, electrode)
  SELECT p.id, g."threadMm", g."threadPitchMm", g."reachMm", g.seat, g."hexMm", g."heatCode", g."gapMm", g.regappable, g.resistor,
         g."resistorKohm", g."projectedTip", g.electrode
    FROM price_list_row r ${ROW_PART_JOIN}
   CROSS JOIN LATERAL jsonb_to_record(r.plug) AS g("threadMm" float8, "threadPitchMm" float8, "reachMm" float8, seat text, "hexMm" float8,
         "heatCode" text, "gapMm" float8, regappable boolean, resistor boolean, "resistorKohm" float8, "projectedTip" boolean, electrode text)
   WHERE r.price_list_id = $1 AND r.change = 'new' AND r.plug IS NOT NULL AND p.kind = 'plug'
  ON CONFLICT (part_id) DO NOTHING
  RETURNING 1
) SELECT count(*)::int AS n FROM ins`;

/** Rows whose part has a price from this supplier already: every one of them is rewritten, so the price records this list. */
const UPDATE_PRICES_SQL = `
WITH upd AS (
  UPDATE supplier_price sp SET cost_cents = r.cost_cents, list_cents = r.list_cents,
         core_cents = coalesce(r.core_cents, sp.core_cents), pack_qty = coalesce(r.pack_qty, sp.pack_qty),
         effective_date = current_date, price_list_id = $1, updated_at = now()
    FROM price_list_row r
   WHERE r.price_list_id = $1 AND r.change IN ('changed', 'unchanged') AND r.old_cost_cents IS NOT NULL
     AND sp.supplier_id = $2 AND sp.part_id = r.part_id
  RETURNING 1
) SELECT count(*)::int AS n FROM upd`;

/**
 * First prices for parts the catalog had, and — when another request created one of this list's
 * new numbers meanwhile — the price of that part, which the statement above left out.
 */
const INSERT_OTHER_PRICES_SQL = `
WITH ins AS (
  INSERT INTO supplier_price (supplier_id, part_id, cost_cents, list_cents, core_cents, pack_qty, effective_date, price_list_id, updated_at)
  SELECT $2, p.id, r.cost_cents, r.list_cents, coalesce(r.core_cents, 0), coalesce(r.pack_qty, 1), current_date, $1, now()
    FROM price_list_row r ${ROW_PART_JOIN}
   WHERE r.price_list_id = $1 AND r.old_cost_cents IS NULL AND (r.change = 'changed' OR (r.change = 'new' AND $3))
     AND NOT EXISTS (SELECT 1 FROM supplier_price x WHERE x.supplier_id = $2 AND x.part_id = p.id AND x.price_list_id = $1)
  ON CONFLICT (supplier_id, part_id) DO UPDATE SET cost_cents = EXCLUDED.cost_cents, list_cents = EXCLUDED.list_cents,
     core_cents = EXCLUDED.core_cents, pack_qty = EXCLUDED.pack_qty, effective_date = EXCLUDED.effective_date,
     price_list_id = EXCLUDED.price_list_id, updated_at = EXCLUDED.updated_at
  RETURNING 1
) SELECT count(*)::int AS n FROM ins`;

const LINK_SUPERSESSIONS_SQL = `
WITH upd AS (
  UPDATE part old SET superseded_by_id = p.id, updated_at = now()
    FROM price_list_row r ${ROW_PART_JOIN}
   WHERE r.price_list_id = $1 AND r.supersession = 'link'
     AND old.brand_id = r.brand_id AND old.part_number_norm = r.supersedes_norm AND old.id <> p.id
  RETURNING 1
) SELECT count(*)::int AS n FROM upd`;

/** A catalog edit since the preview could close a loop with a link just made: walk up from each new successor. */
const LOOP_CHECK_SQL = `
WITH RECURSIVE linked AS (
  SELECT old.id AS old_id, p.id AS new_id
    FROM price_list_row r ${ROW_PART_JOIN}
    JOIN part old ON old.brand_id = r.brand_id AND old.part_number_norm = r.supersedes_norm
   WHERE r.price_list_id = $1 AND r.supersession = 'link'
), up AS (
  SELECT old_id, new_id AS at, 1 AS depth FROM linked
  UNION ALL
  SELECT u.old_id, p.superseded_by_id, u.depth + 1 FROM up u JOIN part p ON p.id = u.at
   WHERE p.superseded_by_id IS NOT NULL AND u.depth < 64 AND u.at <> u.old_id
) SELECT count(*)::int AS n FROM up WHERE at = old_id`;

const createdRowSchema = z.object({ parts: z.number().int(), prices: z.number().int() });

/** The list's new parts and their first prices from this supplier. */
export async function insertNewPartsAndPrices(
  ex: Executor,
  listId: string,
  supplierId: string,
): Promise<{ parts: number; prices: number }> {
  return (await queryOne(ex, createdRowSchema, INSERT_PARTS_AND_PRICES_SQL, [listId, supplierId])) ?? { parts: 0, prices: 0 };
}

/** Specs of the new parts, where the file gave a whole one. */
export async function insertNewSpecs(ex: Executor, listId: string): Promise<number> {
  return (await queryCount(ex, INSERT_COIL_SPECS_SQL, [listId])) + (await queryCount(ex, INSERT_PLUG_SPECS_SQL, [listId]));
}

export function updateKnownPrices(ex: Executor, listId: string, supplierId: string): Promise<number> {
  return queryCount(ex, UPDATE_PRICES_SQL, [listId, supplierId]);
}

/** `newPartsRaced`: some of the list's new numbers were created by another request meanwhile. */
export function insertOtherPrices(ex: Executor, listId: string, supplierId: string, newPartsRaced: boolean): Promise<number> {
  return queryCount(ex, INSERT_OTHER_PRICES_SQL, [listId, supplierId, newPartsRaced]);
}

export function linkSupersessions(ex: Executor, listId: string): Promise<number> {
  return queryCount(ex, LINK_SUPERSESSIONS_SQL, [listId]);
}

/** Loops the links just made close, walking up from each new successor. */
export function countSupersessionLoops(ex: Executor, listId: string): Promise<number> {
  return queryCount(ex, LOOP_CHECK_SQL, [listId]);
}
