/**
 * One search over one index: text matching (per query term, with Meilisearch's matching
 * strategies), filtering, facets, ranking and pagination, answered in Meilisearch's response shape.
 *
 * Filters are bitsets over document numbers (filter-bitsets.ts), facets are counted from field
 * columns (field-store.ts), text candidates are kept in typed arrays, and without sort criteria
 * the page is picked by a bounded heap over packed ranking keys: RankedCandidate objects are only
 * made for the hits returned, unless sorting or distinct needs them for every candidate.
 */
import { countBits, createBitset, hasBit, listBits, setBit, type Bitset } from './bitset';
import { factsOf, type DocumentRecord } from './document-record';
import { matchesAttributePattern, pickAttributes, type JsonObject } from './field-paths';
import { computeFacets, resolveFacetNames, type FacetDocuments, type FacetResult } from './facets';
import { compileBitsetFilter, type BitsetFilter } from './filter-bitsets';
import { formatHit, type MatchedWords } from './highlight';
import { isFilterableAttribute } from './index-settings';
import { badRequest } from './meili-error';
import {
  buildComparator,
  packedRanking,
  packRank,
  parseSortCriteria,
  selectBest,
  selectTopPacked,
  type CandidateComparator,
  type PackedRanking,
  type RankedCandidate,
} from './ranking';
import { DEFAULT_SEARCH_LIMIT, type SearchRequest } from './search-request';
import type { StandinIndex } from './standin-index';
import { matchedWordsOf, type TermMatches } from './text-index';
import { MAX_QUERY_WORDS, tokenize } from './text-tokens';
import { typoBudget } from './typo-distance';

interface Window {
  offset: number;
  /** Index one past the last hit to return, already capped by maxTotalHits. */
  end: number;
}

/** Documents matching the query terms and the filter, in the order the first term met them. */
interface TextCandidates {
  count: number;
  slots: Int32Array;
  seqs: Int32Array;
  level: Uint8Array;
  typos: Uint8Array;
  attributeRank: Uint8Array;
  exactWords: Uint8Array;
  score: Float64Array;
  /** Packed ranking keys, when the ranking rules allow them. */
  keys: Int32Array | null;
  /** The same documents as a bitset, when facets are asked for. */
  bits: Bitset | null;
  /** What every term matched, when highlighting is asked for. */
  matchedWords: MatchedWords | null;
}

const ENDS_WITH_SEPARATOR = /[^\p{L}\p{N}]$/u;

/**
 * Per-search typed arrays as large as the result set, reused from one search to the next (a
 * search runs start to end without yielding): allocating a megabyte of them per query kept the
 * garbage collector busy.
 */
const scratchArrays = new Map<string, Int32Array | Uint8Array | Float64Array>();

function scratch<A extends Int32Array | Uint8Array | Float64Array>(name: string, length: number, make: (size: number) => A): A {
  const held = scratchArrays.get(name) as A | undefined;
  if (held && held.length >= length) return held;
  const created = make(Math.max(length, 1024, 2 * (held?.length ?? 0)));
  scratchArrays.set(name, created);
  return created;
}

const int32s = (size: number): Int32Array => new Int32Array(size);
const uint8s = (size: number): Uint8Array => new Uint8Array(size);
const float64s = (size: number): Float64Array => new Float64Array(size);

function placeholderCandidate(record: DocumentRecord): RankedCandidate {
  return { record, level: 0, typos: 0, attributeRank: 0, exactWords: 0, score: 0 };
}

function matchTerms(
  index: StandinIndex,
  request: SearchRequest,
  terms: string[],
  filterBits: Bitset | null,
  wantBits: boolean,
  packed: PackedRanking | null,
): TextCandidates {
  const settings = index.resolved;
  const text = index.text();
  const budgetRules = {
    enabled: settings.typoEnabled,
    oneTypoMinLength: settings.oneTypoMinLength,
    twoTyposMinLength: settings.twoTyposMinLength,
    disableOnWords: settings.typoDisabledWords,
    disableOnNumbers: settings.typoDisabledOnNumbers,
  };
  // The last word is still being typed unless the query ends with a separator.
  const lastIsPrefix = settings.prefixSearch && !ENDS_WITH_SEPARATOR.test(request.q);
  const searchOn = request.attributesToSearchOn;
  if (searchOn) {
    const searchable = text.fields;
    for (const attribute of searchOn) {
      if (!searchable.includes(attribute)) {
        throw badRequest(
          'invalid_search_attributes_to_search_on',
          `Attribute \`${attribute}\` is not searchable. Available searchable attributes are: \`${searchable.join(', ')}\`.`,
        );
      }
    }
  }
  const matches: TermMatches[] = terms.map((term, i) =>
    text.termHits({
      term,
      asPrefix: lastIsPrefix && i === terms.length - 1,
      budget: typoBudget(term, budgetRules),
      fields: searchOn,
    }),
  );

  // Terms are dropped from the end ("last") or most frequent first ("frequency"); a document
  // ranks by how many terms it matches in that order, and must match at least the first.
  const order = terms.map((_, i) => i);
  if (request.matchingStrategy === 'frequency') order.sort((a, b) => (matches[a]?.count ?? 0) - (matches[b]?.count ?? 0));
  const required = request.matchingStrategy === 'all' ? terms.length : 1;
  const driver = matches[order[0] as number] as TermMatches;

  const capacity = driver.count;
  const found: TextCandidates = {
    count: 0,
    slots: scratch('slots', capacity, int32s),
    seqs: scratch('seqs', capacity, int32s),
    level: scratch('level', capacity, uint8s),
    typos: scratch('typos', capacity, uint8s),
    attributeRank: scratch('attributeRank', capacity, uint8s),
    exactWords: scratch('exactWords', capacity, uint8s),
    score: scratch('score', capacity, float64s),
    keys: packed ? scratch('keys', capacity, int32s) : null,
    bits: wantBits ? createBitset(index.fieldStore.size) : null,
    matchedWords: null,
  };
  const foundBits = found.bits;
  // The other terms are joined through slot -> entry maps; the driver is walked directly.
  const others = order.slice(1).map((i) => matches[i] as TermMatches);
  text.withEntryMaps(others, (maps) => {
    // Each other term is looked up once per document; its entry serves the rules and the score.
    const entries = new Int32Array(others.length);
    // For the score every matched term counts, summed in query order: where each term's entry is.
    const driverIndex = order[0] as number;
    const entryOfTerm = matches.map((_, t) => (t === driverIndex ? -1 : order.indexOf(t) - 1));
    const seqOfSlot = text.slotSeqs;
    const keys = found.keys;
    for (let i = 0; i < driver.count; i++) {
      const slot = driver.slots[i] as number;
      const seq = seqOfSlot[slot] as number;
      if (seq < 0 || (filterBits && !hasBit(filterBits, seq))) continue;
      for (let k = 0; k < others.length; k++) entries[k] = (maps[k] as Int32Array)[slot] as number;
      let level = 1;
      let typos = driver.typos[i] as number;
      let attributeRank = driver.attributeRank[i] as number;
      let exactWords = driver.exact[i] as number;
      for (let k = 0; k < others.length; k++) {
        const entry = entries[k] as number;
        if (entry < 0) break;
        const match = others[k] as TermMatches;
        level++;
        typos += match.typos[entry] as number;
        const rank = match.attributeRank[entry] as number;
        if (rank < attributeRank) attributeRank = rank;
        exactWords += match.exact[entry] as number;
      }
      if (level < required) continue;
      let score = 0;
      for (let t = 0; t < matches.length; t++) {
        const k = entryOfTerm[t] as number;
        if (k < 0) score += driver.score[i] as number;
        else {
          const entry = entries[k] as number;
          if (entry >= 0) score += (others[k] as TermMatches).score[entry] as number;
        }
      }
      const n = found.count++;
      found.slots[n] = slot;
      found.seqs[n] = seq;
      if (foundBits) setBit(foundBits, seq);
      found.level[n] = level;
      found.typos[n] = typos;
      found.attributeRank[n] = attributeRank;
      found.exactWords[n] = exactWords;
      found.score[n] = score;
      if (keys && packed) keys[n] = packRank(packed, level, typos, attributeRank, exactWords);
    }
  });
  // Matched words are only spelled out for highlighting: a fuzzy term meets hundreds of words.
  if (request.formattedAttributes && request.highlightAttributes) {
    const prefixes: string[] = [];
    for (const match of matches) if (match.prefix !== null) prefixes.push(match.prefix);
    found.matchedWords = { words: matchedWordsOf(matches), prefixes };
  }
  return found;
}

function candidateAt(index: StandinIndex, found: TextCandidates, i: number): RankedCandidate {
  return {
    record: index.text().recordAt(found.slots[i] as number) as DocumentRecord,
    level: found.level[i] as number,
    typos: found.typos[i] as number,
    attributeRank: found.attributeRank[i] as number,
    exactWords: found.exactWords[i] as number,
    score: found.score[i] as number,
  };
}

function distinctKey(record: DocumentRecord, attribute: string): string | null {
  const facts = factsOf(record, attribute);
  const first = facts.strings[0] ?? (facts.numbers[0] === undefined ? undefined : String(facts.numbers[0]));
  return first ?? null;
}

function rankingScore(candidate: RankedCandidate, termCount: number): number {
  // An approximation of Meilisearch's score: words matter most, then typos, attribute, exactness.
  if (termCount === 0) return 1;
  const words = candidate.level / termCount;
  const typos = 1 - Math.min(candidate.typos, 2 * termCount) / (2 * termCount + 1);
  const attribute = 1 / (1 + candidate.attributeRank);
  const exactness = candidate.exactWords / termCount;
  return Math.round((0.6 * words + 0.2 * typos + 0.1 * attribute + 0.1 * exactness) * 1e4) / 1e4;
}

function retrievedAttributes(request: SearchRequest, displayed: string[] | null): string[] | null {
  const asked = request.attributesToRetrieve;
  if (!asked || asked.includes('*')) return displayed;
  if (!displayed) return asked;
  return asked.filter((attribute) => displayed.some((shown) => matchesAttributePattern(attribute, shown)));
}

interface RankedPage {
  /** The best results up to the end of the requested page, in order. */
  ranked: RankedCandidate[];
  total: number;
  facets: FacetResult | null;
  matchedWords: MatchedWords | null;
}

interface SearchPlan {
  index: StandinIndex;
  request: SearchRequest;
  terms: string[];
  filter: BitsetFilter | null;
  facetNames: string[] | null;
  distinct: string | null;
  compare: CandidateComparator;
  /** Set when ranking needs no sort keys: candidates then compare without objects. */
  packed: PackedRanking | null;
  window: Window;
}

function facetsOver(index: StandinIndex, facetNames: string[] | null, documents: FacetDocuments): FacetResult | null {
  return facetNames ? computeFacets(index.fieldStore, documents, facetNames, index.resolved) : null;
}

/** The documents of a bitset, ascending, listed only if a facet needs them listed. */
function documentsOfBits(bits: Bitset, total: number): FacetDocuments {
  let listed: Int32Array | null = null;
  return {
    count: total,
    bits,
    ascending: true,
    list: () => {
      if (!listed) {
        listed = scratch('seqs', total, int32s);
        listBits(bits, listed, total);
      }
      return listed;
    },
  };
}

/**
 * A placeholder search takes the filter's documents in result order (insertion order, or a cached
 * sorted order) up to the page's end; the total is the filter's size.
 */
function rankPlaceholder({ index, request, filter, facetNames, compare, window }: SearchPlan): RankedPage {
  const settings = index.resolved;
  const store = index.fieldStore;
  const bits = filter ? filter(store) : store.live;
  const total = countBits(bits);
  const ranked: RankedCandidate[] = [];
  if (request.sort.length === 0 && !settings.rankingRules.some((rule) => rule.includes(':'))) {
    const page = new Int32Array(Math.min(window.end, total));
    const n = listBits(bits, page);
    for (let i = 0; i < n; i++) ranked.push(placeholderCandidate(index.bySeq.get(page[i] as number) as DocumentRecord));
  } else if (window.end > 0) {
    const ordered = index.orderedRecords(JSON.stringify([settings.rankingRules, request.sort]), () =>
      [...index.records.values()]
        .map(placeholderCandidate)
        .sort(compare)
        .map((candidate) => candidate.record),
    );
    for (const record of ordered) {
      if (!hasBit(bits, record.seq)) continue;
      ranked.push(placeholderCandidate(record));
      if (ranked.length >= window.end) break;
    }
  }
  const facets = facetsOver(index, facetNames, documentsOfBits(bits, total));
  return { ranked, total, facets, matchedWords: null };
}

/** Every other search ranks all its candidates, keeping only the best up to the page's end. */
function rankCandidates({ index, terms, request, filter, facetNames, distinct, compare, packed, window }: SearchPlan): RankedPage {
  const store = index.fieldStore;
  const bits = filter ? filter(store) : null;
  let all: RankedCandidate[];
  let matchedWords: MatchedWords | null = null;
  let facets: FacetResult | null;
  if (terms.length === 0) {
    const live = bits ?? store.live;
    const documents = documentsOfBits(live, countBits(live));
    const seqs = documents.list();
    all = [];
    for (let i = 0; i < documents.count; i++) all.push(placeholderCandidate(index.bySeq.get(seqs[i] as number) as DocumentRecord));
    facets = facetsOver(index, facetNames, documents);
  } else {
    const fast = packed && !distinct ? packed : null;
    const found = matchTerms(index, request, terms, bits, facetNames !== null && facetNames.length > 0, fast);
    matchedWords = found.matchedWords;
    facets = facetsOver(index, facetNames, { count: found.count, list: () => found.seqs, bits: found.bits, ascending: false });
    if (found.keys) {
      const best = selectTopPacked(found.count, window.end, found.keys, found.score, found.seqs);
      return { ranked: best.map((i) => candidateAt(index, found, i)), total: found.count, facets, matchedWords };
    }
    all = [];
    for (let i = 0; i < found.count; i++) all.push(candidateAt(index, found, i));
  }
  if (!distinct) return { ranked: selectBest(all, window.end, compare), total: all.length, facets, matchedWords };
  // Distinct keeps the best document per value, so everything has to be ranked first.
  const seen = new Set<string>();
  const unique = [...all].sort(compare).filter((candidate) => {
    const key = distinctKey(candidate.record, distinct);
    if (key === null) return true;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
  return { ranked: unique.slice(0, window.end), total: unique.length, facets, matchedWords };
}

export function runSearch(index: StandinIndex, request: SearchRequest): JsonObject {
  const started = performance.now();
  const settings = index.resolved;
  const sortCriteria = parseSortCriteria(request.sort, settings.sortableAttributes, settings.rankingRules);
  const facetNames = request.facets ? resolveFacetNames(request.facets, settings, index.fields) : null;
  const filter = compileBitsetFilter(request.filter, settings.filterableRules);
  if (request.distinct !== null && !isFilterableAttribute(request.distinct, settings)) {
    throw badRequest(
      'invalid_search_distinct',
      `Attribute \`${request.distinct}\` is not filterable and thus, cannot be used as distinct attribute.`,
    );
  }
  const distinct = request.distinct ?? settings.distinctAttribute;
  const terms = tokenize(request.q).slice(0, MAX_QUERY_WORDS);

  const finitePagination = request.page !== null || request.hitsPerPage !== null;
  const hitsPerPage = request.hitsPerPage ?? DEFAULT_SEARCH_LIMIT;
  const page = request.page ?? 1;
  const offset = finitePagination ? Math.max(0, (page - 1) * hitsPerPage) : request.offset;
  const limit = finitePagination ? (page === 0 ? 0 : hitsPerPage) : request.limit;
  const window: Window = { offset, end: Math.min(offset + limit, settings.maxTotalHits) };

  const plan: SearchPlan = {
    index,
    request,
    terms,
    filter,
    facetNames,
    distinct,
    compare: buildComparator(settings.rankingRules, sortCriteria, terms.length > 0),
    packed: packedRanking(settings.rankingRules, sortCriteria),
    window,
  };
  const { ranked, total, facets, matchedWords } = terms.length === 0 && !distinct ? rankPlaceholder(plan) : rankCandidates(plan);

  const retrieve = retrievedAttributes(request, settings.displayedAttributes);
  const highlightAll = request.highlightAttributes?.includes('*') ?? false;
  // A whole document with nothing added is answered as stored: it is only serialised, so the copy
  // pickAttributes makes (a spread of every field, per hit) is not needed.
  const asStored = retrieve === null && !request.formattedAttributes && !request.showRankingScore;
  const hits = ranked.slice(window.offset, window.end).map((candidate) => {
    if (asStored) return candidate.record.doc;
    const hit = pickAttributes(candidate.record.doc, retrieve);
    if (request.formattedAttributes) {
      hit._formatted = formatHit(hit, request.highlightAttributes ? matchedWords : null, {
        attributes: highlightAll ? null : request.highlightAttributes,
        preTag: request.highlightPreTag,
        postTag: request.highlightPostTag,
      });
    }
    if (request.showRankingScore) hit._rankingScore = rankingScore(candidate, terms.length);
    return hit;
  });

  const capped = Math.min(total, settings.maxTotalHits);
  const processingTimeMs = Math.round(performance.now() - started);
  const body: JsonObject = finitePagination
    ? {
        hits,
        query: request.q,
        processingTimeMs,
        hitsPerPage,
        page,
        totalPages: hitsPerPage === 0 ? 0 : Math.ceil(capped / hitsPerPage),
        totalHits: capped,
      }
    : { hits, query: request.q, processingTimeMs, limit: request.limit, offset: request.offset, estimatedTotalHits: capped };
  if (facets) {
    body.facetDistribution = facets.facetDistribution;
    body.facetStats = facets.facetStats;
  }
  return body;
}
