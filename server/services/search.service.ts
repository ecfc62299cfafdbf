import type { DataSource } from 'typeorm';
import type { CompatSettings } from '../../shared/compat';
import { looksLikePartNumber, normalizePartNumber } from '../../shared/part-number';
import type { SearchHit, SearchQuery, SearchResponse } from '../../shared/schemas/search';
import { FACET_ATTRIBUTES, type PartDocument } from '../search/part-document';
import { buildFilters } from '../search/filters';
import { matchReason } from '../search/match-reason';
import type { PartSearchIndex } from '../search/search-index';
import { interchangeVerdict } from './compat/interchange-verdict.service';

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
/** Interchange hits carry the verdict of the claim, so a wrong row shows as no-go at the counter. */
async function withInterchangeChecks(ds: DataSource, hits: SearchHit[], settings: CompatSettings): Promise<SearchHit[]> {
  return Promise.all(
    hits.map(async (h) => {
      if (h.matchedBy !== 'interchange' || !h.matchedNumber) return h;
      const rows = (await ds.query(
        `SELECT (SELECT fp.id FROM part fp JOIN brand fb ON fb.id = fp.brand_id
                  WHERE fp.part_number_norm = i.foreign_number_norm AND lower(fb.name) = lower(i.foreign_brand) LIMIT 1) AS original_part_id
           FROM interchange i WHERE i.foreign_number_norm = $1 AND i.part_id = $2 LIMIT 1`,
        [h.matchedNumber, h.partId],
      )) as { original_part_id: string | null }[];
      const check = await interchangeVerdict(
        ds,
        { foreignNumberNorm: h.matchedNumber, originalPartId: rows[0]?.original_part_id ?? null, partId: h.partId },
        settings,
      );
      return {
        ...h,
        check: check && {
          verdict: check.verdict,
          engine: check.engine,
          concerns: check.concerns.map((c) => ({ id: c.id, verdict: c.verdict, reason: c.reason })),
        },
      };
    }),
  );
}

export async function searchParts(
  index: PartSearchIndex,
  query: SearchQuery,
  ds: DataSource,
  settings: CompatSettings,
): Promise<SearchResponse> {
  const filter = buildFilters(query);
  const base = { filter, facets: FACET_ATTRIBUTES, limit: query.limit, offset: query.offset };
  const raw = query.q.trim();
  let res = await index.index.search(looksLikePartNumber(raw) ? normalizePartNumber(raw) : raw, base);
  if (res.hits.length === 0 && looksLikePartNumber(raw)) res = await index.index.search(raw, base);
  return {
    hits: await withInterchangeChecks(
      ds,
      res.hits.map((d) => toHit(d, raw)),
      settings,
    ),
    total: res.estimatedTotalHits ?? res.hits.length,
    facets: res.facetDistribution ?? {},
  };
}
