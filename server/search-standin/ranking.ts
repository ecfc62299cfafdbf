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

/**
 * The fast path of text ranking, when no sort criteria or custom rules apply: the words, typo,
 * attribute and exactness rules, in the index's order, packed into one integer per candidate
 * (smaller is better), so candidates compare as (key, score desc, seq) without objects.
 */
export interface PackedRanking {
  /** Bit offset of each rule's component, -1 when the rule is not listed. */
  words: number;
  typo: number;
  attribute: number;
  exactness: number;
}

/** Component widths: at most 10 query words, 2 typos each, 24 attribute ranks. */
const PACKED_WIDTHS: Record<keyof PackedRanking, number> = { words: 4, typo: 5, attribute: 5, exactness: 4 };
const WORDS_CEILING = 15;

export function packedRanking(rankingRules: readonly string[], sort: readonly SortCriterion[]): PackedRanking | null {
  if (sort.length > 0) return null;
  if (rankingRules.some((rule) => /^(.+):(asc|desc)$/.test(rule))) return null;
  const listed: Array<keyof PackedRanking> = [];
  for (const rule of rankingRules) {
    if ((rule === 'words' || rule === 'typo' || rule === 'attribute' || rule === 'exactness') && !listed.includes(rule)) listed.push(rule);
  }
  const plan: PackedRanking = { words: -1, typo: -1, attribute: -1, exactness: -1 };
  let shift = 0;
  for (let i = listed.length - 1; i >= 0; i--) {
    const rule = listed[i] as keyof PackedRanking;
    plan[rule] = shift;
    shift += PACKED_WIDTHS[rule];
  }
  return plan;
}

export function packRank(plan: PackedRanking, level: number, typos: number, attributeRank: number, exactWords: number): number {
  let key = 0;
  if (plan.words >= 0) key |= (WORDS_CEILING - level) << plan.words;
  if (plan.typo >= 0) key |= Math.min(typos, 31) << plan.typo;
  if (plan.attribute >= 0) key |= Math.min(attributeRank, 31) << plan.attribute;
  if (plan.exactness >= 0) key |= (WORDS_CEILING - exactWords) << plan.exactness;
  return key;
}

/**
 * Indices of the best `count` of `n` candidates, best first: packed key ascending, then score
 * descending, then seq ascending — what buildComparator gives for the same rules. A bounded heap
 * keeps it O(n log count), and most candidates are turned away by one comparison with its root.
 */
export function selectTopPacked(n: number, count: number, key: Int32Array, score: Float64Array, seq: Int32Array): number[] {
  if (count <= 0 || n === 0) return [];
  // a ranks after b
  const worse = (a: number, b: number): boolean => {
    const ka = key[a] as number;
    const kb = key[b] as number;
    if (ka !== kb) return ka > kb;
    const sa = score[a] as number;
    const sb = score[b] as number;
    if (sa !== sb) return sa < sb;
    return (seq[a] as number) > (seq[b] as number);
  };
  const heap: number[] = [];
  for (let i = 0; i < n; i++) {
    if (heap.length < count) {
      heap.push(i);
      let at = heap.length - 1;
      while (at > 0) {
        const parent = (at - 1) >> 1;
        if (!worse(heap[at] as number, heap[parent] as number)) break;
        const held = heap[at] as number;
        heap[at] = heap[parent] as number;
        heap[parent] = held;
        at = parent;
      }
    } else if (worse(heap[0] as number, i)) {
      heap[0] = i;
      let at = 0;
      for (;;) {
        const left = 2 * at + 1;
        const right = left + 1;
        let top = at;
        if (left < heap.length && worse(heap[left] as number, heap[top] as number)) top = left;
        if (right < heap.length && worse(heap[right] as number, heap[top] as number)) top = right;
        if (top === at) break;
        const held = heap[at] as number;
        heap[at] = heap[top] as number;
        heap[top] = held;
        at = top;
      }
    }
  }
  return heap.sort((a, b) => (worse(a, b) ? 1 : worse(b, a) ? -1 : 0));
}
