import { looksLikePartNumber, normalizePartNumber } from '../../shared/part-number';
import type { SearchHit, SearchQuery, SearchResponse } from '../../shared/schemas/search';
import { FACET_ATTRIBUTES, type PartDocument } from '../search/part-document';
import { buildFilters } from '../search/filters';
import { matchReason } from '../search/match-reason';
import type { PartSearchIndex } from '../search/search-index';

function toHit(doc: PartDocument, q: string): SearchHit {
  return {
    partId: doc.id,
    brand: doc.brand,
    partNumber: doc.partNumber,
    kind: doc.kind,
    description: doc.description,
    ...matchReason(doc, q),
    inStock: doc.inStock,
    onHand: doc.onHand,
    hasSpec: doc.hasSpec,
  };
}

/**
 * The Counter's one search box: a number (ours, another brand's, a superseded one — with dashes,
 * spaces, any case, a typo), a scanned GTIN, or free text; plus the spec facets.
 * A number is searched in its normalised form first; free text when that finds nothing.
 */
export async function searchParts(index: PartSearchIndex, query: SearchQuery): Promise<SearchResponse> {
  const filter = buildFilters(query);
  const base = { filter, facets: FACET_ATTRIBUTES, limit: query.limit, offset: query.offset };
  const raw = query.q.trim();
  let res = await index.index.search(looksLikePartNumber(raw) ? normalizePartNumber(raw) : raw, base);
  if (res.hits.length === 0 && looksLikePartNumber(raw)) res = await index.index.search(raw, base);
  return {
    hits: res.hits.map((d) => toHit(d, raw)),
    total: res.estimatedTotalHits ?? res.hits.length,
    facets: res.facetDistribution ?? {},
  };
}
