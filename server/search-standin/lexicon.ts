/**
 * The words of one text index and their posting lists, reachable three ways: a Map for exact
 * lookups (and fast indexing), a sorted array for prefix ranges, and a trie for Levenshtein
 * lookups. Iterating a radix tree under a short prefix took tens of milliseconds for 40,000 part
 * numbers; a sorted range is a binary search and a slice.
 *
 * The trie is flat: nodes in preorder (so in sorted order), each a letter, the index of the word
 * ending there (or -1) and the end of its subtree, interleaved in one Int32Array built from the
 * sorted array the first time a fuzzy lookup follows a publish(). It finds the same words as
 * minisearch's radix-tree fuzzyGet, which this replaces: that walk's Map iterators and string
 * building cost ~2.5 ms for a two-typo part number among 600,000 words; over the flat trie it is a
 * fraction of that.
 *
 * Lookups report words by their index in the sorted array (`words`, `lists`): a fuzzy lookup
 * meets hundreds of words, and touching each word's string and list object was most of its cost.
 * Indexes hold until the next publish().
 *
 * Words are never removed: a word whose documents are all gone keeps an empty list, which is
 * reused if the word comes back, so the views never disagree.
 */
import { createPostingList, type PostingList } from './posting-list';
import { typosBetween } from './typo-distance';

/** New words kept out of a built trie (checked one by one) before it is rebuilt. */
const MAX_RECENT_WORDS = 2000;

export class Lexicon {
  private readonly byWord = new Map<string, PostingList>();
  private sortedWords: string[] = [];
  private sortedLists: PostingList[] = [];
  /** Words added since the last publish(); not yet in the sorted array or the trie. */
  private pending: string[] = [];
  private trie: FlatTrie | null = null;
  /** Published words not in the trie (added after it was built), checked one by one. */
  private recentWords: string[] = [];

  get(word: string): PostingList | undefined {
    return this.byWord.get(word);
  }

  /** Published words, sorted; the array is replaced (not changed) by publish(). */
  get words(): readonly string[] {
    return this.sortedWords;
  }

  get lists(): readonly PostingList[] {
    return this.sortedLists;
  }

  /** The index of a published word, or -1. */
  indexOf(word: string): number {
    const low = this.lowerBound(word);
    return this.sortedWords[low] === word ? low : -1;
  }

  private lowerBound(word: string): number {
    let low = 0;
    let high = this.sortedWords.length;
    while (low < high) {
      const middle = (low + high) >>> 1;
      if ((this.sortedWords[middle] as string) < word) low = middle + 1;
      else high = middle;
    }
    return low;
  }

  /** The word's list, created if new; call publish() after a batch of additions. */
  fetch(word: string): PostingList {
    let list = this.byWord.get(word);
    if (!list) {
      list = createPostingList();
      this.byWord.set(word, list);
      this.pending.push(word);
    }
    return list;
  }

  /**
   * Makes new words visible to prefix and fuzzy lookups: once per batch, not per query. Returns,
   * when words were added, each old word's new index (for per-word data kept elsewhere), else null.
   */
  publish(): Int32Array | null {
    if (this.pending.length === 0) return null;
    const added = this.pending.sort();
    this.pending = [];
    const words: string[] = new Array<string>(this.sortedWords.length + added.length);
    const lists: PostingList[] = new Array<PostingList>(words.length);
    const moved = new Int32Array(this.sortedWords.length);
    let i = 0;
    let j = 0;
    let k = 0;
    while (i < this.sortedWords.length || j < added.length) {
      const old = this.sortedWords[i];
      const fresh = added[j];
      if (fresh === undefined || (old !== undefined && old < fresh)) {
        words[k] = old as string;
        lists[k] = this.sortedLists[i] as PostingList;
        moved[i] = k;
        i++;
      } else {
        words[k] = fresh;
        lists[k] = this.byWord.get(fresh) as PostingList;
        j++;
      }
      k++;
    }
    this.sortedWords = words;
    this.sortedLists = lists;
    if (this.trie && this.recentWords.length + added.length <= MAX_RECENT_WORDS) {
      // A few new words (a catalog edit) keep the trie: its word numbers move, and the new words
      // are checked one by one until there are enough of them to build it again.
      const nodes = this.trie;
      for (let node = 0; node < nodes.length; node += 3) {
        const found = nodes[node + WORD] as number;
        if (found >= 0) nodes[node + WORD] = moved[found] as number;
      }
      for (const word of added) this.recentWords.push(word);
    } else {
      this.trie = null;
      this.recentWords = [];
    }
    return moved;
  }

  private flatTrie(): FlatTrie {
    if (!this.trie) {
      this.trie = buildTrie(this.sortedWords);
      this.recentWords = [];
    }
    return this.trie;
  }

  /** Words published since the trie was built, with their current indexes. */
  private forEachRecentWord(visit: (word: string, index: number) => void): void {
    for (const word of this.recentWords) visit(word, this.indexOf(word));
  }

  /** Calls `visit` with the index of every word starting with `prefix`, in sorted order. */
  forEachWithPrefix(prefix: string, visit: (index: number) => void): void {
    const words = this.sortedWords;
    for (let i = this.lowerBound(prefix); i < words.length; i++) {
      if (!(words[i] as string).startsWith(prefix)) break;
      visit(i);
    }
  }

  /**
   * Words within `distance` Levenshtein edits of `word` (plain Levenshtein, as minisearch's
   * fuzzyGet counts), in sorted order.
   */
  forEachNear(word: string, distance: number, visit: (index: number) => void): void {
    if (this.sortedWords.length === 0) return;
    const nodes = this.flatTrie();
    const columns = word.length + 1;
    const maxLength = word.length + distance;
    // Row r holds the distances between the first r letters of a candidate and every prefix of
    // `word`; cells outside the band |r - c| <= distance keep distance + 1 (minisearch's scheme).
    const matrix = bandedMatrix(maxLength, columns, distance);
    const query = codesOf(word);

    const walk = (node: number, depth: number): void => {
      const found = nodes[node * 3 + WORD] as number;
      if (found >= 0 && (matrix[depth * columns + columns - 1] as number) <= distance) visit(found);
      if (depth >= maxLength) return;
      const row = depth + 1;
      const rowOffset = row * columns;
      const previousOffset = rowOffset - columns;
      const first = Math.max(0, row - distance - 1);
      const last = Math.min(columns - 1, row + distance);
      const stop = nodes[node * 3 + END] as number;
      for (let child = node + 1; child < stop; child = nodes[child * 3 + END] as number) {
        const letter = nodes[child * 3] as number;
        let best = matrix[rowOffset] as number;
        for (let c = first; c < last; c++) {
          const substitution = (matrix[previousOffset + c] as number) + (letter === query[c] ? 0 : 1);
          const deletion = (matrix[previousOffset + c + 1] as number) + 1;
          const insertion = (matrix[rowOffset + c] as number) + 1;
          let cell = substitution < deletion ? substitution : deletion;
          if (insertion < cell) cell = insertion;
          matrix[rowOffset + c + 1] = cell;
          if (cell < best) best = cell;
        }
        if (best <= distance) walk(child, row);
      }
    };
    walk(0, 0);
    this.forEachRecentWord((candidate, index) => {
      if (levenshtein(word, candidate, distance) <= distance) visit(index);
    });
  }

  /**
   * The words `forEachNear(center, centerDistance)` proposes that Meilisearch's typo rule then
   * accepts for `term` — `typosBetween(term, word, budget, asPrefix)` not null — with the typos
   * charged, in sorted order. Same words as proposing and re-checking each, but the walk also
   * carries the optimal-string-alignment distance to `term` and drops a branch as soon as no word
   * below it can be accepted (a branch whose first letter differs from the term's may only use
   * `budget - 1` edits; in prefix mode, a branch that already spells the term is a prefix match).
   */
  forEachTypoMatch(
    center: string,
    centerDistance: number,
    term: string,
    budget: 0 | 1 | 2,
    asPrefix: boolean,
    visit: (index: number, typos: number) => void,
  ): void {
    if (this.sortedWords.length === 0 || budget <= 0 || term.length === 0) return;
    const nodes = this.flatTrie();
    const maxLength = center.length + centerDistance;
    // Levenshtein to `center`, banded by centerDistance, as in forEachNear.
    const levColumns = center.length + 1;
    const lev = bandedMatrix(maxLength, levColumns, centerDistance);
    // Optimal string alignment to `term`, banded by the budget: exact up to the budget.
    const osaColumns = term.length + 1;
    const osa = bandedMatrix(maxLength, osaColumns, budget);
    const lastOsa = osaColumns - 1;
    const centerCodes = codesOf(center);
    const termCodes = codesOf(term);
    const firstLetter = termCodes[0] as number;
    // Per depth: the letter on the path, the row minimum of `osa`, and (prefix mode) the best
    // distance from the whole term to a prefix of the path so far.
    const path = new Int32Array(maxLength + 1);
    const osaRowMin = new Uint8Array(maxLength + 1);
    const bestPrefix = new Uint8Array(maxLength + 1);
    bestPrefix[0] = osa[lastOsa] as number;

    const walk = (node: number, depth: number): void => {
      const found = nodes[node * 3 + WORD] as number;
      if (found >= 0 && depth > 0 && (lev[depth * levColumns + levColumns - 1] as number) <= centerDistance) {
        const distance = asPrefix ? (bestPrefix[depth] as number) : (osa[depth * osaColumns + lastOsa] as number);
        const typos = path[0] === firstLetter ? distance : distance + 1;
        if (distance !== 0 && typos <= budget) visit(found, typos);
      }
      if (depth >= maxLength) return;
      const row = depth + 1;
      const levRow = row * levColumns;
      const levPrevious = levRow - levColumns;
      const levFirst = Math.max(0, row - centerDistance - 1);
      const levLast = Math.min(levColumns - 1, row + centerDistance);
      const osaRow = row * osaColumns;
      const osaPrevious = osaRow - osaColumns;
      const osaBefore = osaPrevious - osaColumns;
      const osaFirst = Math.max(0, row - budget - 1);
      const osaLast = Math.min(osaColumns - 1, row + budget);
      const letterBefore = depth > 0 ? (path[depth - 1] as number) : -1;
      const stop = nodes[node * 3 + END] as number;
      for (let child = node + 1; child < stop; child = nodes[child * 3 + END] as number) {
        const letter = nodes[child * 3] as number;
        let levBest = lev[levRow] as number;
        for (let c = levFirst; c < levLast; c++) {
          const substitution = (lev[levPrevious + c] as number) + (letter === centerCodes[c] ? 0 : 1);
          const deletion = (lev[levPrevious + c + 1] as number) + 1;
          const insertion = (lev[levRow + c] as number) + 1;
          let cell = substitution < deletion ? substitution : deletion;
          if (insertion < cell) cell = insertion;
          lev[levRow + c + 1] = cell;
          if (cell < levBest) levBest = cell;
        }
        if (levBest > centerDistance) continue;
        let osaBest = osa[osaRow] as number;
        for (let c = osaFirst; c < osaLast; c++) {
          const termLetter = termCodes[c] as number;
          const substitution = (osa[osaPrevious + c] as number) + (letter === termLetter ? 0 : 1);
          const deletion = (osa[osaPrevious + c + 1] as number) + 1;
          const insertion = (osa[osaRow + c] as number) + 1;
          let cell = substitution < deletion ? substitution : deletion;
          if (insertion < cell) cell = insertion;
          // Adjacent transposition: this letter and the one before are the term's c-1 and c, swapped.
          if (c > 0 && letterBefore === termLetter && letter === termCodes[c - 1]) {
            const swap = (osa[osaBefore + c - 1] as number) + 1;
            if (swap < cell) cell = swap;
          }
          osa[osaRow + c + 1] = cell;
          if (cell < osaBest) osaBest = cell;
        }
        const first = depth === 0 ? letter : (path[0] as number);
        const allowed = first === firstLetter ? budget : budget - 1;
        const prefixBest = Math.min(bestPrefix[depth] as number, osa[osaRow + lastOsa] as number);
        // No word below comes closer to the term than this (a transposition reaches back a row).
        const bound = Math.min(osaBest, (osaRowMin[depth] as number) + 1);
        if (asPrefix) {
          // A prefix of the path already spells the term: every word below is a prefix match.
          if (prefixBest === 0) continue;
          if (prefixBest > allowed && bound > allowed) continue;
        } else if (bound > allowed) continue;
        path[depth] = letter;
        osaRowMin[row] = osaBest;
        bestPrefix[row] = prefixBest;
        walk(child, row);
      }
    };
    walk(0, 0);
    this.forEachRecentWord((candidate, index) => {
      if (levenshtein(center, candidate, centerDistance) > centerDistance) return;
      const typos = typosBetween(term, candidate, budget, asPrefix);
      if (typos !== null) visit(index, typos);
    });
  }
}

/**
 * Per node, in preorder, three Int32 slots: its letter (a UTF-16 code unit), the index of the word
 * ending there or -1, and one past its subtree. Node 0 is the root; a node's first child, if any,
 * is the next node.
 */
type FlatTrie = Int32Array;
const WORD = 1;
const END = 2;

function buildTrie(words: readonly string[]): FlatTrie {
  let size = 1;
  let previous = '';
  for (const word of words) {
    size += word.length - commonPrefixLength(previous, word);
    previous = word;
  }
  const nodes = new Int32Array(size * 3);
  nodes[WORD] = -1;
  // Open nodes by depth: stack[d] is the node at depth d on the current path.
  const stack: number[] = [0];
  let next = 1;
  previous = '';
  words.forEach((word, index) => {
    const shared = commonPrefixLength(previous, word);
    while (stack.length > shared + 1) nodes[(stack.pop() as number) * 3 + END] = next;
    for (let d = shared; d < word.length; d++) {
      nodes[next * 3] = word.charCodeAt(d);
      nodes[next * 3 + WORD] = -1;
      stack.push(next);
      next++;
    }
    nodes[(stack[stack.length - 1] as number) * 3 + WORD] = index;
    previous = word;
  });
  while (stack.length > 0) nodes[(stack.pop() as number) * 3 + END] = next;
  return nodes;
}

/** Levenshtein distance between a and b, or any value above `bound` once it is sure to exceed it. */
function levenshtein(a: string, b: string, bound: number): number {
  if (Math.abs(a.length - b.length) > bound) return bound + 1;
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    let best = i;
    for (let j = 1; j <= b.length; j++) {
      const cell = Math.min(
        (previous[j] as number) + 1,
        (current[j - 1] as number) + 1,
        (previous[j - 1] as number) + (a[i - 1] === b[j - 1] ? 0 : 1),
      );
      current.push(cell);
      if (cell < best) best = cell;
    }
    if (best > bound) return bound + 1;
    previous = current;
  }
  return previous[b.length] as number;
}

function commonPrefixLength(a: string, b: string): number {
  const limit = Math.min(a.length, b.length);
  let i = 0;
  while (i < limit && a.charCodeAt(i) === b.charCodeAt(i)) i++;
  return i;
}

function codesOf(text: string): number[] {
  const codes: number[] = [];
  for (let i = 0; i < text.length; i++) codes.push(text.charCodeAt(i));
  return codes;
}

/** A (rows + 1) x columns distance matrix: first row and column 0..n, the rest distance + 1. */
function bandedMatrix(rows: number, columns: number, distance: number): Uint8Array {
  const matrix = new Uint8Array((rows + 1) * columns).fill(Math.min(255, distance + 1));
  for (let c = 0; c < columns; c++) matrix[c] = Math.min(255, c);
  for (let r = 1; r <= rows; r++) matrix[r * columns] = Math.min(255, r);
  return matrix;
}
