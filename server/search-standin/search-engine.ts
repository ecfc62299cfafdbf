/**
 * One search over one index: text matching (per query term, with Meilisearch's matching
 * strategies), filtering, facets, ranking and pagination, answered in Meilisearch's response shape.
 */
import { factsOf, type DocumentRecord } from './document-record';
import { matchesAttributePattern, pickAttributes, type JsonObject } from './field-paths';
import { computeFacets, resolveFacetNames, type FacetResult } from './facets';
import { compileFilter, type DocumentPredicate } from './filter-evaluator';
import { formatHit, type MatchedWords } from './highlight';
import { isFilterableAttribute } from './index-settings';
import { badRequest } from './meili-error';
import { buildComparator, parseSortCriteria, selectBest, type CandidateComparator, type RankedCandidate } from './ranking';
import { DEFAULT_SEARCH_LIMIT, type SearchRequest } from './search-request';
import type { StandinIndex } from './standin-index';
import type { TermMatches } from './text-index';
import { MAX_QUERY_WORDS, tokenize } from './text-tokens';
import { typoBudget } from './typo-distance';

interface Window {
  offset: number;
  /** Index one past the last hit to return, already capped by maxTotalHits. */
  end: number;
}

interface Candidates {
  /** All matching documents, in no particular order. */
  all: RankedCandidate[];
  /** What every term matched, for highlighting. */
  matchedWords: MatchedWords;
}

const ENDS_WITH_SEPARATOR = /[^\p{L}\p{N}]$/u;

function placeholderCandidate(record: DocumentRecord): RankedCandidate {
  return { record, level: 0, typos: 0, attributeRank: 0, exactWords: 0, score: 0 };
}

function matchTerms(index: StandinIndex, request: SearchRequest, terms: string[], predicate: DocumentPredicate | null): Candidates {
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
  if (request.matchingStrategy === 'frequency') order.sort((a, b) => (matches[a]?.slots.length ?? 0) - (matches[b]?.slots.length ?? 0));
  const ordered = order.map((i) => matches[i] as TermMatches);
  const required = request.matchingStrategy === 'all' ? terms.length : 1;

  const all: RankedCandidate[] = [];
  for (const slot of ordered[0]?.slots ?? []) {
    const record = text.recordAt(slot);
    if (!record || (predicate && !predicate(record))) continue;
    let level = 0;
    let typos = 0;
    let attributeRank = Number.MAX_SAFE_INTEGER;
    let exactWords = 0;
    for (const match of ordered) {
      const termTypos = match.typos[slot] as number;
      if (termTypos < 0) break;
      level++;
      typos += termTypos;
      attributeRank = Math.min(attributeRank, match.attributeRank[slot] as number);
      exactWords += match.exact[slot] as number;
    }
    if (level < required) continue;
    let score = 0;
    for (const match of matches) if ((match.typos[slot] as number) >= 0) score += match.score[slot] as number;
    all.push({ record, level, typos, attributeRank, exactWords, score });
  }
  const words = new Set<string>();
  const prefixes: string[] = [];
  for (const match of matches) {
    for (const word of match.words) words.add(word);
    if (match.prefix !== null) prefixes.push(match.prefix);
  }
  return { all, matchedWords: { words, prefixes } };
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
  predicate: DocumentPredicate | null;
  facetNames: string[] | null;
  distinct: string | null;
  compare: CandidateComparator;
  window: Window;
}

/**
 * A placeholder search walks the records in result order (insertion order, or a cached sorted
 * order) and stops once the page and the capped count are known, unless facets need them all.
 */
function rankPlaceholder({ index, request, predicate, facetNames, compare, window }: SearchPlan): RankedPage {
  const settings = index.resolved;
  const ordered: Iterable<DocumentRecord> =
    request.sort.length === 0 && !settings.rankingRules.some((rule) => rule.includes(':'))
      ? index.records.values()
      : index.orderedRecords(JSON.stringify([settings.rankingRules, request.sort]), () =>
          [...index.records.values()]
            .map(placeholderCandidate)
            .sort(compare)
            .map((candidate) => candidate.record),
        );
  const ranked: RankedCandidate[] = [];
  const facetRecords: DocumentRecord[] = [];
  let total = 0;
  for (const record of ordered) {
    if (predicate && !predicate(record)) continue;
    if (total < window.end) ranked.push(placeholderCandidate(record));
    total++;
    if (facetNames) facetRecords.push(record);
    else if (total >= settings.maxTotalHits) break;
  }
  const facets = facetNames ? computeFacets(facetRecords, facetNames, settings) : null;
  return { ranked, total, facets, matchedWords: null };
}

/** Every other search ranks all its candidates, keeping only the best up to the page's end. */
function rankCandidates({ index, request, terms, predicate, facetNames, distinct, compare, window }: SearchPlan): RankedPage {
  let all: RankedCandidate[];
  let matchedWords: MatchedWords | null = null;
  if (terms.length === 0) {
    all = [];
    for (const record of index.records.values()) if (!predicate || predicate(record)) all.push(placeholderCandidate(record));
  } else {
    const matched = matchTerms(index, request, terms, predicate);
    all = matched.all;
    matchedWords = matched.matchedWords;
  }
  const facets = facetNames
    ? computeFacets(
        all.map((candidate) => candidate.record),
        facetNames,
        index.resolved,
      )
    : null;
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
  const predicate = compileFilter(request.filter, settings.filterableRules);
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
    predicate,
    facetNames,
    distinct,
    compare: buildComparator(settings.rankingRules, sortCriteria, terms.length > 0),
    window,
  };
  const { ranked, total, facets, matchedWords } = terms.length === 0 && !distinct ? rankPlaceholder(plan) : rankCandidates(plan);

  const retrieve = retrievedAttributes(request, settings.displayedAttributes);
  const highlightAll = request.highlightAttributes?.includes('*') ?? false;
  const hits = ranked.slice(window.offset, window.end).map((candidate) => {
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
