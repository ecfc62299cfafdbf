/**
 * The words of one text index and their posting lists, reachable three ways: a Map for exact
 * lookups (and fast indexing), a sorted array for prefix ranges, and minisearch's radix tree
 * (SearchableMap) for Levenshtein lookups. Iterating the radix tree under a short prefix took tens
 * of milliseconds for 40,000 part numbers; a sorted range is a binary search and a slice.
 *
 * Words are never removed: a word whose documents are all gone keeps an empty list, which is
 * reused if the word comes back, so the three views never disagree.
 */
import SearchableMap from 'minisearch/SearchableMap';
import { createPostingList, type PostingList } from './posting-list';

export class Lexicon {
  private readonly byWord = new Map<string, PostingList>();
  private readonly tree = new SearchableMap<PostingList>();
  private sortedWords: string[] = [];
  private sortedLists: PostingList[] = [];
  /** Words added since the last publish(); not yet in the sorted array or the tree. */
  private pending: string[] = [];

  get(word: string): PostingList | undefined {
    return this.byWord.get(word);
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

  /** Makes new words visible to prefix and fuzzy lookups: once per batch, not per query. */
  publish(): void {
    if (this.pending.length === 0) return;
    const added = this.pending.sort();
    this.pending = [];
    for (const word of added) this.tree.set(word, this.byWord.get(word) as PostingList);
    const words: string[] = new Array<string>(this.sortedWords.length + added.length);
    const lists: PostingList[] = new Array<PostingList>(words.length);
    let i = 0;
    let j = 0;
    let k = 0;
    while (i < this.sortedWords.length || j < added.length) {
      const old = this.sortedWords[i];
      const fresh = added[j];
      if (fresh === undefined || (old !== undefined && old < fresh)) {
        words[k] = old as string;
        lists[k] = this.sortedLists[i] as PostingList;
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
  }

  /** Calls `visit` for every word starting with `prefix`, in sorted order. */
  forEachWithPrefix(prefix: string, visit: (word: string, list: PostingList) => void): void {
    let low = 0;
    let high = this.sortedWords.length;
    while (low < high) {
      const middle = (low + high) >>> 1;
      if ((this.sortedWords[middle] as string) < prefix) low = middle + 1;
      else high = middle;
    }
    for (let i = low; i < this.sortedWords.length; i++) {
      const word = this.sortedWords[i] as string;
      if (!word.startsWith(prefix)) break;
      visit(word, this.sortedLists[i] as PostingList);
    }
  }

  /** Words within `distance` Levenshtein edits of `word`. */
  forEachNear(word: string, distance: number, visit: (word: string, list: PostingList) => void): void {
    for (const [near, [list]] of this.tree.fuzzyGet(word, distance)) visit(near, list);
  }
}
