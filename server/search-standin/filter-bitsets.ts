/**
 * The search-side filter: the same language and rules as filter-evaluator.ts (which the document
 * routes keep using), evaluated to a bitset of matching documents over the index's field columns.
 * Each comparison is evaluated over the column's distinct values first, then once over the
 * documents, and cached until the next write, so `current = true` on every query costs a lookup.
 */
import { andInto, orInto, resized, type Bitset } from './bitset';
import type { FieldColumn, FieldStore } from './field-store';
import { checkAttribute, prepare, RANGE_OPERATORS, type FilterContext, type PreparedValue } from './filter-evaluator';
import { parseFilter, type FilterNode } from './filter-parser';
import type { FilterableRule } from './index-settings';
import { foldFacetValue } from './text-tokens';

/** Evaluates to the matching live documents; the result may be shared and must not be modified. */
export type BitsetFilter = (store: FieldStore) => Bitset;

type CodeTest = (isNumber: boolean, folded: string, number: number) => boolean;

function equalsTest(value: PreparedValue): CodeTest {
  const target = value.number;
  return (isNumber, folded, number) => (target !== null && number === target) || (!isNumber && folded === value.folded);
}

function compareTest(operator: '>' | '>=' | '<' | '<=', value: PreparedValue): CodeTest {
  const test = (left: number | string, right: number | string): boolean => {
    switch (operator) {
      case '>':
        return left > right;
      case '>=':
        return left >= right;
      case '<':
        return left < right;
      case '<=':
        return left <= right;
    }
  };
  if (value.number !== null) {
    const bound = value.number;
    return (_isNumber, _folded, number) => !Number.isNaN(number) && test(number, bound);
  }
  // Meilisearch compares strings lexicographically when the bound is not a number.
  return (isNumber, folded) => !isNumber && test(folded, value.folded);
}

function rangeTest(from: PreparedValue, to: PreparedValue): CodeTest {
  if (from.number !== null && to.number !== null) {
    const low = from.number;
    const high = to.number;
    return (_isNumber, _folded, number) => number >= low && number <= high;
  }
  return (isNumber, folded) => !isNumber && folded >= from.folded && folded <= to.folded;
}

/** A leaf over one column, cached in the store under `key`. */
function leaf(attribute: string, key: string, evaluate: (column: FieldColumn, capacity: number) => Bitset): BitsetFilter {
  const cacheKey = `${attribute}\u0000${key}`;
  return (store) => store.cached(cacheKey, () => evaluate(store.column(attribute), store.size));
}

function byValues(attribute: string, key: string, test: CodeTest): BitsetFilter {
  return leaf(attribute, key, (column, capacity) => column.documentsWithCodes(column.codesWhere(test), capacity));
}

function compile(node: FilterNode, context: FilterContext): BitsetFilter {
  switch (node.kind) {
    case 'and': {
      const parts = node.children.map((child) => compile(child, context));
      return (store) => {
        const out = resized((parts[0] as BitsetFilter)(store), store.size);
        for (let i = 1; i < parts.length; i++) andInto(out, (parts[i] as BitsetFilter)(store));
        return out;
      };
    }
    case 'or': {
      const parts = node.children.map((child) => compile(child, context));
      return (store) => {
        const out = resized((parts[0] as BitsetFilter)(store), store.size);
        for (let i = 1; i < parts.length; i++) orInto(out, (parts[i] as BitsetFilter)(store));
        return out;
      };
    }
    case 'not': {
      const inner = compile(node.child, context);
      return (store) => store.complement(inner(store));
    }
    case 'compare': {
      const { attribute, operator } = node;
      checkAttribute(context, attribute, RANGE_OPERATORS.has(operator));
      const value = prepare(node.value);
      const key = JSON.stringify(['=', value]);
      if (operator === '=') return byValues(attribute, key, equalsTest(value));
      if (operator === '!=') {
        const equal = byValues(attribute, key, equalsTest(value));
        return (store) => store.complement(equal(store));
      }
      return byValues(attribute, JSON.stringify([operator, value]), compareTest(operator, value));
    }
    case 'range': {
      const { attribute } = node;
      checkAttribute(context, attribute, true);
      const from = prepare(node.from);
      const to = prepare(node.to);
      return byValues(attribute, JSON.stringify(['TO', from, to]), rangeTest(from, to));
    }
    case 'in': {
      const { attribute } = node;
      checkAttribute(context, attribute, false);
      const values = node.values.map(prepare);
      const tests = values.map(equalsTest);
      return byValues(attribute, JSON.stringify(['IN', values]), (isNumber, folded, number) =>
        tests.some((test) => test(isNumber, folded, number)),
      );
    }
    case 'exists':
    case 'isNull':
    case 'isEmpty': {
      const { attribute, kind } = node;
      checkAttribute(context, attribute, false);
      return leaf(attribute, kind, (column, capacity) => column.documentsWithFlag(kind, capacity));
    }
    case 'contains': {
      const { attribute } = node;
      checkAttribute(context, attribute, false);
      const needle = foldFacetValue(node.value);
      return byValues(attribute, JSON.stringify(['CONTAINS', needle]), (isNumber, folded) => !isNumber && folded.includes(needle));
    }
    case 'startsWith': {
      const { attribute } = node;
      checkAttribute(context, attribute, false);
      const needle = foldFacetValue(node.value);
      return byValues(attribute, JSON.stringify(['STARTS WITH', needle]), (isNumber, folded) => !isNumber && folded.startsWith(needle));
    }
  }
}

/** Compiled filters by source, per filterable-rules object (replaced on every settings change). */
const compiledFilters = new WeakMap<readonly FilterableRule[], Map<string, BitsetFilter | null>>();
const MAX_COMPILED_FILTERS = 512;

/**
 * Parses and compiles a filter (checking its attributes); null when there is nothing to filter on.
 * The app sends the same few filters all day, so compiled ones are kept (invalid ones are not).
 */
export function compileBitsetFilter(filter: unknown, rules: readonly FilterableRule[]): BitsetFilter | null {
  if (filter === undefined || filter === null) return null;
  const source = typeof filter === 'string' ? filter : JSON.stringify(filter);
  const key = typeof filter === 'string' ? `s${source}` : `a${source}`;
  let compiled = compiledFilters.get(rules);
  if (!compiled) {
    compiled = new Map();
    compiledFilters.set(rules, compiled);
  }
  const known = compiled.get(key);
  if (known !== undefined) return known;
  const node = parseFilter(filter);
  let result: BitsetFilter | null = null;
  if (node) {
    const evaluate = compile(node, { source, rules });
    // A leaf's bitset only holds live documents that have the value; `and`/`or` of them too.
    result = (store) => {
      const bits = evaluate(store);
      if (bits.length === store.live.length) return bits;
      const out = resized(bits, store.size);
      andInto(out, store.live);
      return out;
    };
  }
  if (compiled.size >= MAX_COMPILED_FILTERS) compiled.clear();
  compiled.set(key, result);
  return result;
}
