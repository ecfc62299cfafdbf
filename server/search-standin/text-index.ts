/**
 * Full-text side of one index: a lexicon of words (exact, prefix and Levenshtein lookups, see
 * lexicon.ts), each with a compact posting list, scored with BM25 here. MiniSearch's own search()
 * is not used: it builds objects per matching document and spent 100–600 ms on a common word or a
 * three-letter prefix over 100,000 parts.
 *
 * Candidate words are checked against Meilisearch's typo rules (typo-distance.ts), which count a
 * transposition as one typo; adjacent-swap variants of the term are looked up so those are found.
 *
 * For queries, the per-word lists are packed into one set of typed arrays in word order (rebuilt
 * on the first lookup after a write), and each term's matches are cached until the next write:
 * the app sends the same words ("spark", "plug", "coil") all day.
 */
import type { DocumentRecord } from './document-record';
import { isJsonObject, valuesAtPath, type JsonObject } from './field-paths';
import { Lexicon } from './lexicon';
import { bestFieldRank, compactIfStale, fieldBit, fieldMaskOf, frequencyOf, packInfo, type PostingList } from './posting-list';
import { tokenize } from './text-tokens';
import { adjacentTranspositions, typosBetween } from './typo-distance';

/**
 * How one query term matched the documents: parallel typed arrays, one entry per matched slot in
 * the order the lookups met them. A common word or a short prefix matches tens of thousands of
 * documents, so there is no object per match; and the same term is looked up again and again
 * (every query for "spark plug"), so results are cached until the next write.
 */
export interface TermMatches {
  /** How many slots matched; the arrays may be longer. */
  count: number;
  /** Matched slots, each once. */
  slots: Int32Array;
  /** Typos of the best match per entry. */
  typos: Int8Array;
  exact: Uint8Array;
  /** Position of the best matching attribute in the searchable list (lower is better). */
  attributeRank: Uint8Array;
  /** BM25 of the best matching word, weighted down for prefix and typo matches. */
  score: Float64Array;
  /** Accepted whole-word matches (exact or with typos), for highlighting: indexes into `wordList`. */
  wordIndexes: number[];
  wordList: readonly string[];
  /** The term when it matched as a prefix: words starting with it are highlighted up to its length. */
  prefix: string | null;
}

/**
 * Every word's postings in one place, words in sorted order: word i's entries are
 * [start[i], start[i] + count[i]), the live entries of its list when they were packed, and
 * neighbouring words (part numbers one digit apart) are neighbours in memory. A lookup reads these
 * instead of 600,000 scattered lists. Packed on the first lookup after a large write; a small
 * write (a catalog edit) keeps them: deleted or rewritten documents' entries are skipped as dead
 * slots, and postings appended since are read from the list itself past `packedLength[i]`
 * (`tail[i]` set).
 */
interface PackedPostings {
  start: Int32Array;
  count: Int32Array;
  /** The list's length when packed (dead entries included): where its tail starts. */
  packedLength: Int32Array;
  tail: Uint8Array;
  slots: Int32Array;
  infos: Int32Array;
}

/** A write of more documents than this drops the packed postings instead of amending them. */
const MAX_AMENDED_DOCUMENTS = 500;

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

/** Cached term lookups, bounded by count and by matched entries (15 bytes each). */
const MAX_CACHED_TERMS = 256;
const MAX_CACHED_ENTRIES = 3_000_000;
const INITIAL_MATCH_CAPACITY = 1024;
/** Entry maps (4 bytes per slot) are kept for at most this many cached terms of at least this many matches. */
const MAX_KEPT_MAPS = 16;
const KEPT_MAP_MIN_ENTRIES = 2048;

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
  /** The document number (`seq`) of each live slot, -1 for a dead one: joins read it, not the record. */
  private seqBySlot = new Int32Array(1024);
  private readonly lengthBySlot: number[] = [];
  private readonly slotBySeq = new Map<number, number>();
  private readonly typoDisabledMask: number;
  private totalLength = 0;
  private readonly isLive = (slot: number): boolean => this.recordBySlot[slot] !== undefined;
  private readonly termCache = new Map<string, TermMatches>();
  /** The cached terms' results, and the entry maps kept for the largest of them. */
  private readonly cachedTerms = new Set<TermMatches>();
  private readonly entryMaps = new Map<TermMatches, Int32Array>();
  private packed: PackedPostings | null = null;
  /** Entries in all lists, dead ones included: the size of a packing. */
  private postingCount = 0;
  private cachedEntries = 0;
  /** Where lookUpTerm gathers entries (grown as needed, reused). */
  private readonly matchBuffers: TermMatches = {
    count: 0,
    slots: new Int32Array(INITIAL_MATCH_CAPACITY),
    typos: new Int8Array(INITIAL_MATCH_CAPACITY),
    exact: new Uint8Array(INITIAL_MATCH_CAPACITY),
    attributeRank: new Uint8Array(INITIAL_MATCH_CAPACITY),
    score: new Float64Array(INITIAL_MATCH_CAPACITY),
    wordIndexes: [],
    wordList: [],
    prefix: null,
  };
  /** Slot -> entry index, -1 elsewhere: one while a term is collected, more while terms are joined. */
  private readonly scratch: Int32Array[] = [];

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
    this.forgetTerms();
    // Words given new postings, to amend the packed postings after a small write.
    let touched: Set<string> | null = this.packed ? new Set() : null;
    let documents = 0;
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
      if (slot >= this.seqBySlot.length) {
        const grown = new Int32Array(this.seqBySlot.length * 2);
        grown.set(this.seqBySlot);
        this.seqBySlot = grown;
      }
      this.seqBySlot[slot] = record.seq;
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
      this.postingCount += perWord.size;
      if (touched && ++documents > MAX_AMENDED_DOCUMENTS) touched = null;
      else if (touched) for (const word of perWord.keys()) touched.add(word);
      this.lengthBySlot[slot] = length;
      this.totalLength += length;
    }
    const moved = this.words.publish();
    if (!touched) this.packed = null;
    else if (this.packed) this.amendPacked(moved, touched);
  }

  /** After a small write: word numbers move past new words, and touched words have a tail. */
  private amendPacked(moved: Int32Array | null, touched: ReadonlySet<string>): void {
    let packed = this.packed as PackedPostings;
    if (moved) {
      const size = this.words.words.length;
      const start = new Int32Array(size);
      const count = new Int32Array(size);
      const packedLength = new Int32Array(size);
      const tail = new Uint8Array(size).fill(1);
      for (let i = 0; i < moved.length; i++) {
        const k = moved[i] as number;
        start[k] = packed.start[i] as number;
        count[k] = packed.count[i] as number;
        packedLength[k] = packed.packedLength[i] as number;
        tail[k] = packed.tail[i] as number;
      }
      packed = { ...packed, start, count, packedLength, tail };
      this.packed = packed;
    }
    for (const word of touched) {
      const index = this.words.indexOf(word);
      if (index >= 0) packed.tail[index] = 1;
    }
  }

  discard(seq: number): void {
    const slot = this.slotBySeq.get(seq);
    if (slot === undefined) return;
    this.forgetTerms();
    this.slotBySeq.delete(seq);
    this.recordBySlot[slot] = undefined;
    this.seqBySlot[slot] = -1;
    this.totalLength -= this.lengthBySlot[slot] ?? 0;
  }

  recordAt(slot: number): DocumentRecord | undefined {
    return this.recordBySlot[slot];
  }

  /** Document number of every slot (-1 for dead ones), indexed by slot; changes with writes. */
  get slotSeqs(): Int32Array {
    return this.seqBySlot;
  }

  /** Scores depend on the document count and lengths: each write drops every cached term. */
  private forgetTerms(): void {
    if (this.termCache.size === 0) return;
    this.termCache.clear();
    this.cachedTerms.clear();
    this.entryMaps.clear();
    this.cachedEntries = 0;
  }

  private packedPostings(): PackedPostings {
    if (this.packed) return this.packed;
    const lists = this.words.lists;
    const start = new Int32Array(lists.length);
    const count = new Int32Array(lists.length);
    const packedLength = new Int32Array(lists.length);
    // postingCount counts every entry appended, so this is enough; grown anyway if it were not.
    let slots = new Int32Array(this.postingCount);
    let infos = new Int32Array(this.postingCount);
    const seqOfSlot = this.seqBySlot;
    let at = 0;
    let remaining = 0;
    lists.forEach((list, k) => {
      start[k] = at;
      const listSlots = list.slots;
      const listInfos = list.infos;
      if (at + listSlots.length > slots.length) {
        slots = enlarged(slots, 2 * (at + listSlots.length));
        infos = enlarged(infos, slots.length);
      }
      for (let i = 0; i < listSlots.length; i++) {
        const slot = listSlots[i] as number;
        if ((seqOfSlot[slot] as number) < 0) continue;
        slots[at] = slot;
        infos[at] = listInfos[i] as number;
        at++;
      }
      const live = at - (start[k] as number);
      // Lists left mostly dead by rewrites are compacted in place, as reads used to.
      if (live !== listSlots.length) compactIfStale(list, this.isLive, listSlots.length - live);
      count[k] = live;
      packedLength[k] = listSlots.length;
      remaining += listSlots.length;
    });
    this.postingCount = remaining;
    this.packed = { start, count, packedLength, tail: new Uint8Array(lists.length), slots, infos };
    return this.packed;
  }

  /** Scratch slot maps, each all -1 and at least as long as the slot count. */
  private scratchMaps(count: number): Int32Array[] {
    const size = this.recordBySlot.length;
    for (let i = 0; i < count; i++) {
      const map = this.scratch[i];
      if (!map || map.length < size) this.scratch[i] = new Int32Array(Math.max(size, 2 * (map?.length ?? 0))).fill(-1);
    }
    return this.scratch.slice(0, count);
  }

  /**
   * Runs `join` with, for each of `matches`, a map from slot to its entry index (-1 where the term
   * did not match), and clears the maps afterwards.
   */
  withEntryMaps<T>(matches: readonly TermMatches[], join: (maps: Int32Array[]) => T): T {
    const scratch = this.scratchMaps(matches.length);
    const filled: Array<TermMatches | null> = [];
    const maps = matches.map((match, k) => {
      const kept = this.keptEntryMap(match);
      if (kept) {
        filled.push(null);
        return kept;
      }
      const map = scratch[k] as Int32Array;
      for (let i = 0; i < match.count; i++) map[match.slots[i] as number] = i;
      filled.push(match);
      return map;
    });
    try {
      return join(maps);
    } finally {
      filled.forEach((match, k) => {
        if (!match) return;
        const map = maps[k] as Int32Array;
        for (let i = 0; i < match.count; i++) map[match.slots[i] as number] = -1;
      });
    }
  }

  /**
   * A cached term with many matches keeps its slot -> entry map, so joining it ("spark" in every
   * "… spark plug" query) costs no fill and clear; a few such maps are kept, the oldest dropped.
   */
  private keptEntryMap(match: TermMatches): Int32Array | null {
    const kept = this.entryMaps.get(match);
    if (kept) return kept;
    if (match.count < KEPT_MAP_MIN_ENTRIES || !this.cachedTerms.has(match)) return null;
    if (this.entryMaps.size >= MAX_KEPT_MAPS) this.entryMaps.delete(this.entryMaps.keys().next().value as TermMatches);
    const map = new Int32Array(this.recordBySlot.length).fill(-1);
    for (let i = 0; i < match.count; i++) map[match.slots[i] as number] = i;
    this.entryMaps.set(match, map);
    return map;
  }

  /** Every document matching one query term, with how it matched; cached until the next write. */
  termHits(query: TermQuery): TermMatches {
    const allowedMask = query.fields ? this.maskOf(query.fields) : -1;
    const key = `${query.asPrefix ? 'p' : 'w'}${query.budget}:${allowedMask}:${query.term}`;
    const cached = this.termCache.get(key);
    if (cached) {
      // Refresh its place so the oldest lookups are the ones dropped.
      this.termCache.delete(key);
      this.termCache.set(key, cached);
      return cached;
    }
    const matches = this.lookUpTerm(query, allowedMask);
    if (matches.count <= MAX_CACHED_ENTRIES) {
      while (this.termCache.size >= MAX_CACHED_TERMS || this.cachedEntries + matches.count > MAX_CACHED_ENTRIES) {
        const oldest = this.termCache.keys().next();
        if (oldest.done) break;
        const dropped = this.termCache.get(oldest.value) as TermMatches;
        this.cachedEntries -= dropped.count;
        this.termCache.delete(oldest.value);
        this.cachedTerms.delete(dropped);
        this.entryMaps.delete(dropped);
      }
      this.termCache.set(key, matches);
      this.cachedTerms.add(matches);
      this.cachedEntries += matches.count;
    }
    return matches;
  }

  private lookUpTerm(query: TermQuery, allowedMask: number): TermMatches {
    const { term, asPrefix, budget } = query;
    const lexicon = this.words;
    const wordList = lexicon.words;
    const { start, count: packedCount, packedLength, tail, slots, infos } = this.packedPostings();
    const lists = lexicon.lists;
    const seqOfSlot = this.seqBySlot;
    // Entries are gathered in arrays kept from one lookup to the next, then copied out at their
    // exact size: a lookup's result is cached, and growing arrays per lookup was garbage.
    const matches: TermMatches = this.matchBuffers;
    matches.count = 0;
    matches.wordIndexes = [];
    matches.wordList = wordList;
    matches.prefix = asPrefix ? term : null;
    let capacity = matches.slots.length;
    const grow = (): void => {
      capacity *= 2;
      matches.slots = enlarged(matches.slots, capacity);
      matches.typos = enlarged(matches.typos, capacity);
      matches.exact = enlarged(matches.exact, capacity);
      matches.attributeRank = enlarged(matches.attributeRank, capacity);
      matches.score = enlarged(matches.score, capacity);
    };
    const entryOf = this.scratchMaps(1)[0] as Int32Array;
    const documentCount = Math.max(1, this.slotBySeq.size);
    const averageLength = this.totalLength / documentCount || 1;
    const lengthBySlot = this.lengthBySlot;
    const typoDisabledMask = this.typoDisabledMask;

    // The word being collected: set by collect() for add(), one closure per lookup, not per word
    // (closures are costly under tsx, which names each one as it is made).
    let idf = 0;
    let typoMask = -1;
    let derivation: Derivation = { typos: 0, exact: true, prefix: false, weight: 1 };
    let matchedAny = false;
    const add = (slot: number, info: number): void => {
      const mask = fieldMaskOf(info) & allowedMask & typoMask;
      if (mask === 0) return;
      matchedAny = true;
      const frequency = frequencyOf(info);
      const lengthRatio = (lengthBySlot[slot] as number) / averageLength;
      const score = (derivation.weight * idf * frequency * (BM25_K1 + 1)) / (frequency + BM25_K1 * (1 - BM25_B + BM25_B * lengthRatio));
      const rank = bestFieldRank(mask);
      const entry = entryOf[slot] as number;
      if (entry < 0) {
        if (matches.count === capacity) grow();
        const added = matches.count++;
        entryOf[slot] = added;
        matches.slots[added] = slot;
        matches.typos[added] = derivation.typos;
        matches.exact[added] = derivation.exact ? 1 : 0;
        matches.attributeRank[added] = rank;
        matches.score[added] = score;
      } else {
        if (derivation.typos < (matches.typos[entry] as number)) matches.typos[entry] = derivation.typos;
        if (derivation.exact) matches.exact[entry] = 1;
        if (rank < (matches.attributeRank[entry] as number)) matches.attributeRank[entry] = rank;
        if (score > (matches.score[entry] as number)) matches.score[entry] = score;
      }
    };

    /** Adds the live documents of word `index`: its packed entries, then any appended since. */
    const collect = (index: number, how: Derivation): void => {
      const from = start[index] as number;
      const to = from + (packedCount[index] as number);
      const list = tail[index] === 1 ? (lists[index] as PostingList) : null;
      // Document frequency: the word's live documents, so a rewritten document's dead entries do
      // not lower the word's weight (a freshly built index scores the same).
      let documents = 0;
      for (let p = from; p < to; p++) if ((seqOfSlot[slots[p] as number] as number) >= 0) documents++;
      if (list) {
        for (let i = packedLength[index] as number; i < list.slots.length; i++)
          if ((seqOfSlot[list.slots[i] as number] as number) >= 0) documents++;
      }
      idf = Math.log(1 + (documentCount - documents + 0.5) / (documents + 0.5));
      typoMask = how.typos > 0 ? ~typoDisabledMask : -1;
      derivation = how;
      matchedAny = false;
      for (let p = from; p < to; p++) {
        const slot = slots[p] as number;
        if ((seqOfSlot[slot] as number) >= 0) add(slot, infos[p] as number);
      }
      if (list) {
        for (let i = packedLength[index] as number; i < list.slots.length; i++) {
          const slot = list.slots[i] as number;
          if ((seqOfSlot[slot] as number) >= 0) add(slot, list.infos[i] as number);
        }
      }
      // Prefix matches are many (a short prefix can match 100,000 words) and highlight by `prefix`.
      if (matchedAny && !how.prefix) matches.wordIndexes.push(index);
    };

    // A word starting with the term is found by the prefix lookup; other words may be proposed by
    // several typo lookups, hence the set. `primary` marks the lookup of the term itself.
    const seenTypoWords = new Set<number>();
    const prefixDerivations = new Map<number, Derivation>();
    const consider = (index: number, primary: boolean): void => {
      const word = wordList[index] as string;
      if (word === term) {
        if (primary) collect(index, { typos: 0, exact: true, prefix: false, weight: 1 });
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
        collect(index, derivation);
        return;
      }
      if (seenTypoWords.has(index)) return;
      seenTypoWords.add(index);
      const typos = typosBetween(term, word, budget, asPrefix);
      if (typos !== null) collect(index, { typos, exact: false, prefix: false, weight: TYPO_WEIGHT / typos });
    };

    const primary = (index: number): void => consider(index, true);
    const secondary = (index: number): void => consider(index, false);
    // The term's own fuzzy lookup hands over only words the typo rule accepts, with their typos:
    // what consider() does with each proposal, without reading the rejected ones. Accepted words
    // are neither the term nor (in prefix mode) start with it, and come first and once each.
    const typoDerivations: Derivation[] = [];
    const accepted = (index: number, typos: number): void => {
      seenTypoWords.add(index);
      let derivation = typoDerivations[typos];
      if (!derivation) {
        derivation = { typos, exact: false, prefix: false, weight: TYPO_WEIGHT / typos };
        typoDerivations[typos] = derivation;
      }
      collect(index, derivation);
    };
    try {
      if (asPrefix) lexicon.forEachWithPrefix(term, primary);
      else {
        const exact = lexicon.indexOf(term);
        if (exact >= 0) primary(exact);
      }
      if (budget > 0) {
        lexicon.forEachTypoMatch(term, budget, term, budget, asPrefix, accepted);
        for (const variant of adjacentTranspositions(term)) {
          if (asPrefix) lexicon.forEachWithPrefix(variant, secondary);
          else {
            const exact = lexicon.indexOf(variant);
            if (exact >= 0) secondary(exact);
          }
          // The typo rule is checked per proposal here: these one-edit neighbourhoods are small.
          if (budget > 1) lexicon.forEachNear(variant, budget - 1, secondary);
        }
      }
    } finally {
      for (let i = 0; i < matches.count; i++) entryOf[matches.slots[i] as number] = -1;
    }
    const count = matches.count;
    return {
      count,
      slots: matches.slots.slice(0, count),
      typos: matches.typos.slice(0, count),
      exact: matches.exact.slice(0, count),
      attributeRank: matches.attributeRank.slice(0, count),
      score: matches.score.slice(0, count),
      wordIndexes: matches.wordIndexes,
      wordList,
      prefix: matches.prefix,
    };
  }
}

function enlarged<A extends Int32Array | Int8Array | Uint8Array | Float64Array>(array: A, size: number): A {
  const bigger = new (array.constructor as new (length: number) => A)(size);
  bigger.set(array);
  return bigger;
}

/** The words a query's terms matched, for highlighting. */
export function matchedWordsOf(matches: readonly TermMatches[]): Set<string> {
  const words = new Set<string>();
  for (const match of matches) for (const index of match.wordIndexes) words.add(match.wordList[index] as string);
  return words;
}
