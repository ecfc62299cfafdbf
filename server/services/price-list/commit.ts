import type { DataSource, EntityManager } from 'typeorm';
import type { PriceListApplied, PriceListCounts } from '../../../shared/schemas/price-lists';
import { formatDate } from '../../../shared/format';
import { AppError } from '../../errors';
import { audit } from '../audit.service';
import { lockListOrRefuse, lockSupplier } from './locks';

/**
 * The commit: every valid row of a staged list in one transaction, set-based — new parts (with
 * their spec when the file gave a whole one), the supplier's prices, the supersession links —
 * then the list marked committed, the mapping remembered, the supplier's other staged lists
 * marked stale, and the audit row. Any failure, or the process dying, leaves none of it.
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

interface ListForCommit {
  supplier_id: string;
  status: string;
  stale: boolean;
  sha256: string;
  mapping: Record<string, string | null>;
  counts: PriceListCounts | null;
  file_name: string;
}

async function count(m: EntityManager, sql: string, params: unknown[]): Promise<number> {
  const rows = (await m.query(sql, params)) as { n: number }[];
  return rows[0]?.n ?? 0;
}

async function loadForCommit(m: EntityManager, listId: string): Promise<ListForCommit> {
  const rows = (await m.query(
    `SELECT supplier_id, status, stale, sha256, mapping, counts, file_name FROM price_list WHERE id = $1 FOR UPDATE`,
    [listId],
  )) as ListForCommit[];
  const list = rows[0];
  if (!list) throw AppError.notFound('Price list');
  return list;
}

async function refuseUnlessCommittable(m: EntityManager, listId: string, list: ListForCommit): Promise<PriceListCounts> {
  if (list.status === 'committed') throw AppError.conflict('This price list is committed already.');
  if (list.status !== 'staged' || list.counts === null) {
    throw AppError.conflict(`This price list is ${list.status}; only a staged list can be committed.`);
  }
  const same = (await m.query(
    `SELECT id, committed_at FROM price_list WHERE supplier_id = $1 AND sha256 = $2 AND status = 'committed' AND id <> $3`,
    [list.supplier_id, list.sha256, listId],
  )) as { id: string; committed_at: Date }[];
  if (same[0]) {
    throw AppError.conflict(`This same file was committed for this supplier on ${formatDate(same[0].committed_at)}.`, {
      priceListId: same[0].id,
    });
  }
  if (list.stale) {
    throw AppError.conflict('Another price list of this supplier was committed since this preview: preview it again before committing.', {
      stale: true,
    });
  }
  return list.counts;
}

export interface CommitOutcome {
  supplierId: string;
  counts: PriceListCounts;
  applied: PriceListApplied;
}

/** `followUp` runs last inside the transaction: the caller queues there what must exist exactly when the commit does. */
export async function commitPriceList(
  ds: DataSource,
  listId: string,
  actorId: string | null,
  followUp?: (m: EntityManager) => Promise<void>,
): Promise<CommitOutcome> {
  return ds.transaction(async (m) => {
    await lockListOrRefuse(m, listId);
    const peek = (await m.query(`SELECT supplier_id FROM price_list WHERE id = $1`, [listId])) as { supplier_id: string }[];
    if (!peek[0]) throw AppError.notFound('Price list');
    // Serialises commits for one supplier; the list is read again under the lock, as the last commit left it.
    await lockSupplier(m, peek[0].supplier_id);
    const list = await loadForCommit(m, listId);
    const counts = await refuseUnlessCommittable(m, listId, list);
    const supplierId = list.supplier_id;
    // As in the diff (see diff.ts): prices written moments ago in this transaction have no
    // statistics, and a nested loop over them is quadratic. Hash joins stay linear.
    await m.query(`SET LOCAL enable_nestloop = off`);

    const created = ((await m.query(INSERT_PARTS_AND_PRICES_SQL, [listId, supplierId])) as { parts: number; prices: number }[])[0];
    const partsCreated = created?.parts ?? 0;
    const specsStored = (await count(m, INSERT_COIL_SPECS_SQL, [listId])) + (await count(m, INSERT_PLUG_SPECS_SQL, [listId]));
    const pricesWritten =
      (created?.prices ?? 0) +
      (await count(m, UPDATE_PRICES_SQL, [listId, supplierId])) +
      (await count(m, INSERT_OTHER_PRICES_SQL, [listId, supplierId, partsCreated < counts.new]));
    const accepted = counts.new + counts.changed + counts.unchanged;
    if (pricesWritten !== accepted) {
      // Only a change to this supplier's prices outside price lists can do this; the preview no longer holds.
      throw AppError.conflict(`The catalog changed since the preview (${pricesWritten} of ${accepted} prices matched): preview again.`);
    }
    await m.query(`SET LOCAL enable_nestloop = on`);
    const supersessionsLinked = await count(m, LINK_SUPERSESSIONS_SQL, [listId]);
    if ((await count(m, LOOP_CHECK_SQL, [listId])) > 0) {
      throw AppError.conflict(
        'A supersession in this file would now make a loop with a catalog edit made since the preview: preview again.',
      );
    }

    const applied: PriceListApplied = { partsCreated, specsStored, pricesWritten, supersessionsLinked };
    await m.query(
      `UPDATE price_list SET status = 'committed', stale = false, committed_by = $2, committed_at = now(), applied = $3, updated_at = now()
        WHERE id = $1`,
      [listId, actorId, JSON.stringify(applied)],
    );
    await m.query(`UPDATE supplier SET mapping = $2 WHERE id = $1`, [supplierId, JSON.stringify(list.mapping)]);
    await m.query(
      `UPDATE price_list SET stale = true, updated_at = now() WHERE supplier_id = $1 AND id <> $2 AND status IN ('staged', 'processing')`,
      [supplierId, listId],
    );
    await m.query(`DELETE FROM price_list_file_chunk WHERE price_list_id = $1`, [listId]);
    await audit(m, {
      actorId,
      action: 'price-list.commit',
      entityType: 'price_list',
      entityId: listId,
      data: { supplierId, fileName: list.file_name, sha256: list.sha256, counts, applied },
    });
    if (followUp) await followUp(m);
    return { supplierId, counts, applied };
  });
}
