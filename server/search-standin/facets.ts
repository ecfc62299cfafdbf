/**
 * facetDistribution and facetStats over the whole filtered result set (not just the page), as
 * Meilisearch computes them: each document counts once per distinct value, strings are grouped
 * case-insensitively, stats cover numeric values only.
 */
import { factsOf, type DocumentRecord } from './document-record';
import type { FieldFacts } from './field-paths';
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

/** Counts of one facet: strings by folded value (first spelling kept), numbers by value. */
class FacetCounter {
  readonly strings = new Map<string, ValueCount>();
  readonly numbers = new Map<number, number>();
  min = Number.POSITIVE_INFINITY;
  max = Number.NEGATIVE_INFINITY;
  private readonly seen = new Set<string | number>();

  add(facts: FieldFacts): void {
    for (const number of facts.numbers) {
      if (number < this.min) this.min = number;
      if (number > this.max) this.max = number;
    }
    const { strings, jsonNumbers } = facts;
    // Most fields hold one value; only several values need de-duplicating within the document.
    const single = strings.length + jsonNumbers.length === 1;
    if (!single) this.seen.clear();
    strings.forEach((folded, i) => {
      if (!single) {
        if (this.seen.has(folded)) return;
        this.seen.add(folded);
      }
      const entry = this.strings.get(folded);
      if (entry) entry.count++;
      else this.strings.set(folded, { label: facts.displayStrings[i] ?? folded, count: 1, number: null });
    });
    for (const number of jsonNumbers) {
      if (!single) {
        if (this.seen.has(number)) continue;
        this.seen.add(number);
      }
      this.numbers.set(number, (this.numbers.get(number) ?? 0) + 1);
    }
  }

  values(): ValueCount[] {
    const values = [...this.strings.values()];
    for (const [number, count] of this.numbers) values.push({ label: String(number), count, number });
    return values;
  }
}

export function computeFacets(records: readonly DocumentRecord[], names: readonly string[], settings: ResolvedSettings): FacetResult {
  const facetDistribution: Record<string, Record<string, number>> = {};
  const facetStats: Record<string, FacetStats> = {};
  for (const name of names) {
    const counter = new FacetCounter();
    for (const record of records) counter.add(factsOf(record, name));
    const order = settings.sortFacetValuesBy[name] ?? settings.sortFacetValuesBy['*'] ?? 'alpha';
    const values = counter.values().sort(order === 'count' ? (a, b) => b.count - a.count || alphaOrder(a, b) : alphaOrder);
    const distribution: Record<string, number> = {};
    for (const value of values.slice(0, settings.maxValuesPerFacet))
      distribution[value.label] = (distribution[value.label] ?? 0) + value.count;
    facetDistribution[name] = distribution;
    if (counter.min <= counter.max) facetStats[name] = { min: counter.min, max: counter.max };
  }
  return { facetDistribution, facetStats };
}
