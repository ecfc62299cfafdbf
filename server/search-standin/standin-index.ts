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

export type SearchBody = Pick<SearchParams, 'filter' | 'facets' | 'sort' | 'limit' | 'offset' | 'matchingStrategy'> & { q?: string | null };

type Compare = (a: TextMatch, b: TextMatch) => number;

/** Documents go into the engine in slices, so searches are answered between them during a large write. */
const SLICE = 1_000;

function compareValues(a: unknown, b: unknown): number {
  const missing = (v: unknown) => v === undefined || v === null;
  if (missing(a) || missing(b)) return Number(missing(a)) - Number(missing(b));
  if (typeof a === 'number' && typeof b === 'number') return a - b;
  return String(a).localeCompare(String(b));
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

  /** Adds documents, replacing (POST) or merging into (PUT) those with the same primary key. */
  async addDocuments(docs: Doc[], primaryKey: string | undefined, merge: boolean): Promise<number> {
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
        const old = this.docs.get(id);
        const next = merge && old ? { ...old, ...doc } : doc;
        this.docs.set(id, next);
        text.set(id, next);
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

  deleteAll(): number {
    const n = this.docs.size;
    this.docs.clear();
    this.text = null;
    this.updatedAt = new Date().toISOString();
    return n;
  }

  /** Meilisearch's ranking rules in order; `proximity` is not modelled; `attr:asc|desc` sorts by a field. */
  private comparator(sort: string[] | undefined): Compare {
    const sortable = new Set(this.settings.sortableAttributes);
    const byField = (spec: string, code: string): Compare => {
      const m = /^([A-Za-z0-9_.-]+):(asc|desc)$/.exec(spec);
      if (!m || (code === 'invalid_search_sort' && !sortable.has(m[1]!))) {
        throw badRequest(
          code,
          `\`${spec}\` is not a sortable \`attribute:asc\` or \`attribute:desc\`. Sortable: \`${[...sortable].join(', ')}\`.`,
        );
      }
      const [field, dir] = [m[1]!, m[2] === 'desc' ? -1 : 1];
      return (a, b) => dir * compareValues(a.doc[field], b.doc[field]);
    };
    const sorts = (sort ?? []).map((s) => byField(s, 'invalid_search_sort'));
    const rules: Compare[] = this.settings.rankingRules.flatMap((rule): Compare[] => {
      if (rule === 'words') return [(a, b) => b.words - a.words];
      if (rule === 'typo') return [(a, b) => a.typos - b.typos];
      if (rule === 'attribute') return [(a, b) => a.attribute - b.attribute];
      if (rule === 'exactness') return [(a, b) => b.score - a.score];
      if (rule === 'sort') return sorts;
      if (rule === 'proximity') return [];
      return [byField(rule, 'invalid_settings_ranking_rules')];
    });
    if (!this.settings.rankingRules.includes('sort')) rules.push(...sorts);
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
    const compare = this.comparator(body.sort);

    const q = body.q ?? '';
    const words = queryWords(q);
    const matches = words.length
      ? this.textIndex().search(words, filter, body.matchingStrategy === 'all' ? 0 : offset + limit)
      : this.placeholder(filter);
    matches.sort(compare);

    const response: Record<string, unknown> = {
      hits: matches.slice(offset, offset + limit).map((m) => m.doc),
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
