import type { Role } from '../../shared/roles';
import type { SearchHit, SearchResponse } from '../../shared/schemas/search';
import { matchReason } from '../search/match-reason';
import type { PartDocument } from '../search/part-document';
import { inStockAnywhere, type PartStock } from '../repositories/stock.repository';

/** A document of the search index as a hit: why it matched, and whether any store holds it (the index's total). */
export function presentSearchHit(doc: PartDocument, q: string): SearchHit {
  return {
    partId: doc.id,
    brand: doc.brand,
    partNumber: doc.partNumber,
    kind: doc.kind,
    description: doc.description,
    ...matchReason(doc, q),
    inStock: doc.inStock,
    hasSpec: doc.hasSpec,
  };
}

/** The stores' counts for a page of hits, read from PostgreSQL (the index keeps only the chain's total, for ranking). */
export function withHitStock(hits: SearchHit[], stock: Map<string, PartStock>): SearchHit[] {
  return hits.map((hit) => {
    const s = stock.get(hit.partId);
    return s ? { ...hit, stock: { inStock: inStockAnywhere(s), here: s.here, elsewhere: s.elsewhere } } : hit;
  });
}

/** GET /api/search: a shop's technician sees in stock yes/no, not the stores' counts. */
export function presentSearchResults(result: SearchResponse, role: Role): SearchResponse {
  if (role !== 'technician') return result;
  return { ...result, hits: result.hits.map(({ stock: _stock, ...hit }) => hit) };
}
