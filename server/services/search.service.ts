import type { DataSource } from 'typeorm';
import type { CompatSettings } from '../../shared/compat';
import { looksLikePartNumber, normalizePartNumber } from '../../shared/part-number';
import { FACET_FIELDS, type SearchHit, type SearchQuery, type SearchResponse } from '../../shared/schemas/search';
import { PART_KINDS, type PartKind } from '../../shared/schemas/specs';
import type { Executor } from '../db/executor';
import { readOnly } from '../db/read-only';
import { presentInterchangeCheck } from '../presenters/part.presenter';
import { presentSearchHit, withHitStock } from '../presenters/search.presenter';
import { claimOriginals } from '../repositories/interchange.repository';
import { printedNumbers } from '../repositories/search.repository';
import { claimKey, exactNumberHits, type ClaimOriginals } from '../search/exact-number';
import { stockOf } from '../repositories/stock.repository';
import { buildFilters } from '../search/filters';
import { FACET_ATTRIBUTES } from '../search/part-document';
import type { PartSearchIndex } from '../search/search-index';
import { interchangeVerdict } from './compat/interchange-verdict.service';
import type { Here } from './locations.service';
import { getSettings } from './settings.service';

/** The foreign parts of the index hits' interchange claims: one query for them all. */
async function claimedOriginals(ex: Executor, claims: SearchHit[]): Promise<ClaimOriginals> {
  const rows = await claimOriginals(
    ex,
    claims.map((h) => h.partId),
    claims.map((h) => h.matchedNumber ?? ''),
  );
  return new Map(rows.map((r) => [claimKey(r.part_id, r.foreign_number_norm), r.original_part_id]));
}

/**
 * Interchange hits carry the verdict of the claim, so a wrong row shows as no-go at the counter.
 * `known`: the claims' foreign parts when the caller already has them (the exact-number lookup).
 * A claim whose foreign part the catalog does not hold has no verdict, so without any there is no
 * more work.
 */
async function withInterchangeChecks(
  ds: DataSource,
  hits: SearchHit[],
  settings: CompatSettings,
  engineId: string | undefined,
  known?: ClaimOriginals,
): Promise<SearchHit[]> {
  const claims = hits.filter((h) => h.matchedBy === 'interchange' && h.matchedNumber);
  if (!claims.length || known?.size === 0) return hits;
  return readOnly(ds, async (ex) => {
    const originals = known ?? (await claimedOriginals(ex, claims));
    if (!originals.size) return hits;
    return Promise.all(
      hits.map(async (h) => {
        const originalPartId =
          h.matchedBy === 'interchange' && h.matchedNumber ? originals.get(claimKey(h.partId, h.matchedNumber)) : undefined;
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

/**
 * A close (typo) match names the number it found as that number is printed, not folded: the clerk
 * typed something else, so the folded form would be the only spelling on screen.
 */
async function withPrintedNumbers(ds: DataSource, hits: SearchHit[], typedNorm: string): Promise<SearchHit[]> {
  const close = hits.filter((h) => h.matchedNumber !== null && h.matchedNumber !== typedNorm && h.matchedBy !== 'gtin');
  if (!close.length) return hits;
  const rows = await readOnly(ds, (ex) => printedNumbers(ex, [...new Set(close.map((h) => h.matchedNumber ?? ''))]));
  const printed = new Map(rows.map((r) => [`${r.source}|${r.norm}`, r.printed]));
  return hits.map((h) => {
    if (!close.includes(h)) return h;
    // Our own and superseded numbers are parts; an interchange number is a foreign row's.
    const source = h.matchedBy === 'interchange' ? 'interchange' : 'part';
    const found = h.matchedBy === 'number' ? h.partNumber : printed.get(`${source}|${h.matchedNumber}`);
    return found ? { ...h, matchedPrinted: found } : h;
  });
}

/** How a kind is said at the counter: "pencil coil", "iridium spark plug". */
const KIND_WORDS: Record<PartKind, RegExp> = { coil: /\bcoils?\b/gi, plug: /\b(?:spark\s+)?plugs?\b/gi };

/**
 * A kind named in the words is the kind filter rather than one more word: every coil's text says
 * "coil", so as a word it ranks nothing and makes the engine walk every coil. Not when both kinds
 * are named ("coil on plug" is an architecture) or the words are only the kind.
 */
function kindFromWords(raw: string, kind: PartKind | undefined): { words: string; kind: PartKind | undefined } {
  const named = PART_KINDS.filter((k) => raw.match(KIND_WORDS[k]));
  if (named.length !== 1 || (kind && kind !== named[0])) return { words: raw, kind };
  const words = raw.replace(KIND_WORDS[named[0]!], ' ').replace(/\s+/g, ' ').trim();
  return words ? { words, kind: named[0] } : { words: raw, kind };
}

/**
 * The Counter's one search box: a number (ours, another brand's, a superseded one — with dashes,
 * spaces, any case, a typo), a scanned GTIN, or free text; plus the spec facets.
 * A number is looked up exactly in PostgreSQL first (read-only work, on a replica where there is
 * one); the search index answers typos and free text.
 */
export async function searchParts(index: PartSearchIndex, query: SearchQuery, ds: DataSource, here: Here): Promise<SearchResponse> {
  const result = await searchIndexOrNumber(index, query, ds);
  const ids = result.hits.map((h) => h.partId);
  const stock = await readOnly(ds, async (ex) => stockOf(ex, ids, await here(ex)));
  return { ...result, hits: withHitStock(result.hits, stock) };
}

async function searchIndexOrNumber(index: PartSearchIndex, query: SearchQuery, ds: DataSource): Promise<SearchResponse> {
  const { compat } = await getSettings(ds);
  const raw = query.q.trim();
  const numberLike = looksLikePartNumber(raw);
  const filtered = query.kind !== undefined || FACET_FIELDS.some((f) => query[f] !== undefined);
  if (numberLike && !filtered && query.offset === 0) {
    const exact = await readOnly(ds, (ex) => exactNumberHits(ex, normalizePartNumber(raw), query.limit));
    if (exact.hits.length)
      return {
        hits: await withInterchangeChecks(ds, exact.hits, compat, query.engineId, exact.originals),
        total: exact.hits.length,
        facets: {},
      };
  }
  const said = numberLike ? { words: raw, kind: query.kind } : kindFromWords(raw, query.kind);
  // Facet counts cost a pass over every match: only when the filter controls ask for them.
  const facets = query.facets ? FACET_ATTRIBUTES : [];
  const base = { filter: buildFilters({ ...query, kind: said.kind }), facets, limit: query.limit, offset: query.offset };
  // Every word first (a clerk who types more means fewer parts); only when nothing has them all,
  // Meilisearch's "last" strategy, which drops words from the end. A number is tried folded first.
  const tries: [string, 'all' | 'last'][] = numberLike ? [[normalizePartNumber(raw), 'all']] : [];
  tries.push([said.words, 'all']);
  if (said.words.split(/\s+/).length > 1) tries.push([said.words, 'last']);
  let res = await index.search(tries[0]![0], { ...base, matchingStrategy: tries[0]![1] });
  for (const [q, matchingStrategy] of tries.slice(1)) {
    if (res.hits.length > 0) break;
    res = await index.search(q, { ...base, matchingStrategy });
  }
  const hits = await withPrintedNumbers(
    ds,
    res.hits.map((d) => presentSearchHit(d, raw)),
    normalizePartNumber(raw),
  );
  return {
    hits: await withInterchangeChecks(ds, hits, compat, query.engineId),
    total: res.estimatedTotalHits ?? res.hits.length,
    facets: res.facetDistribution ?? {},
  };
}
