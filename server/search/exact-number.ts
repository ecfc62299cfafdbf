import type { SearchHit } from '../../shared/schemas/search';
import type { Executor } from '../db/executor';
import { exactNumberRows } from '../repositories/search.repository';

/** `${our part id}|${foreign number, folded}` → the foreign part an interchange claim names. */
export type ClaimOriginals = Map<string, string>;
export const claimKey = (partId: string, foreignNorm: string): string => `${partId}|${foreignNorm}`;

/**
 * The counter's commonest question — "what is this number?" — answered by an exact lookup of the
 * folded number in PostgreSQL's indexes: our numbers, GTINs and interchange numbers, each followed
 * along the supersession chain to the part that is current. The search index (typo tolerance,
 * free text) is asked only when this finds nothing. The claims' foreign parts come in the same
 * query, so the interchange verdicts need no second lookup.
 */
export async function exactNumberHits(
  ex: Executor,
  norm: string,
  limit: number,
): Promise<{ hits: SearchHit[]; originals: ClaimOriginals }> {
  const rows = await exactNumberRows(ex, norm, limit);
  const originals: ClaimOriginals = new Map();
  for (const r of rows) if (r.original_part_id) originals.set(claimKey(r.part_id, r.matched_number), r.original_part_id);
  const hits = rows.map((r): SearchHit => ({
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
  return { hits, originals };
}
