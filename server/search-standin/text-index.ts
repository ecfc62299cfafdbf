/**
 * Free text and numbers through minisearch, with Meilisearch's typo rules: no typo in a word under
 * five characters, one up to eight, two from nine, a swap of two neighbours counting as one. The
 * engine finds candidates within two plain edits; the one edit-distance function (damerau-levenshtein,
 * which counts a swap as one edit) keeps those within the word's budget.
 */
import osa from 'damerau-levenshtein';
import MiniSearch from 'minisearch';
import type { Doc, Predicate } from './filter';

export interface TextMatch {
  id: string;
  doc: Doc;
  /** Query words matched (fewer when Meilisearch's "last" strategy dropped words from the end). */
  words: number;
  typos: number;
  /** Sum over the words of the position, in the searchable attributes, of the best field each matched. */
  attribute: number;
  /** minisearch's BM25 score: the stand-in's measure of exactness. */
  score: number;
}

export const typoBudget = (word: string): number => (word.length >= 9 ? 2 : word.length >= 5 ? 1 : 0);
const fuzzy = (term: string): number | false => (typoBudget(term) ? 2 : false);

const tokenize = MiniSearch.getDefault('tokenize') as (text: string) => string[];
const processTerm = MiniSearch.getDefault('processTerm') as (term: string) => string | null | undefined | false;

function fieldText(value: unknown): string {
  if (Array.isArray(value)) return value.map(fieldText).join(' ');
  return typeof value === 'string' || typeof value === 'number' ? String(value) : '';
}

/** The query as the index's words, in order. */
export function queryWords(q: string): string[] {
  return tokenize(q)
    .map(processTerm)
    .filter((t): t is string => typeof t === 'string' && t !== '');
}

export class TextIndex {
  private readonly engine: MiniSearch<Doc>;
  private readonly rank: Map<string, number>;

  constructor(
    readonly fields: string[],
    primaryKey: string,
    private readonly docs: ReadonlyMap<string, Doc>,
  ) {
    this.rank = new Map(fields.map((f, i) => [f, i]));
    this.engine = new MiniSearch<Doc>({
      idField: primaryKey,
      fields,
      extractField: (doc, field) => (field === primaryKey ? String(doc[field]) : fieldText(doc[field])),
    });
  }

  set(id: string, doc: Doc): void {
    if (this.engine.has(id)) this.engine.replace(doc);
    else this.engine.add(doc);
  }

  remove(id: string): void {
    if (this.engine.has(id)) this.engine.discard(id);
  }

  /**
   * Documents matching every word (the last as a prefix too), then, with `dropWords` (Meilisearch's
   * "last" strategy) and while fewer than `wanted` are found, those matching the words left after
   * dropping the last ones. Each set is looked up without typos first: when that already fills the
   * page, the typo'd matches would all rank below it (the typo rule), so they are not looked for.
   */
  search(words: string[], filter: Predicate | null, wanted: number, dropWords: boolean): TextMatch[] {
    const found = new Map<string, TextMatch>();
    for (let n = words.length; n > 0 && (n === words.length || (dropWords && found.size < wanted)); n--) {
      const part = words.slice(0, n);
      const exact = this.matchAll(part, filter, n === words.length, false);
      const enough = found.size + exact.length >= wanted;
      for (const m of enough ? exact : this.matchAll(part, filter, n === words.length, true)) if (!found.has(m.id)) found.set(m.id, m);
    }
    return [...found.values()];
  }

  /**
   * How many documents hold the word as it is, in any field: read from the sizes of minisearch's own
   * postings (its term index, not part of its typed API), so picking the rarest word costs no walk.
   */
  private frequency(word: string): number {
    const postings = (this.engine as unknown as { _index: { get(term: string): Map<number, Map<number, number>> | undefined } })._index;
    let n = 0;
    postings.get(word)?.forEach((docs) => (n += docs.size));
    return n;
  }

  /** AND of the words; `keep` runs before the engine builds a result for a document (a boost of 0 leaves it out). */
  private run(query: string, prefix: (i: number) => boolean, keep: (id: string) => boolean, typos: boolean) {
    const fuzzyOf = typos ? fuzzy : false;
    return this.engine.search(query, {
      combineWith: 'AND',
      prefix: (_t, i) => prefix(i),
      fuzzy: fuzzyOf,
      maxFuzzy: 2,
      boostDocument: (id: string) => +keep(id),
    });
  }

  private matchAll(words: string[], filter: Predicate | null, prefixLast: boolean, typos: boolean): TextMatch[] {
    const last = words.length - 1;
    const isLast = (i: number) => prefixLast && i === last;
    let keep = filter ? (id: string) => filter(this.docs.get(id)!) : () => true;
    if (words.length > 1) {
      // The rarest word's documents first, walked without building results (a boost of 0), so
      // that for the common words only those documents are scored.
      const walk = (i: number, visit: (id: string) => void) =>
        this.run(
          words[i]!,
          () => isLast(i),
          (id) => (visit(id), false),
          typos,
        );
      const counts = words.map((w) => this.frequency(w));
      const gate = new Set<string>();
      walk(counts.indexOf(Math.min(...counts)), (id) => keep(id) && gate.add(id));
      if (gate.size === 0) return [];
      keep = (id) => gate.has(id);
    }
    // Typos of a document word against each query word, Infinity outside the word's budget.
    const distances = new Map<string, number[]>();
    const typosOf = (term: string): number[] => {
      let d = distances.get(term);
      if (d) return d;
      d = words.map((word, i) => {
        if (term === word || (isLast(i) && term.startsWith(word))) return 0;
        const steps = typoBudget(word) ? osa(word, term).steps : Infinity;
        return steps <= typoBudget(word) ? steps : Infinity;
      });
      distances.set(term, d);
      return d;
    };
    const matches: TextMatch[] = [];
    for (const r of this.run(words.join(' '), isLast, keep, typos)) {
      let [typos, attribute] = [0, 0];
      for (let i = 0; i <= last; i++) {
        let [best, field] = [Infinity, Infinity];
        for (const term in r.match) {
          const d = typosOf(term)[i]!;
          if (d > best) continue;
          let rank = Infinity;
          for (const f of r.match[term]!) rank = Math.min(rank, this.rank.get(f) ?? Infinity);
          if (d < best || rank < field) [best, field] = [d, rank];
        }
        typos += best;
        attribute += field;
      }
      const id = r.id as string;
      if (typos !== Infinity) matches.push({ id, doc: this.docs.get(id)!, words: words.length, typos, attribute, score: r.score });
    }
    return matches;
  }
}
