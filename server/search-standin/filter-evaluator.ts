/**
 * Turns a parsed filter into a predicate over stored documents, after checking every attribute
 * against filterableAttributes as Meilisearch does. An array field matches when any element does;
 * `!=` and `NOT` also match documents that lack the field, as in Meilisearch.
 */
import { factsOf, type DocumentRecord } from './document-record';
import type { FieldFacts } from './field-paths';
import { matchesAttributePattern } from './field-paths';
import { filterError, parseFilter, type FilterNode } from './filter-parser';
import type { FilterableRule } from './index-settings';
import { foldFacetValue } from './text-tokens';

export type DocumentPredicate = (record: DocumentRecord) => boolean;

export interface PreparedValue {
  folded: string;
  number: number | null;
}

export function prepare(value: string): PreparedValue {
  const trimmed = value.trim();
  const number = trimmed === '' ? Number.NaN : Number(trimmed);
  return { folded: foldFacetValue(value), number: Number.isFinite(number) ? number : null };
}

function equals(facts: FieldFacts, value: PreparedValue): boolean {
  if (value.number !== null && facts.numbers.includes(value.number)) return true;
  return facts.strings.includes(value.folded);
}

function compares(facts: FieldFacts, operator: '>' | '>=' | '<' | '<=', value: PreparedValue): boolean {
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
    return facts.numbers.some((number) => test(number, bound));
  }
  // Meilisearch compares strings lexicographically when the bound is not a number.
  return facts.strings.some((text) => test(text, value.folded));
}

function inRange(facts: FieldFacts, from: PreparedValue, to: PreparedValue): boolean {
  if (from.number !== null && to.number !== null) {
    const low = from.number;
    const high = to.number;
    return facts.numbers.some((number) => number >= low && number <= high);
  }
  return facts.strings.some((text) => text >= from.folded && text <= to.folded);
}

export const RANGE_OPERATORS = new Set(['>', '>=', '<', '<=']);

export interface FilterContext {
  source: string;
  rules: readonly FilterableRule[];
}

export function checkAttribute(context: FilterContext, attribute: string, needsComparison: boolean): void {
  const rule = context.rules.find((candidate) => candidate.patterns.some((pattern) => matchesAttributePattern(attribute, pattern)));
  if (!rule || !rule.equality) {
    const available = context.rules.flatMap((candidate) => candidate.patterns);
    const listing =
      available.length === 0
        ? 'This index does not have configured filterable attributes.'
        : `Available filterable attribute patterns are: ${available.map((pattern) => `\`${pattern}\``).join(', ')}.`;
    throw filterError(context.source, `Attribute \`${attribute}\` is not filterable. ${listing}`);
  }
  if (needsComparison && !rule.comparison) {
    throw filterError(
      context.source,
      `Filter operator is not allowed for the attribute \`${attribute}\`: comparison is disabled in its filterableAttributes rule.`,
    );
  }
}

function compile(node: FilterNode, context: FilterContext): DocumentPredicate {
  switch (node.kind) {
    case 'and': {
      const parts = node.children.map((child) => compile(child, context));
      return (record) => parts.every((part) => part(record));
    }
    case 'or': {
      const parts = node.children.map((child) => compile(child, context));
      return (record) => parts.some((part) => part(record));
    }
    case 'not': {
      const inner = compile(node.child, context);
      return (record) => !inner(record);
    }
    case 'compare': {
      const { attribute, operator } = node;
      checkAttribute(context, attribute, RANGE_OPERATORS.has(operator));
      const value = prepare(node.value);
      if (operator === '=') return (record) => equals(factsOf(record, attribute), value);
      if (operator === '!=') return (record) => !equals(factsOf(record, attribute), value);
      return (record) => compares(factsOf(record, attribute), operator, value);
    }
    case 'range': {
      const { attribute } = node;
      checkAttribute(context, attribute, true);
      const from = prepare(node.from);
      const to = prepare(node.to);
      return (record) => inRange(factsOf(record, attribute), from, to);
    }
    case 'in': {
      const { attribute } = node;
      checkAttribute(context, attribute, false);
      const values = node.values.map(prepare);
      return (record) => {
        const facts = factsOf(record, attribute);
        return values.some((value) => equals(facts, value));
      };
    }
    case 'exists': {
      const { attribute } = node;
      checkAttribute(context, attribute, false);
      return (record) => factsOf(record, attribute).exists;
    }
    case 'isNull': {
      const { attribute } = node;
      checkAttribute(context, attribute, false);
      return (record) => factsOf(record, attribute).isNull;
    }
    case 'isEmpty': {
      const { attribute } = node;
      checkAttribute(context, attribute, false);
      return (record) => factsOf(record, attribute).isEmpty;
    }
    case 'contains': {
      const { attribute } = node;
      checkAttribute(context, attribute, false);
      const needle = foldFacetValue(node.value);
      return (record) => factsOf(record, attribute).strings.some((text) => text.includes(needle));
    }
    case 'startsWith': {
      const { attribute } = node;
      checkAttribute(context, attribute, false);
      const needle = foldFacetValue(node.value);
      return (record) => factsOf(record, attribute).strings.some((text) => text.startsWith(needle));
    }
  }
}

/** Parses and compiles a filter; null when there is nothing to filter on. */
export function compileFilter(filter: unknown, rules: readonly FilterableRule[]): DocumentPredicate | null {
  const node = parseFilter(filter);
  if (!node) return null;
  const source = typeof filter === 'string' ? filter : JSON.stringify(filter);
  return compile(node, { source, rules });
}
