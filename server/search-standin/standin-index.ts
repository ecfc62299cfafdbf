/** One index of the stand-in: its documents, settings and searches, the text part through minisearch. */
import { setImmediate as nextTurn } from 'node:timers/promises';
import type { SearchParams } from 'meilisearch';
import { compileFilter, type Doc, type Predicate } from './filter';
import { badRequest } from './meili-error';
import { queryWords, TextIndex, type TextMatch } from './text-index';

export interface Settings {
  searchableAttributes: string[];
  filterableAttributes: string[];
  sortableAttributes: string[];
  rankingRules: string[];
}

export const DEFAULT_SETTINGS: Settings = {
  searchableAttributes: ['*'],
  filterableAttributes: [],
  sortableAttributes: [],
  rankingRules: ['words', 'typo', 'proximity', 'attribute', 'sort', 'exactness'],
};

export type SearchBody = Pick<SearchParams, 'filter' | 'facets' | 'limit' | 'offset' | 'matchingStrategy'> & { q?: string | null };

type Compare = (a: TextMatch, b: TextMatch) => number;

/** Documents go into the engine in slices, so searches are answered between them during a large write. */
const SLICE = 1_000;

/** The first `k` items in `compare`'s order (stable), without sorting all of a large result. */
function firstK<T>(items: readonly T[], k: number, compare: (a: T, b: T) => number): T[] {
  const top: T[] = [];
  if (k <= 0) return top;
  for (const item of items) {
    if (top.length === k && compare(item, top[k - 1]!) >= 0) continue;
    let [lo, hi] = [0, top.length];
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (compare(item, top[mid]!) < 0) hi = mid;
      else lo = mid + 1;
    }
    top.splice(lo, 0, item);
    if (top.length > k) top.pop();
  }
  return top;
}

export class StandinIndex {
  readonly createdAt = new Date().toISOString();
  updatedAt = this.createdAt;
  settings: Settings = { ...DEFAULT_SETTINGS };
  readonly docs = new Map<string, Doc>();
  private text: TextIndex | null = null;

  constructor(public primaryKey: string | null) {}

  /** Built on first use after a change of the searchable fields, from the documents held. */
  private textIndex(): TextIndex {
    if (!this.text) {
      // `*` (Meilisearch's default) stands for the fields of the documents held when it is built.
      const fields = this.settings.searchableAttributes;
      const all = fields.includes('*') ? [...new Set([...this.docs.values()].flatMap((d) => Object.keys(d)))] : fields;
      this.text = new TextIndex(all, this.primaryKey ?? 'id', this.docs);
      for (const [id, doc] of this.docs) this.text.set(id, doc);
    }
    return this.text;
  }

  updateSettings(patch: Partial<Settings>): void {
    for (const key of Object.keys(DEFAULT_SETTINGS) as (keyof Settings)[]) {
      const value: unknown = patch[key];
      if (value === undefined) continue;
      const code = `invalid_settings_${key.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`)}`;
      const ok = value === null || (Array.isArray(value) && value.every((v) => typeof v === 'string'));
      if (!ok) throw badRequest(code, `\`${key}\` must be an array of strings.`);
      this.settings[key] = value === null ? DEFAULT_SETTINGS[key] : (value as string[]);
    }
    this.text = null;
    this.updatedAt = new Date().toISOString();
  }

  /** Adds documents, replacing those with the same primary key. */
  async addDocuments(docs: Doc[], primaryKey: string | undefined): Promise<number> {
    if (!this.primaryKey) {
      const guess = primaryKey ?? Object.keys(docs[0] ?? {}).find((k) => /id$/i.test(k));
      if (!guess) throw badRequest('index_primary_key_no_candidate_found', 'The primary key inference failed: no field ends in `id`.');
      this.primaryKey = guess;
    }
    const pk = this.primaryKey;
    const bad = docs.find((d) => !(typeof d[pk] === 'string' && /^[\w-]{1,511}$/.test(d[pk])) && !Number.isInteger(d[pk]));
    if (bad) throw badRequest('invalid_document_id', `Document identifier \`${JSON.stringify(bad[pk])}\` is invalid or missing.`);
    const text = this.textIndex();
    for (let i = 0; i < docs.length; i += SLICE) {
      if (i > 0) await nextTurn();
      for (const doc of docs.slice(i, i + SLICE)) {
        const id = String(doc[pk]);
        this.docs.set(id, doc);
        text.set(id, doc);
      }
    }
    if (this.settings.searchableAttributes.includes('*')) this.text = null;
    this.updatedAt = new Date().toISOString();
    return docs.length;
  }

  deleteDocuments(ids: unknown[]): number {
    let deleted = 0;
    for (const raw of ids) {
      const id = String(raw);
      if (!this.docs.delete(id)) continue;
      this.text?.remove(id);
      deleted++;
    }
    this.updatedAt = new Date().toISOString();
    return deleted;
  }

  /**
   * Meilisearch's ranking rules in order; `proximity` is not modelled, nor `sort` (the app sends no
   * sort); a custom `attr:asc|desc` rule orders by a numeric field.
   */
  private comparator(): Compare {
    const rules = this.settings.rankingRules.flatMap((rule): Compare[] => {
      if (rule === 'words') return [(a, b) => b.words - a.words];
      if (rule === 'typo') return [(a, b) => a.typos - b.typos];
      if (rule === 'attribute') return [(a, b) => a.attribute - b.attribute];
      if (rule === 'exactness') return [(a, b) => b.score - a.score];
      const m = /^([A-Za-z0-9_.-]+):(asc|desc)$/.exec(rule);
      if (!m) return [];
      const [field, dir] = [m[1]!, m[2] === 'desc' ? -1 : 1];
      const value = (m: TextMatch) => Number(m.doc[field] ?? 0);
      return [(a, b) => dir * (value(a) - value(b))];
    });
    return (a, b) => {
      for (const rule of rules) {
        const c = rule(a, b);
        if (c !== 0) return c;
      }
      return 0;
    };
  }

  search(body: SearchBody): Record<string, unknown> {
    const started = performance.now();
    const limit = body.limit ?? 20;
    const offset = body.offset ?? 0;
    if (!Number.isInteger(limit) || limit < 0 || !Number.isInteger(offset) || offset < 0) {
      throw badRequest('invalid_search_limit', '`limit` and `offset` must be non-negative integers.');
    }
    const filterable = new Set(this.settings.filterableAttributes);
    const filter: Predicate | null = compileFilter(body.filter, filterable);
    const facets = body.facets ?? [];
    const unknownFacet = facets.find((f) => !filterable.has(f));
    if (unknownFacet)
      throw badRequest('invalid_search_facets', `Attribute \`${unknownFacet}\` is not filterable, so it cannot be a facet.`);
    const compare = this.comparator();

    const q = body.q ?? '';
    const words = queryWords(q);
    const matches = words.length
      ? this.textIndex().search(words, filter, offset + limit, body.matchingStrategy !== 'all')
      : this.placeholder(filter);
    const response: Record<string, unknown> = {
      hits: firstK(matches, offset + limit, compare)
        .slice(offset)
        .map((m) => m.doc),
      query: q,
      processingTimeMs: 0,
      limit,
      offset,
      estimatedTotalHits: matches.length,
    };
    if (body.facets) Object.assign(response, this.facets(matches, facets));
    response.processingTimeMs = Math.round(performance.now() - started);
    return response;
  }

  /** A search without words: every document the filter lets through. */
  private placeholder(filter: Predicate | null): TextMatch[] {
    const matches: TextMatch[] = [];
    for (const [id, doc] of this.docs) if (!filter || filter(doc)) matches.push({ id, doc, words: 0, typos: 0, attribute: 0, score: 0 });
    return matches;
  }

  /** Value counts of each facet over every match, and the minimum and maximum of numeric ones. */
  private facets(matches: TextMatch[], facets: string[]): Record<string, unknown> {
    const facetDistribution: Record<string, Record<string, number>> = {};
    const facetStats: Record<string, { min: number; max: number }> = {};
    for (const facet of facets) {
      const counts: Record<string, number> = (facetDistribution[facet] = {});
      const count = (v: unknown): void => {
        if (v === undefined || v === null || typeof v === 'object') return;
        counts[String(v)] = (counts[String(v)] ?? 0) + 1;
        if (typeof v !== 'number') return;
        const s = (facetStats[facet] ??= { min: v, max: v });
        [s.min, s.max] = [Math.min(s.min, v), Math.max(s.max, v)];
      };
      for (const { doc } of matches) {
        const raw = doc[facet];
        if (Array.isArray(raw)) raw.forEach(count);
        else count(raw);
      }
    }
    return { facetDistribution, facetStats };
  }
}
