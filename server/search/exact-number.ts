import type { SearchHit } from '../../shared/schemas/search';
import type { Executor } from '../db/executor';
import { exactNumberRows } from '../repositories/search.repository';

/**
 * The counter's commonest question — "what is this number?" — answered by an exact lookup of the
 * folded number in PostgreSQL's indexes: our numbers, GTINs and interchange numbers, each followed
 * along the supersession chain to the part that is current. The search index (typo tolerance,
 * free text) is asked only when this finds nothing.
 */
export async function exactNumberHits(ex: Executor, norm: string, limit: number): Promise<SearchHit[]> {
  const rows = await exactNumberRows(ex, norm, limit);
  return rows.map((r) => ({
    partId: r.part_id,
    brand: r.brand,
    partNumber: r.part_number,
    kind: r.kind,
    description: r.description,
    matchedBy: r.matched_by,
    matchedNumber: r.matched_number,
    inStock: r.on_hand > 0,
    hasSpec: r.has_spec,
  }));
}
