/**
 * Full-text side of one index: a lexicon of words (exact, prefix and — through minisearch's radix
 * tree — Levenshtein lookups), each with a compact posting list, scored with BM25 here.
 * MiniSearch's own search() is not used: it builds objects per matching document and spent
 * 100–600 ms on a common word or a three-letter prefix over 100,000 parts.
 *
 * Candidate words are re-checked against Meilisearch's typo rules (typo-distance.ts), which count
 * a transposition as one typo; adjacent-swap variants of the term are looked up so those are found.
 */
import type { DocumentRecord } from './document-record';
import { isJsonObject, valuesAtPath, type JsonObject } from './field-paths';
import { Lexicon } from './lexicon';
import { bestFieldRank, compactIfStale, fieldBit, fieldMaskOf, frequencyOf, packInfo, type PostingList } from './posting-list';
import { tokenize } from './text-tokens';
import { adjacentTranspositions, typosBetween } from './typo-distance';

/**
 * How one query term matched the documents, by text-index slot: typed arrays sized to the slot
 * count, because a common word or a short prefix matches tens of thousands of documents and an
 * object per match was most of the search time.
 */
export interface TermMatches {
  /** Matched slots, each once. */
  slots: number[];
  /** Typos of the best match per slot, -1 where the term did not match. */
  typos: Int8Array;
  exact: Uint8Array;
  /** Position of the best matching attribute in the searchable list (lower is better). */
  attributeRank: Uint8Array;
  /** BM25 of the best matching word, weighted down for prefix and typo matches. */
  score: Float64Array;
  /** Accepted whole-word matches (exact or with typos), for highlighting. */
  words: Set<string>;
  /** The term when it matched as a prefix: words starting with it are highlighted up to its length. */
  prefix: string | null;
}

export interface TermQuery {
  term: string;
  asPrefix: boolean;
  budget: 0 | 1 | 2;
  /** Restricts matching to these searchable fields (attributesToSearchOn). */
  fields: readonly string[] | null;
}

interface Derivation {
  typos: number;
  exact: boolean;
  prefix: boolean;
  weight: number;
}

const BM25_K1 = 1.2;
const BM25_B = 0.7;
/** Relative weights of prefix and typo matches, after minisearch's defaults. */
const PREFIX_WEIGHT = 0.375;
const TYPO_WEIGHT = 0.45;

/** Calls `visit` for every word of a field value: strings, numbers, booleans, arrays, objects. */
function forEachWord(value: unknown, visit: (word: string) => void): void {
  if (typeof value === 'string') {
    for (const word of tokenize(value)) visit(word);
  } else if (typeof value === 'number' || typeof value === 'boolean') {
    for (const word of tokenize(String(value))) visit(word);
  } else if (Array.isArray(value)) {
    for (const item of value) forEachWord(item, visit);
  } else if (isJsonObject(value)) {
    for (const inner of Object.values(value)) forEachWord(inner, visit);
  }
}

function forEachFieldWord(doc: JsonObject, field: string, visit: (word: string) => void): void {
  for (const value of valuesAtPath(doc, field)) forEachWord(value, visit);
}

export class TextIndex {
  private readonly words = new Lexicon();
  /** Slots are the text index's own document numbers: a rewritten document gets a new one. */
  private readonly recordBySlot: Array<DocumentRecord | undefined> = [];
  private readonly lengthBySlot: number[] = [];
  private readonly slotBySeq = new Map<number, number>();
  private readonly typoDisabledMask: number;
  private totalLength = 0;
  private readonly isLive = (slot: number): boolean => this.recordBySlot[slot] !== undefined;

  constructor(
    readonly fields: readonly string[],
    typoDisabledFields: ReadonlySet<string>,
  ) {
    this.typoDisabledMask = this.maskOf([...typoDisabledFields]);
  }

  get documentCount(): number {
    return this.slotBySeq.size;
  }

  /** Slots ever handed out; when far above the live count, stale entries are worth a rebuild. */
  get slotCount(): number {
    return this.recordBySlot.length;
  }

  private maskOf(fields: readonly string[]): number {
    let mask = 0;
    for (const field of fields) {
      const rank = this.fields.indexOf(field);
      if (rank >= 0) mask |= fieldBit(rank);
    }
    return mask;
  }

  addAll(records: Iterable<DocumentRecord>): void {
    // Per document: word -> packed field mask and frequency, without an object per word.
    const perWord = new Map<string, number>();
    let bit = 0;
    let length = 0;
    const count = (word: string): void => {
      length++;
      const seen = perWord.get(word);
      perWord.set(word, seen === undefined ? packInfo(bit, 1) : packInfo(fieldMaskOf(seen) | bit, frequencyOf(seen) + 1));
    };
    for (const record of records) {
      this.discard(record.seq);
      const slot = this.recordBySlot.length;
      this.recordBySlot.push(record);
      this.slotBySeq.set(record.seq, slot);
      perWord.clear();
      length = 0;
      this.fields.forEach((field, rank) => {
        bit = fieldBit(rank);
        forEachFieldWord(record.doc, field, count);
      });
      for (const [word, info] of perWord) {
        const list = this.words.fetch(word);
        list.slots.push(slot);
        list.infos.push(info);
      }
      this.lengthBySlot[slot] = length;
      this.totalLength += length;
    }
    this.words.publish();
  }

  discard(seq: number): void {
    const slot = this.slotBySeq.get(seq);
    if (slot === undefined) return;
    this.slotBySeq.delete(seq);
    this.recordBySlot[slot] = undefined;
    this.totalLength -= this.lengthBySlot[slot] ?? 0;
  }

  recordAt(slot: number): DocumentRecord | undefined {
    return this.recordBySlot[slot];
  }

  /** Every document matching one query term, with how it matched. */
  termHits(query: TermQuery): TermMatches {
    const { term, asPrefix, budget } = query;
    const slotCount = this.recordBySlot.length;
    const matches: TermMatches = {
      slots: [],
      typos: new Int8Array(slotCount).fill(-1),
      exact: new Uint8Array(slotCount),
      attributeRank: new Uint8Array(slotCount),
      score: new Float64Array(slotCount),
      words: new Set(),
      prefix: asPrefix ? term : null,
    };
    const allowedMask = query.fields ? this.maskOf(query.fields) : -1;
    const documentCount = Math.max(1, this.slotBySeq.size);
    const averageLength = this.totalLength / documentCount || 1;

    const collect = (word: string, list: PostingList, derivation: Derivation): void => {
      let stale = 0;
      let matchedAny = false;
      const { slots, infos } = list;
      const idf = Math.log(1 + (documentCount - slots.length + 0.5) / (slots.length + 0.5));
      const typoMask = derivation.typos > 0 ? ~this.typoDisabledMask : -1;
      for (let i = 0; i < slots.length; i++) {
        const slot = slots[i] as number;
        if (this.recordBySlot[slot] === undefined) {
          stale++;
          continue;
        }
        const info = infos[i] as number;
        const mask = fieldMaskOf(info) & allowedMask & typoMask;
        if (mask === 0) continue;
        matchedAny = true;
        const frequency = frequencyOf(info);
        const lengthRatio = (this.lengthBySlot[slot] as number) / averageLength;
        const score = (derivation.weight * idf * frequency * (BM25_K1 + 1)) / (frequency + BM25_K1 * (1 - BM25_B + BM25_B * lengthRatio));
        const rank = bestFieldRank(mask);
        const typos = matches.typos[slot] as number;
        if (typos < 0) {
          matches.slots.push(slot);
          matches.typos[slot] = derivation.typos;
          matches.exact[slot] = derivation.exact ? 1 : 0;
          matches.attributeRank[slot] = rank;
          matches.score[slot] = score;
        } else {
          if (derivation.typos < typos) matches.typos[slot] = derivation.typos;
          if (derivation.exact) matches.exact[slot] = 1;
          if (rank < (matches.attributeRank[slot] as number)) matches.attributeRank[slot] = rank;
          if (score > (matches.score[slot] as number)) matches.score[slot] = score;
        }
      }
      // Prefix matches are many (a short prefix can match 100,000 words) and highlight by `prefix`.
      if (matchedAny && !derivation.prefix) matches.words.add(word);
      if (stale > 0) compactIfStale(list, this.isLive, stale);
    };

    // A word starting with the term is found by the prefix lookup; other words may be proposed by
    // several typo lookups, hence the set. `primary` marks the lookup of the term itself.
    const seenTypoWords = new Set<string>();
    const prefixDerivations = new Map<number, Derivation>();
    const consider = (word: string, list: PostingList, primary: boolean): void => {
      if (word === term) {
        if (primary) collect(word, list, { typos: 0, exact: true, prefix: false, weight: 1 });
        return;
      }
      if (asPrefix && word.startsWith(term)) {
        if (!primary) return;
        let derivation = prefixDerivations.get(word.length);
        if (!derivation) {
          const weight = (PREFIX_WEIGHT * word.length) / (word.length + 0.3 * (word.length - term.length));
          derivation = { typos: 0, exact: false, prefix: true, weight };
          prefixDerivations.set(word.length, derivation);
        }
        collect(word, list, derivation);
        return;
      }
      if (seenTypoWords.has(word)) return;
      seenTypoWords.add(word);
      const typos = typosBetween(term, word, budget, asPrefix);
      if (typos !== null) collect(word, list, { typos, exact: false, prefix: false, weight: TYPO_WEIGHT / typos });
    };

    const primary = (word: string, list: PostingList): void => consider(word, list, true);
    const secondary = (word: string, list: PostingList): void => consider(word, list, false);
    if (asPrefix) this.words.forEachWithPrefix(term, primary);
    else {
      const exact = this.words.get(term);
      if (exact) primary(term, exact);
    }
    if (budget > 0) {
      this.words.forEachNear(term, budget, secondary);
      for (const variant of adjacentTranspositions(term)) {
        if (asPrefix) this.words.forEachWithPrefix(variant, secondary);
        else {
          const exact = this.words.get(variant);
          if (exact) secondary(variant, exact);
        }
        if (budget > 1) this.words.forEachNear(variant, budget - 1, secondary);
      }
    }
    return matches;
  }
}
