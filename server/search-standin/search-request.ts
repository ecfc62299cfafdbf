/** Reads a search body (POST /search, one entry of /multi-search) into a checked request. */
import { isJsonObject } from './field-paths';
import { badRequest, type MeiliError } from './meili-error';

export type MatchingStrategy = 'last' | 'all' | 'frequency';

export interface SearchRequest {
  q: string;
  filter: unknown;
  facets: string[] | null;
  sort: string[];
  limit: number;
  offset: number;
  page: number | null;
  hitsPerPage: number | null;
  attributesToRetrieve: string[] | null;
  /** Attributes to build `_formatted` for; null when no `_formatted` was asked for. */
  formattedAttributes: string[] | null;
  highlightAttributes: string[] | null;
  highlightPreTag: string;
  highlightPostTag: string;
  matchingStrategy: MatchingStrategy;
  showRankingScore: boolean;
  attributesToSearchOn: string[] | null;
  distinct: string | null;
}

export const DEFAULT_SEARCH_LIMIT = 20;

function invalid(param: string, message: string): MeiliError {
  const snake = param.replace(/[A-Z]/g, (letter) => `_${letter.toLowerCase()}`);
  return badRequest(`invalid_search_${snake}`, `Invalid value type at \`.${param}\`: ${message}`);
}

function readCount(body: Record<string, unknown>, param: string, minimum: number): number | null {
  const value = body[param];
  if (value === undefined || value === null) return null;
  if (typeof value !== 'number' || !Number.isInteger(value) || value < minimum) {
    throw invalid(param, `expected a positive integer, but found \`${JSON.stringify(value)}\`.`);
  }
  return value;
}

function readStringList(body: Record<string, unknown>, param: string): string[] | null {
  const value = body[param];
  if (value === undefined || value === null) return null;
  if (!Array.isArray(value) || !value.every((item) => typeof item === 'string')) {
    throw invalid(param, `expected an array of strings, but found \`${JSON.stringify(value)}\`.`);
  }
  return value;
}

function readString(body: Record<string, unknown>, param: string, fallback: string): string {
  const value = body[param];
  if (value === undefined || value === null) return fallback;
  if (typeof value !== 'string') throw invalid(param, `expected a string, but found \`${JSON.stringify(value)}\`.`);
  return value;
}

export function readSearchRequest(body: unknown): SearchRequest {
  const source = body === undefined || body === null ? {} : body;
  if (!isJsonObject(source)) throw badRequest('bad_request', 'Invalid value type: expected an object.');
  const strategy = readString(source, 'matchingStrategy', 'last');
  if (strategy !== 'last' && strategy !== 'all' && strategy !== 'frequency') {
    throw invalid('matchingStrategy', `expected one of \`last\`, \`all\`, \`frequency\`, found \`${strategy}\`.`);
  }
  const highlight = readStringList(source, 'attributesToHighlight');
  const crop = readStringList(source, 'attributesToCrop');
  const formatted =
    highlight || crop ? [...(highlight ?? []), ...(crop ?? [])].map((attribute) => attribute.split(':')[0] ?? attribute) : null;
  const showRankingScore = source.showRankingScore;
  if (showRankingScore !== undefined && typeof showRankingScore !== 'boolean') {
    throw invalid('showRankingScore', 'expected a boolean.');
  }
  const distinct = source.distinct;
  if (distinct !== undefined && distinct !== null && typeof distinct !== 'string') throw invalid('distinct', 'expected a string.');
  const filter = source.filter;
  if (filter !== undefined && filter !== null && typeof filter !== 'string' && !Array.isArray(filter)) {
    throw badRequest('invalid_search_filter', 'Invalid syntax for the filter parameter: `expected String, Array`.');
  }
  return {
    q: readString(source, 'q', ''),
    filter,
    facets: readStringList(source, 'facets'),
    sort: readStringList(source, 'sort') ?? [],
    limit: readCount(source, 'limit', 0) ?? DEFAULT_SEARCH_LIMIT,
    offset: readCount(source, 'offset', 0) ?? 0,
    page: readCount(source, 'page', 0),
    hitsPerPage: readCount(source, 'hitsPerPage', 0),
    attributesToRetrieve: readStringList(source, 'attributesToRetrieve'),
    formattedAttributes: formatted,
    highlightAttributes: highlight,
    highlightPreTag: readString(source, 'highlightPreTag', '<em>'),
    highlightPostTag: readString(source, 'highlightPostTag', '</em>'),
    matchingStrategy: strategy,
    showRankingScore: showRankingScore === true,
    attributesToSearchOn: readStringList(source, 'attributesToSearchOn'),
    distinct: typeof distinct === 'string' ? distinct : null,
  };
}
