/**
 * facetDistribution and facetStats over the whole filtered result set (not just the page), as
 * Meilisearch computes them: each document counts once per distinct value, strings are grouped
 * case-insensitively, stats cover numeric values only.
 */
import { countAnd, firstOfAnd, wordsFor, type Bitset } from './bitset';
import { MANY_VALUES, type FieldColumn, type FieldStore } from './field-store';
import { isFilterableAttribute, type ResolvedSettings } from './index-settings';
import { badRequest } from './meili-error';

export interface FacetStats {
  min: number;
  max: number;
}

export interface FacetResult {
  facetDistribution: Record<string, Record<string, number>>;
  facetStats: Record<string, FacetStats>;
}

/** Expands `*` and checks every facet is filterable (invalid_search_facets otherwise). */
export function resolveFacetNames(requested: readonly string[], settings: ResolvedSettings, knownFields: readonly string[]): string[] {
  const names: string[] = [];
  for (const name of requested) {
    if (name === '*') {
      const explicit = settings.filterableRules.flatMap((rule) => rule.patterns).filter((pattern) => !pattern.includes('*'));
      for (const field of new Set([...explicit, ...knownFields])) {
        if (isFilterableAttribute(field, settings) && !names.includes(field)) names.push(field);
      }
    } else if (isFilterableAttribute(name, settings)) {
      if (!names.includes(name)) names.push(name);
    } else {
      const patterns = settings.filterableRules.flatMap((rule) => rule.patterns);
      const listing =
        patterns.length === 0
          ? 'this index does not have configured filterable attributes.'
          : `available facets are: ${patterns.map((pattern) => `\`${pattern}\``).join(', ')}.`;
      throw badRequest('invalid_search_facets', `Invalid facet distribution: Attribute \`${name}\` is not filterable. The ${listing}`);
    }
  }
  return names;
}

interface ValueCount {
  label: string;
  count: number;
  number: number | null;
}

/** Alphabetical facet order: numbers ascending first, then strings. */
function alphaOrder(a: ValueCount, b: ValueCount): number {
  if (a.number !== null && b.number !== null) return a.number - b.number;
  if (a.number !== null) return -1;
  if (b.number !== null) return 1;
  const left = a.label.toLowerCase();
  const right = b.label.toLowerCase();
  return left < right ? -1 : left > right ? 1 : 0;
}

/**
 * The documents to count facets over: as a list (in the order the search met them, which decides
 * a multi-spelled value's label) and, where the search has it, as a bitset.
 */
export interface FacetDocuments {
  count: number;
  /** The documents in order; materialised only if some facet walks them. */
  list: () => Int32Array;
  bits: Bitset | null;
  /** True when `list` is in ascending document order (placeholder searches). */
  ascending: boolean;
}

/** Per group: how many of the documents hold it, and the code of the first one to (its label). */
interface GroupCounts {
  counts: Int32Array;
  firstCode: Int32Array;
}

function countByDocuments(column: FieldColumn, seqs: Int32Array, count: number): GroupCounts {
  const groupCount = column.groupCount;
  const counts = new Int32Array(groupCount);
  const firstCode = new Int32Array(groupCount);
  const { single, many, codeGroup } = column;
  for (let i = 0; i < count; i++) {
    const seq = seqs[i] as number;
    const code = single[seq] as number;
    if (code >= 0) {
      const group = codeGroup[code] as number;
      if ((counts[group] as number) === 0) firstCode[group] = code;
      counts[group] = (counts[group] as number) + 1;
    } else if (code === MANY_VALUES) {
      const codes = many[seq] as Int32Array;
      for (let k = 0; k < codes.length; k++) {
        const each = codes[k] as number;
        const group = codeGroup[each] as number;
        if ((counts[group] as number) === 0) firstCode[group] = each;
        counts[group] = (counts[group] as number) + 1;
      }
    }
  }
  return { counts, firstCode };
}

/** Counts as popcounts of (documents AND value's documents); labels as countByDocuments gives them. */
function countByBitsets(column: FieldColumn, groupBits: Bitset[], bits: Bitset): GroupCounts {
  const groupCount = column.groupCount;
  const counts = new Int32Array(groupCount);
  const firstCode = new Int32Array(groupCount);
  for (let group = 0; group < groupCount; group++) {
    const own = groupBits[group] as Bitset;
    const hits = countAnd(bits, own);
    counts[group] = hits;
    if (hits === 0) continue;
    if ((column.groupSpellings[group] as number) === 1) {
      firstCode[group] = column.groupFirstCode[group] as number;
      continue;
    }
    // Several spellings: the label is the spelling of the first document (in ascending order).
    const seq = firstOfAnd(bits, own);
    const code = column.single[seq] as number;
    if (code >= 0) firstCode[group] = code;
    else for (const each of column.many[seq] as Int32Array) if (column.codeGroup[each] === group) firstCode[group] = each;
  }
  return { counts, firstCode };
}

/**
 * Counts every facet over the documents, each either by walking the field's column (one array
 * read per document) or, for a field of few values when a bitset of the documents is at hand, by
 * one AND-and-popcount per value. A group's label is the spelling of its first document.
 */
export function computeFacets(
  store: FieldStore,
  documents: FacetDocuments,
  names: readonly string[],
  settings: ResolvedSettings,
): FacetResult {
  const facetDistribution: Record<string, Record<string, number>> = {};
  const facetStats: Record<string, FacetStats> = {};
  const words = wordsFor(store.size);
  for (const name of names) {
    const column = store.column(name);
    const groupCount = column.groupCount;
    // A popcount pass costs a word read per 32 documents; a walk a few reads per document.
    const byBits =
      documents.bits !== null && groupCount * words <= 2 * documents.count && (documents.ascending || column.singleSpelled)
        ? column.groupBitsets(store.size)
        : null;
    const { counts, firstCode } =
      byBits && documents.bits
        ? countByBitsets(column, byBits, documents.bits)
        : countByDocuments(column, documents.list(), documents.count);
    const values: ValueCount[] = [];
    let min = Number.POSITIVE_INFINITY;
    let max = Number.NEGATIVE_INFINITY;
    for (let group = 0; group < groupCount; group++) {
      const groupHits = counts[group] as number;
      if (groupHits === 0) continue;
      const number = column.groupNumber[group] as number;
      if (!Number.isNaN(number)) {
        if (number < min) min = number;
        if (number > max) max = number;
      }
      const isNumber = column.groupIsNumber[group] as boolean;
      values.push({ label: column.codeLabel[firstCode[group] as number] as string, count: groupHits, number: isNumber ? number : null });
    }
    const order = settings.sortFacetValuesBy[name] ?? settings.sortFacetValuesBy['*'] ?? 'alpha';
    values.sort(order === 'count' ? (a, b) => b.count - a.count || alphaOrder(a, b) : alphaOrder);
    const distribution: Record<string, number> = {};
    for (const value of values.slice(0, settings.maxValuesPerFacet))
      distribution[value.label] = (distribution[value.label] ?? 0) + value.count;
    facetDistribution[name] = distribution;
    if (min <= max) facetStats[name] = { min, max };
  }
  return { facetDistribution, facetStats };
}
