/**
 * Ordering of search results by the index's rankingRules, in their order: words (how many query
 * terms matched), typo, attribute, sort, exactness and custom `field:asc|desc` rules. Proximity
 * is not modelled. Ties fall to the BM25 text score, then to insertion order, so results are
 * stable.
 */
import { factsOf, type DocumentRecord } from './document-record';
import { badRequest } from './meili-error';

export interface RankedCandidate {
  record: DocumentRecord;
  /** Number of query terms matched under the matching strategy. */
  level: number;
  typos: number;
  attributeRank: number;
  exactWords: number;
  score: number;
  /** Values of the sort criteria, read once per search when first compared. */
  sortKeys?: SortKey[];
}

export interface SortCriterion {
  attribute: string;
  descending: boolean;
}

export type CandidateComparator = (a: RankedCandidate, b: RankedCandidate) => number;

export function parseSortCriteria(sort: readonly string[], sortable: readonly string[], rankingRules: readonly string[]): SortCriterion[] {
  if (sort.length > 0 && !rankingRules.includes('sort')) {
    throw badRequest(
      'invalid_search_sort',
      'You must specify where `sort` is listed in the rankingRules setting to use the sort parameter at search time.',
    );
  }
  return sort.map((entry) => {
    const match = /^(.+):(asc|desc)$/.exec(entry);
    if (!match) {
      throw badRequest(
        'invalid_search_sort',
        `Invalid syntax for the sort parameter: expected expression ending by \`:asc\` or \`:desc\`, found \`${entry}\`.`,
      );
    }
    const attribute = match[1] as string;
    if (attribute.startsWith('_geo')) throw badRequest('invalid_search_sort', 'Geo sorting is not supported by the search stand-in.');
    if (!sortable.some((field) => field === attribute || field === '*' || attribute.startsWith(`${field}.`))) {
      const available =
        sortable.length === 0
          ? 'This index does not have configured sortable attributes.'
          : `Available sortable attributes are: \`${sortable.join(', ')}\`.`;
      throw badRequest('invalid_search_sort', `Attribute \`${attribute}\` is not sortable. ${available}`);
    }
    return { attribute, descending: match[2] === 'desc' };
  });
}

export type SortKey = number | string | null;

/** Arrays sort by their smallest value ascending and their largest descending. */
function sortKey(record: DocumentRecord, criterion: SortCriterion): SortKey {
  const facts = factsOf(record, criterion.attribute);
  const pick = criterion.descending ? Math.max : Math.min;
  if (facts.numbers.length > 0) return facts.numbers.length === 1 ? (facts.numbers[0] as number) : pick(...facts.numbers);
  if (facts.strings.length === 0) return null;
  let chosen = facts.strings[0] as string;
  for (const text of facts.strings) if (criterion.descending ? text > chosen : text < chosen) chosen = text;
  return chosen;
}

/** Numbers come before strings and missing values come last, whatever the direction. */
function compareKeys(a: SortKey, b: SortKey, descending: boolean): number {
  if (a === b) return 0;
  if (a === null) return 1;
  if (b === null) return -1;
  if (typeof a !== typeof b) return typeof a === 'number' ? -1 : 1;
  const order = a < b ? -1 : 1;
  return descending ? -order : order;
}

/**
 * The comparator for one search. Text rules (words, typo, attribute, exactness, BM25) only apply
 * when there is a query; a placeholder search orders by sort and custom rules, then insertion.
 */
export function buildComparator(rankingRules: readonly string[], sort: readonly SortCriterion[], hasQuery: boolean): CandidateComparator {
  const criteria: SortCriterion[] = [];
  const steps: CandidateComparator[] = [];
  const keysOf = (candidate: RankedCandidate): SortKey[] =>
    (candidate.sortKeys ??= criteria.map((criterion) => sortKey(candidate.record, criterion)));
  const byCriterion = (criterion: SortCriterion): CandidateComparator => {
    const position = criteria.push(criterion) - 1;
    return (a, b) => compareKeys(keysOf(a)[position] ?? null, keysOf(b)[position] ?? null, criterion.descending);
  };
  for (const rule of rankingRules) {
    switch (rule) {
      case 'words':
        if (hasQuery) steps.push((a, b) => b.level - a.level);
        break;
      case 'typo':
        if (hasQuery) steps.push((a, b) => a.typos - b.typos);
        break;
      case 'attribute':
        if (hasQuery) steps.push((a, b) => a.attributeRank - b.attributeRank);
        break;
      case 'exactness':
        if (hasQuery) steps.push((a, b) => b.exactWords - a.exactWords);
        break;
      case 'sort':
        steps.push(...sort.map(byCriterion));
        break;
      case 'proximity':
        break;
      default: {
        const custom = /^(.+):(asc|desc)$/.exec(rule);
        if (custom) steps.push(byCriterion({ attribute: custom[1] as string, descending: custom[2] === 'desc' }));
      }
    }
  }
  if (hasQuery) steps.push((a, b) => b.score - a.score);
  steps.push((a, b) => a.record.seq - b.record.seq);
  return (a, b) => {
    for (const step of steps) {
      const order = step(a, b);
      if (order !== 0) return order;
    }
    return 0;
  };
}

/**
 * The best `count` items in order. A bounded heap keeps this O(n log count): only the first
 * maxTotalHits results can ever be paged to, so a 100,000-document sort never sorts everything.
 */
export function selectBest<T>(items: readonly T[], count: number, compare: (a: T, b: T) => number): T[] {
  if (count <= 0) return [];
  if (items.length <= count * 2) return [...items].sort(compare).slice(0, count);
  // Max-heap on "worse": the root is the worst of the kept items.
  const heap: T[] = [];
  const worse = (i: number, j: number): boolean => compare(heap[i] as T, heap[j] as T) > 0;
  const swap = (i: number, j: number): void => {
    const held = heap[i] as T;
    heap[i] = heap[j] as T;
    heap[j] = held;
  };
  const siftDown = (start: number): void => {
    let i = start;
    for (;;) {
      const left = 2 * i + 1;
      const right = left + 1;
      let top = i;
      if (left < heap.length && worse(left, top)) top = left;
      if (right < heap.length && worse(right, top)) top = right;
      if (top === i) return;
      swap(i, top);
      i = top;
    }
  };
  for (const item of items) {
    if (heap.length < count) {
      heap.push(item);
      let i = heap.length - 1;
      while (i > 0) {
        const parent = (i - 1) >> 1;
        if (!worse(i, parent)) break;
        swap(i, parent);
        i = parent;
      }
    } else if (compare(item, heap[0] as T) < 0) {
      heap[0] = item;
      siftDown(0);
    }
  }
  return heap.sort(compare);
}
