import type { Role } from '../../shared/roles';
import type { SearchHit, SearchResponse } from '../../shared/schemas/search';
import { matchReason } from '../search/match-reason';
import type { PartDocument } from '../search/part-document';

/** A document of the search index as a hit: why it matched, and the stock the index holds. */
export function presentSearchHit(doc: PartDocument, q: string): SearchHit {
  return {
    partId: doc.id,
    brand: doc.brand,
    partNumber: doc.partNumber,
    kind: doc.kind,
    description: doc.description,
    ...matchReason(doc, q),
    inStock: doc.inStock,
    onHand: doc.onHand,
    bin: doc.bin,
    hasSpec: doc.hasSpec,
  };
}

/** GET /api/search: a shop's technician sees in stock yes/no, not the store's count or bin. */
export function presentSearchResults(result: SearchResponse, role: Role): SearchResponse {
  if (role !== 'technician') return result;
  return { ...result, hits: result.hits.map(({ onHand: _onHand, bin: _bin, ...hit }) => hit) };
}
