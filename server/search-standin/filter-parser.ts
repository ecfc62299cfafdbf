/**
 * Parser for Meilisearch's filter language: comparisons (`=`, `!=`, `>`, `>=`, `<`, `<=`),
 * `a TO b` ranges, `IN [..]`, `EXISTS`, `IS NULL`, `IS EMPTY`, `CONTAINS`, `STARTS WITH`, each
 * negatable, combined with NOT > AND > OR and parentheses. Values are bare words or quoted with
 * single or double quotes (backslash escapes the quote).
 */
import { badRequest, type MeiliError } from './meili-error';

export type CompareOperator = '=' | '!=' | '>' | '>=' | '<' | '<=';

export type FilterNode =
  | { kind: 'and'; children: FilterNode[] }
  | { kind: 'or'; children: FilterNode[] }
  | { kind: 'not'; child: FilterNode }
  | { kind: 'compare'; attribute: string; operator: CompareOperator; value: string }
  | { kind: 'range'; attribute: string; from: string; to: string }
  | { kind: 'in'; attribute: string; values: string[] }
  | { kind: 'exists'; attribute: string }
  | { kind: 'isNull'; attribute: string }
  | { kind: 'isEmpty'; attribute: string }
  | { kind: 'contains'; attribute: string; value: string }
  | { kind: 'startsWith'; attribute: string; value: string };

type TokenKind = '(' | ')' | '[' | ']' | ',' | 'operator' | 'word' | 'quoted' | 'end';

interface Token {
  kind: TokenKind;
  text: string;
  start: number;
  end: number;
}

const OPERATOR_CHARS = new Set(['=', '!', '>', '<']);
const PUNCTUATION = new Set(['(', ')', '[', ']', ',']);

export function filterError(source: string, message: string, start = 0, end = source.length): MeiliError {
  return badRequest('invalid_search_filter', `${message}\n${start + 1}:${end + 1} ${source}`);
}

function lex(source: string): Token[] {
  const tokens: Token[] = [];
  let i = 0;
  while (i < source.length) {
    const char = source.charAt(i);
    if (/\s/.test(char)) {
      i++;
    } else if (PUNCTUATION.has(char)) {
      tokens.push({ kind: char as TokenKind, text: char, start: i, end: i + 1 });
      i++;
    } else if (OPERATOR_CHARS.has(char)) {
      const two = source.slice(i, i + 2);
      const text = two === '!=' || two === '>=' || two === '<=' ? two : char;
      if (text === '!') throw filterError(source, 'Found unexpected `!`: did you mean `!=`?', i, i + 1);
      tokens.push({ kind: 'operator', text, start: i, end: i + text.length });
      i += text.length;
    } else if (char === '"' || char === "'") {
      let text = '';
      let j = i + 1;
      while (j < source.length && source.charAt(j) !== char) {
        if (source.charAt(j) === '\\' && j + 1 < source.length) j++;
        text += source.charAt(j);
        j++;
      }
      if (j >= source.length) throw filterError(source, `Expression is missing the closing \`${char}\`.`, i, j);
      tokens.push({ kind: 'quoted', text, start: i, end: j + 1 });
      i = j + 1;
    } else {
      let j = i;
      while (j < source.length) {
        const c = source.charAt(j);
        if (/\s/.test(c) || PUNCTUATION.has(c) || OPERATOR_CHARS.has(c) || c === '"' || c === "'") break;
        j++;
      }
      tokens.push({ kind: 'word', text: source.slice(i, j), start: i, end: j });
      i = j;
    }
  }
  tokens.push({ kind: 'end', text: '', start: source.length, end: source.length });
  return tokens;
}

class FilterParser {
  private position = 0;

  constructor(
    private readonly source: string,
    private readonly tokens: Token[],
  ) {}

  parse(): FilterNode {
    const node = this.parseOr();
    const next = this.peek();
    if (next.kind !== 'end') {
      throw this.error(
        `Found unexpected characters at the end of the filter: \`${this.source.slice(next.start)}\`. You probably forgot an \`OR\` or an \`AND\` rule.`,
        next,
      );
    }
    return node;
  }

  private peek(offset = 0): Token {
    return this.tokens[Math.min(this.position + offset, this.tokens.length - 1)] as Token;
  }

  private take(): Token {
    const token = this.peek();
    if (token.kind !== 'end') this.position++;
    return token;
  }

  private isKeyword(token: Token, keyword: string): boolean {
    return token.kind === 'word' && token.text.toUpperCase() === keyword;
  }

  private error(message: string, token: Token): MeiliError {
    return filterError(this.source, message, token.start, token.end);
  }

  private parseOr(): FilterNode {
    const children = [this.parseAnd()];
    while (this.isKeyword(this.peek(), 'OR')) {
      this.take();
      children.push(this.parseAnd());
    }
    return children.length === 1 ? (children[0] as FilterNode) : { kind: 'or', children };
  }

  private parseAnd(): FilterNode {
    const children = [this.parseNot()];
    while (this.isKeyword(this.peek(), 'AND')) {
      this.take();
      children.push(this.parseNot());
    }
    return children.length === 1 ? (children[0] as FilterNode) : { kind: 'and', children };
  }

  private parseNot(): FilterNode {
    if (this.isKeyword(this.peek(), 'NOT')) {
      this.take();
      return { kind: 'not', child: this.parseNot() };
    }
    return this.parsePrimary();
  }

  private parsePrimary(): FilterNode {
    const token = this.peek();
    if (token.kind === '(') {
      this.take();
      const inner = this.parseOr();
      const closing = this.take();
      if (closing.kind !== ')') throw this.error('Expression `(` is missing the closing `)`.', closing);
      return inner;
    }
    return this.parseCondition();
  }

  private value(what: string): string {
    const token = this.take();
    if (token.kind === 'word' || token.kind === 'quoted') return token.text;
    throw this.error(`Was expecting ${what} but instead got ${token.kind === 'end' ? 'nothing' : `\`${token.text}\``}.`, token);
  }

  private parseCondition(): FilterNode {
    const attributeToken = this.peek();
    if (attributeToken.kind !== 'word' && attributeToken.kind !== 'quoted') {
      throw this.error('Was expecting an attribute name.', attributeToken);
    }
    this.take();
    const attribute = attributeToken.text;
    if (attribute.startsWith('_geo')) {
      throw this.error(
        'Geo filters (`_geoRadius`, `_geoBoundingBox`, `_geoPolygon`) are not supported by the search stand-in.',
        attributeToken,
      );
    }
    const next = this.peek();
    if (next.kind === 'operator') {
      this.take();
      return { kind: 'compare', attribute, operator: next.text as CompareOperator, value: this.value('a value') };
    }
    if (this.isKeyword(next, 'IN')) {
      this.take();
      return { kind: 'in', attribute, values: this.parseList() };
    }
    if (this.isKeyword(next, 'EXISTS')) {
      this.take();
      return { kind: 'exists', attribute };
    }
    if (this.isKeyword(next, 'IS')) {
      this.take();
      const negated = this.isKeyword(this.peek(), 'NOT');
      if (negated) this.take();
      const what = this.take();
      let node: FilterNode;
      if (this.isKeyword(what, 'NULL')) node = { kind: 'isNull', attribute };
      else if (this.isKeyword(what, 'EMPTY')) node = { kind: 'isEmpty', attribute };
      else throw this.error('Was expecting `NULL` or `EMPTY` after `IS`.', what);
      return negated ? { kind: 'not', child: node } : node;
    }
    if (this.isKeyword(next, 'NOT')) {
      this.take();
      return { kind: 'not', child: this.parseNegatableOperation(attribute) };
    }
    const positive = this.tryNegatableOperation(attribute);
    if (positive) return positive;
    if ((next.kind === 'word' || next.kind === 'quoted') && this.isKeyword(this.peek(1), 'TO')) {
      this.take();
      this.take();
      return { kind: 'range', attribute, from: next.text, to: this.value('a value after `TO`') };
    }
    throw this.error(
      'Was expecting an operation `=`, `!=`, `>=`, `>`, `<=`, `<`, `IN`, `NOT IN`, `TO`, `EXISTS`, `NOT EXISTS`, `IS NULL`, `IS NOT NULL`, `IS EMPTY`, `IS NOT EMPTY`, `CONTAINS`, `NOT CONTAINS`, `STARTS WITH` or `NOT STARTS WITH`.',
      next,
    );
  }

  /** The operations that may follow `attr NOT`. */
  private parseNegatableOperation(attribute: string): FilterNode {
    const next = this.peek();
    if (this.isKeyword(next, 'IN')) {
      this.take();
      return { kind: 'in', attribute, values: this.parseList() };
    }
    if (this.isKeyword(next, 'EXISTS')) {
      this.take();
      return { kind: 'exists', attribute };
    }
    const operation = this.tryNegatableOperation(attribute);
    if (operation) return operation;
    throw this.error('Was expecting `IN`, `EXISTS`, `CONTAINS` or `STARTS WITH` after `NOT`.', next);
  }

  private tryNegatableOperation(attribute: string): FilterNode | null {
    const next = this.peek();
    if (this.isKeyword(next, 'CONTAINS')) {
      this.take();
      return { kind: 'contains', attribute, value: this.value('a value') };
    }
    if (this.isKeyword(next, 'STARTS') && this.isKeyword(this.peek(1), 'WITH')) {
      this.take();
      this.take();
      return { kind: 'startsWith', attribute, value: this.value('a value') };
    }
    return null;
  }

  private parseList(): string[] {
    const open = this.take();
    if (open.kind !== '[') throw this.error('Expected `[` after `IN` keyword.', open);
    const values: string[] = [];
    if (this.peek().kind === ']') {
      this.take();
      return values;
    }
    for (;;) {
      values.push(this.value('a value in the `IN` list'));
      const separator = this.take();
      if (separator.kind === ']') return values;
      if (separator.kind !== ',') throw this.error('Expected matching `]` after the list of values.', separator);
    }
  }
}

export function parseFilterString(source: string): FilterNode | null {
  if (source.trim() === '') return null;
  return new FilterParser(source, lex(source)).parse();
}

/** A filter as the API takes it: a string, or an array (outer AND) of strings or string arrays (OR). */
export function parseFilter(filter: unknown): FilterNode | null {
  if (filter === undefined || filter === null) return null;
  if (typeof filter === 'string') return parseFilterString(filter);
  if (!Array.isArray(filter)) {
    throw badRequest('invalid_search_filter', 'Invalid syntax for the filter parameter: `expected String, Array`.');
  }
  const conjuncts: FilterNode[] = [];
  for (const item of filter) {
    if (typeof item === 'string') {
      const node = parseFilterString(item);
      if (node) conjuncts.push(node);
    } else if (Array.isArray(item)) {
      const disjuncts: FilterNode[] = [];
      for (const inner of item) {
        if (typeof inner !== 'string') {
          throw badRequest('invalid_search_filter', 'Invalid value in the filter array: only strings and arrays of strings are accepted.');
        }
        const node = parseFilterString(inner);
        if (node) disjuncts.push(node);
      }
      if (disjuncts.length === 1) conjuncts.push(disjuncts[0] as FilterNode);
      else if (disjuncts.length > 1) conjuncts.push({ kind: 'or', children: disjuncts });
    } else {
      throw badRequest('invalid_search_filter', 'Invalid value in the filter array: only strings and arrays of strings are accepted.');
    }
  }
  if (conjuncts.length === 0) return null;
  return conjuncts.length === 1 ? (conjuncts[0] as FilterNode) : { kind: 'and', children: conjuncts };
}
