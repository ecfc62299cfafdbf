/**
 * Index settings as Meilisearch stores and reports them: a full object with defaults, changed by
 * partial updates where `null` resets a key. The search code reads the resolved form, computed
 * once per change instead of on every query.
 */
import { badRequest, type MeiliError } from './meili-error';
import { isJsonObject, matchesAttributePattern, type JsonObject } from './field-paths';
import { foldWord } from './text-tokens';

export const BUILT_IN_RANKING_RULES = ['words', 'typo', 'proximity', 'attribute', 'sort', 'exactness'] as const;

export function defaultSettings(): JsonObject {
  return {
    displayedAttributes: ['*'],
    searchableAttributes: ['*'],
    filterableAttributes: [],
    sortableAttributes: [],
    rankingRules: [...BUILT_IN_RANKING_RULES],
    stopWords: [],
    nonSeparatorTokens: [],
    separatorTokens: [],
    dictionary: [],
    synonyms: {},
    distinctAttribute: null,
    proximityPrecision: 'byWord',
    typoTolerance: {
      enabled: true,
      minWordSizeForTypos: { oneTypo: 5, twoTypos: 9 },
      disableOnWords: [],
      disableOnAttributes: [],
      disableOnNumbers: false,
    },
    faceting: { maxValuesPerFacet: 100, sortFacetValuesBy: { '*': 'alpha' } },
    pagination: { maxTotalHits: 1000 },
    embedders: {},
    searchCutoffMs: null,
    localizedAttributes: null,
    facetSearch: true,
    prefixSearch: 'indexingTime',
  };
}

/** One filterable rule: attribute patterns and whether range operators are allowed on them. */
export interface FilterableRule {
  patterns: string[];
  equality: boolean;
  comparison: boolean;
}

export interface ResolvedSettings {
  /** null means every field (`*`). */
  displayedAttributes: string[] | null;
  searchableAttributes: string[] | null;
  filterableRules: FilterableRule[];
  sortableAttributes: string[];
  rankingRules: string[];
  distinctAttribute: string | null;
  typoEnabled: boolean;
  oneTypoMinLength: number;
  twoTyposMinLength: number;
  typoDisabledWords: Set<string>;
  typoDisabledAttributes: Set<string>;
  typoDisabledOnNumbers: boolean;
  maxValuesPerFacet: number;
  sortFacetValuesBy: Record<string, 'alpha' | 'count'>;
  maxTotalHits: number;
  prefixSearch: boolean;
}

type Validator = (value: unknown, key: string) => void;

function invalid(key: string, message: string): MeiliError {
  const snake = key.replace(/[A-Z]/g, (letter) => `_${letter.toLowerCase()}`);
  return badRequest(`invalid_settings_${snake}`, `Invalid value at \`.${key}\`: ${message}`);
}

const stringList: Validator = (value, key) => {
  if (!Array.isArray(value) || !value.every((item) => typeof item === 'string')) {
    throw invalid(key, 'expected an array of strings.');
  }
};

const rankingRules: Validator = (value, key) => {
  stringList(value, key);
  for (const rule of value as string[]) {
    const builtIn = (BUILT_IN_RANKING_RULES as readonly string[]).includes(rule);
    if (!builtIn && !/^.+:(asc|desc)$/.test(rule)) {
      throw invalid(
        key,
        `\`${rule}\` ranking rule is invalid. Valid ranking rules are words, typo, sort, proximity, attribute, exactness and custom ranking rules.`,
      );
    }
  }
};

const filterable: Validator = (value, key) => {
  if (!Array.isArray(value)) throw invalid(key, 'expected an array.');
  for (const item of value) {
    if (typeof item === 'string') continue;
    const patterns = isJsonObject(item) ? item.attributePatterns : undefined;
    if (!Array.isArray(patterns) || !patterns.every((pattern) => typeof pattern === 'string')) {
      throw invalid(key, 'expected strings or objects with `attributePatterns`.');
    }
  }
};

const objectValue: Validator = (value, key) => {
  if (!isJsonObject(value)) throw invalid(key, 'expected an object.');
};

const VALIDATORS: Record<string, Validator> = {
  displayedAttributes: stringList,
  searchableAttributes: stringList,
  filterableAttributes: filterable,
  sortableAttributes: stringList,
  rankingRules,
  stopWords: stringList,
  nonSeparatorTokens: stringList,
  separatorTokens: stringList,
  dictionary: stringList,
  synonyms: objectValue,
  typoTolerance: objectValue,
  faceting: objectValue,
  pagination: objectValue,
  embedders: objectValue,
  distinctAttribute: (value, key) => {
    if (typeof value !== 'string') throw invalid(key, 'expected a string.');
  },
};

/** Keys whose object value is merged with the stored one rather than replacing it. */
const MERGED_OBJECTS = new Set(['typoTolerance', 'faceting', 'pagination']);

function mergeObject(current: JsonObject, patch: JsonObject, defaults: JsonObject): JsonObject {
  const merged: JsonObject = { ...current };
  for (const [key, value] of Object.entries(patch)) {
    const fallback = defaults[key];
    if (value === null) merged[key] = fallback;
    else if (isJsonObject(value) && isJsonObject(current[key]) && isJsonObject(fallback)) {
      merged[key] = mergeObject(current[key], value, fallback);
    } else merged[key] = value;
  }
  return merged;
}

/** Checks a settings patch before it is queued, as Meilisearch does at request time. */
export function validateSettingsPatch(patch: unknown): JsonObject {
  if (!isJsonObject(patch)) throw badRequest('bad_request', 'Invalid settings payload: expected an object.');
  for (const [key, value] of Object.entries(patch)) {
    if (value === null) continue;
    VALIDATORS[key]?.(value, key);
  }
  return patch;
}

export function applySettingsPatch(current: JsonObject, patch: JsonObject): JsonObject {
  const defaults = defaultSettings();
  const next: JsonObject = { ...current };
  for (const [key, value] of Object.entries(patch)) {
    const fallback = defaults[key];
    if (value === null) next[key] = fallback ?? null;
    else if (MERGED_OBJECTS.has(key) && isJsonObject(value) && isJsonObject(current[key]) && isJsonObject(fallback)) {
      next[key] = mergeObject(current[key], value, fallback);
    } else next[key] = value;
  }
  return next;
}

function readStrings(value: unknown): string[] {
  return Array.isArray(value) ? value.filter((item): item is string => typeof item === 'string') : [];
}

function readNumber(value: unknown, fallback: number): number {
  return typeof value === 'number' && Number.isFinite(value) ? value : fallback;
}

function starMeansAll(list: string[]): string[] | null {
  return list.includes('*') ? null : list;
}

function readFilterableRules(value: unknown): FilterableRule[] {
  if (!Array.isArray(value)) return [];
  const rules: FilterableRule[] = [];
  for (const item of value) {
    if (typeof item === 'string') {
      rules.push({ patterns: [item], equality: true, comparison: true });
    } else if (isJsonObject(item)) {
      const features = isJsonObject(item.features) ? item.features : {};
      const filter = isJsonObject(features.filter) ? features.filter : {};
      rules.push({
        patterns: readStrings(item.attributePatterns),
        // Meilisearch's defaults for an object rule: equality on, comparison off.
        equality: filter.equality !== false,
        comparison: filter.comparison === true,
      });
    }
  }
  return rules;
}

export function resolveSettings(settings: JsonObject): ResolvedSettings {
  const typo = isJsonObject(settings.typoTolerance) ? settings.typoTolerance : {};
  const minSizes = isJsonObject(typo.minWordSizeForTypos) ? typo.minWordSizeForTypos : {};
  const faceting = isJsonObject(settings.faceting) ? settings.faceting : {};
  const sortBy = isJsonObject(faceting.sortFacetValuesBy) ? faceting.sortFacetValuesBy : {};
  const pagination = isJsonObject(settings.pagination) ? settings.pagination : {};
  const sortFacetValuesBy: Record<string, 'alpha' | 'count'> = {};
  for (const [attribute, order] of Object.entries(sortBy)) {
    if (order === 'alpha' || order === 'count') sortFacetValuesBy[attribute] = order;
  }
  return {
    displayedAttributes: starMeansAll(readStrings(settings.displayedAttributes)),
    searchableAttributes: starMeansAll(readStrings(settings.searchableAttributes)),
    filterableRules: readFilterableRules(settings.filterableAttributes),
    sortableAttributes: readStrings(settings.sortableAttributes),
    rankingRules: readStrings(settings.rankingRules),
    distinctAttribute: typeof settings.distinctAttribute === 'string' ? settings.distinctAttribute : null,
    typoEnabled: typo.enabled !== false,
    oneTypoMinLength: readNumber(minSizes.oneTypo, 5),
    twoTyposMinLength: readNumber(minSizes.twoTypos, 9),
    typoDisabledWords: new Set(readStrings(typo.disableOnWords).map(foldWord)),
    typoDisabledAttributes: new Set(readStrings(typo.disableOnAttributes)),
    typoDisabledOnNumbers: typo.disableOnNumbers === true,
    maxValuesPerFacet: readNumber(faceting.maxValuesPerFacet, 100),
    sortFacetValuesBy,
    maxTotalHits: readNumber(pagination.maxTotalHits, 1000),
    prefixSearch: settings.prefixSearch !== 'disabled',
  };
}

export function isFilterableAttribute(attribute: string, settings: ResolvedSettings): boolean {
  return settings.filterableRules.some(
    (rule) => rule.equality && rule.patterns.some((pattern) => matchesAttributePattern(attribute, pattern)),
  );
}

/** Settings routes like `/settings/filterable-attributes` name the key in kebab case. */
export function settingsKeyFromRouteName(name: string): string | null {
  const key = name.replace(/-([a-z])/g, (_, letter: string) => letter.toUpperCase());
  return Object.hasOwn(defaultSettings(), key) ? key : null;
}
