import type { DataSource } from 'typeorm';
import type { CompatSettings } from '../../shared/compat';
import { looksLikePartNumber, normalizePartNumber } from '../../shared/part-number';
import { FACET_FIELDS, type SearchHit, type SearchQuery, type SearchResponse } from '../../shared/schemas/search';
import { readOnly } from '../db/read-only';
import { presentInterchangeCheck } from '../presenters/part.presenter';
import { presentSearchHit } from '../presenters/search.presenter';
import { claimOriginals } from '../repositories/interchange.repository';
import { exactNumberHits } from '../search/exact-number';
import { buildFilters } from '../search/filters';
import { FACET_ATTRIBUTES } from '../search/part-document';
import type { PartSearchIndex } from '../search/search-index';
import { interchangeVerdict } from './compat/interchange-verdict.service';
import { getSettings } from './settings.service';

/** Interchange hits carry the verdict of the claim, so a wrong row shows as no-go at the counter. */
async function withInterchangeChecks(ds: DataSource, hits: SearchHit[], settings: CompatSettings, engineId?: string): Promise<SearchHit[]> {
  const claims = hits.filter((h) => h.matchedBy === 'interchange' && h.matchedNumber);
  if (!claims.length) return hits;
  return readOnly(ds, async (ex) => {
    // One query for every claim's foreign part (where the catalog holds its spec).
    const rows = await claimOriginals(
      ex,
      claims.map((h) => h.partId),
      claims.map((h) => h.matchedNumber ?? ''),
    );
    const originals = new Map(rows.map((r) => [`${r.part_id}|${r.foreign_number_norm}`, r.original_part_id]));
    return Promise.all(
      hits.map(async (h) => {
        const originalPartId = h.matchedBy === 'interchange' ? originals.get(`${h.partId}|${h.matchedNumber}`) : undefined;
        if (!originalPartId || !h.matchedNumber) return h;
        const check = await interchangeVerdict(
          ex,
          { foreignNumberNorm: h.matchedNumber, originalPartId, partId: h.partId },
          settings,
          engineId,
        );
        return { ...h, check: check && presentInterchangeCheck(check) };
      }),
    );
  });
}

/** Facet counts cost time on every hit: all of them for spec search, kind and brand for text, none for a number. */
function facetsFor(query: SearchQuery, numberLike: boolean): string[] {
  const specSearch = query.q.trim() === '' || FACET_FIELDS.some((f) => query[f] !== undefined);
  if (specSearch) return FACET_ATTRIBUTES;
  return numberLike ? [] : ['kind', 'brand'];
}

/**
 * The Counter's one search box: a number (ours, another brand's, a superseded one — with dashes,
 * spaces, any case, a typo), a scanned GTIN, or free text; plus the spec facets.
 * A number is looked up exactly in PostgreSQL first (read-only work, on a replica where there is
 * one); the search index answers typos and free text.
 */
export async function searchParts(index: PartSearchIndex, query: SearchQuery, ds: DataSource): Promise<SearchResponse> {
  const { compat } = await getSettings(ds);
  const raw = query.q.trim();
  const numberLike = looksLikePartNumber(raw);
  const filtered = query.kind !== undefined || FACET_FIELDS.some((f) => query[f] !== undefined);
  if (numberLike && !filtered && query.offset === 0) {
    const exact = await readOnly(ds, (ex) => exactNumberHits(ex, normalizePartNumber(raw), query.limit));
    if (exact.length) return { hits: await withInterchangeChecks(ds, exact, compat, query.engineId), total: exact.length, facets: {} };
  }
  const base = { filter: buildFilters(query), facets: facetsFor(query, numberLike), limit: query.limit, offset: query.offset };
  let res = await index.index.search(numberLike ? normalizePartNumber(raw) : raw, base);
  if (res.hits.length === 0 && numberLike) res = await index.index.search(raw, base);
  return {
    hits: await withInterchangeChecks(
      ds,
      res.hits.map((d) => presentSearchHit(d, raw)),
      compat,
      query.engineId,
    ),
    total: res.estimatedTotalHits ?? res.hits.length,
    facets: res.facetDistribution ?? {},
  };
}
