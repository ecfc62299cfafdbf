import type { DataSource } from 'typeorm';

export interface ListState {
  status: string;
  /** Staged rows that are not rejected: what a commit writes. */
  accepted: number;
  /** supplier_price rows that name this list. */
  pricesFromList: number;
  /** The supplier's prices equal to this list's, part by part. */
  pricesMatching: number;
  /** The list's new numbers that exist as parts. */
  newPartsPresent: number;
  newRows: number;
  auditRows: number;
}

/** Where a price list stands in the database, read with SQL only (not through the code under test). */
export async function listState(ds: DataSource, listId: string): Promise<ListState> {
  const rows = (await ds.query(
    `SELECT pl.status,
            (SELECT count(*)::int FROM price_list_row r WHERE r.price_list_id = pl.id AND NOT r.retracted AND r.change <> 'rejected') AS accepted,
            (SELECT count(*)::int FROM supplier_price sp WHERE sp.supplier_id = pl.supplier_id AND sp.price_list_id = pl.id) AS prices_from_list,
            (SELECT count(*)::int FROM price_list_row r
               JOIN part p ON p.brand_id = r.brand_id AND p.part_number_norm = r.part_number_norm
               JOIN supplier_price sp ON sp.supplier_id = pl.supplier_id AND sp.part_id = p.id
              WHERE r.price_list_id = pl.id AND NOT r.retracted AND r.change <> 'rejected'
                AND sp.cost_cents = r.cost_cents AND sp.list_cents = r.list_cents) AS prices_matching,
            (SELECT count(*)::int FROM price_list_row r
               JOIN part p ON p.brand_id = r.brand_id AND p.part_number_norm = r.part_number_norm
              WHERE r.price_list_id = pl.id AND r.change = 'new') AS new_parts_present,
            (SELECT count(*)::int FROM price_list_row r WHERE r.price_list_id = pl.id AND r.change = 'new') AS new_rows,
            (SELECT count(*)::int FROM audit_log a WHERE a.entity_id = pl.id::text AND a.action = 'price-list.commit') AS audit_rows
       FROM price_list pl WHERE pl.id = $1`,
    [listId],
  )) as {
    status: string;
    accepted: number;
    prices_from_list: number;
    prices_matching: number;
    new_parts_present: number;
    new_rows: number;
    audit_rows: number;
  }[];
  const r = rows[0];
  if (!r) throw new Error(`no price list ${listId}`);
  return {
    status: r.status,
    accepted: r.accepted,
    pricesFromList: r.prices_from_list,
    pricesMatching: r.prices_matching,
    newPartsPresent: r.new_parts_present,
    newRows: r.new_rows,
    auditRows: r.audit_rows,
  };
}

/** Committed whole: every price of the list written, status, audit. */
export function isFullyCommitted(s: ListState): boolean {
  return (
    s.status === 'committed' &&
    s.pricesFromList === s.accepted &&
    s.pricesMatching === s.accepted &&
    s.auditRows === 1 &&
    s.newPartsPresent === s.newRows
  );
}

/** Not committed at all: still staged, no price of it, none of its new numbers made into parts, no audit row. */
export function isUntouched(s: ListState): boolean {
  return s.status === 'staged' && s.pricesFromList === 0 && s.newPartsPresent === 0 && s.auditRows === 0;
}
