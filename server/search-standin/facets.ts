/**
 * facetDistribution and facetStats over the whole filtered result set (not just the page), as
 * Meilisearch computes them: each document counts once per distinct value, strings are grouped
 * case-insensitively, stats cover numeric values only.
 */
import { MANY_VALUES, type FieldStore } from './field-store';
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
 * Counts every facet over the documents `seqs[0..count)`, by walking the field's column: one
 * array read per document and facet. A group's label is the spelling of its first document.
 */
export function computeFacets(
  store: FieldStore,
  seqs: Int32Array,
  count: number,
  names: readonly string[],
  settings: ResolvedSettings,
): FacetResult {
  const facetDistribution: Record<string, Record<string, number>> = {};
  const facetStats: Record<string, FacetStats> = {};
  for (const name of names) {
    const column = store.column(name);
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
