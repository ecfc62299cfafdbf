/**
 * The stand-in's fuzzy word lookups against references: forEachNear must find exactly the words
 * minisearch's radix-tree fuzzyGet finds, and forEachTypoMatch exactly those of forEachNear that
 * typosBetween accepts, with the same typo count. Random lexicons over small alphabets, so that
 * many words are a few edits apart; no database needed.
 */
import { describe, expect, it } from 'vitest';
import SearchableMap from 'minisearch/SearchableMap';
import { Lexicon } from '../../../server/search-standin/lexicon';
import { typosBetween } from '../../../server/search-standin/typo-distance';

function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

function randomWord(random: () => number, alphabet: string, minLength: number, maxLength: number): string {
  const length = minLength + Math.floor(random() * (maxLength - minLength + 1));
  let word = '';
  for (let i = 0; i < length; i++) word += alphabet[Math.floor(random() * alphabet.length)];
  return word;
}

/** A word a few random edits (substitution, insertion, deletion, swap) away from `word`. */
function mutate(random: () => number, word: string, alphabet: string): string {
  let out = word;
  const edits = Math.floor(random() * 4);
  for (let e = 0; e < edits; e++) {
    const at = Math.floor(random() * (out.length + 1));
    const letter = alphabet[Math.floor(random() * alphabet.length)] as string;
    const kind = Math.floor(random() * 4);
    if (kind === 0) out = out.slice(0, at) + letter + out.slice(at + 1);
    else if (kind === 1) out = out.slice(0, at) + letter + out.slice(at);
    else if (kind === 2 && out.length > 1) out = out.slice(0, at) + out.slice(at + 1);
    else if (at + 1 < out.length) out = out.slice(0, at) + (out[at + 1] as string) + (out[at] as string) + out.slice(at + 2);
  }
  return out.length > 0 ? out : word;
}

function buildLexicon(words: readonly string[], batches: number): { lexicon: Lexicon; tree: SearchableMap<number> } {
  const lexicon = new Lexicon();
  const tree = new SearchableMap<number>();
  const size = Math.ceil(words.length / batches);
  for (let from = 0; from < words.length; from += size) {
    for (const word of words.slice(from, from + size)) {
      lexicon.fetch(word);
      tree.set(word, 1);
    }
    lexicon.publish();
  }
  return { lexicon, tree };
}

const CASES = [
  { alphabet: 'ab', seed: 1 },
  { alphabet: 'abc', seed: 2 },
  { alphabet: 'abcd0123', seed: 3 },
  { alphabet: 'blp0123456789', seed: 4 },
];

describe('stand-in lexicon fuzzy lookups', () => {
  for (const { alphabet, seed } of CASES) {
    const random = seeded(seed);
    const base = Array.from({ length: 400 }, () => randomWord(random, alphabet, 1, 9));
    const words = [...new Set([...base, ...base.map((word) => mutate(random, word, alphabet))])];
    const { lexicon, tree } = buildLexicon(words, 3);
    const queries = Array.from({ length: 60 }, () => mutate(random, randomWord(random, alphabet, 1, 10), alphabet));

    it(`indexOf and forEachWithPrefix agree with the word list (alphabet ${alphabet})`, () => {
      const sorted = [...words].sort();
      expect(lexicon.words).toEqual(sorted);
      for (const query of queries) {
        expect(lexicon.indexOf(query)).toBe(sorted.indexOf(query));
        const found: string[] = [];
        lexicon.forEachWithPrefix(query.slice(0, 2), (index) => found.push(lexicon.words[index] as string));
        expect(found).toEqual(sorted.filter((word) => word.startsWith(query.slice(0, 2))));
      }
    });

    it(`keeps finding the same words when a few are added after the trie is built (alphabet ${alphabet})`, () => {
      const grown = buildLexicon(words, 1);
      grown.lexicon.forEachNear('a', 1, () => undefined); // builds the trie
      const extra = Array.from({ length: 120 }, () => mutate(random, randomWord(random, alphabet, 1, 9), alphabet));
      for (let from = 0; from < extra.length; from += 40) {
        for (const word of extra.slice(from, from + 40)) {
          grown.lexicon.fetch(word);
          grown.tree.set(word, 1);
        }
        grown.lexicon.publish();
        for (const query of queries.slice(0, 20)) {
          for (const distance of [1, 2]) {
            const found: string[] = [];
            grown.lexicon.forEachNear(query, distance, (index) => found.push(grown.lexicon.words[index] as string));
            expect(found.sort(), `${query} within ${distance}`).toEqual([...grown.tree.fuzzyGet(query, distance).keys()].sort());
            for (const asPrefix of [false, true]) {
              const typoFound: string[] = [];
              grown.lexicon.forEachTypoMatch(query, distance, query, distance as 1 | 2, asPrefix, (index, typos) => {
                typoFound.push(`${grown.lexicon.words[index] as string}:${typos}`);
              });
              const expected = found
                .map((word) => [word, typosBetween(query, word, distance as 1 | 2, asPrefix)] as const)
                .filter(([, typos]) => typos !== null)
                .map(([word, typos]) => `${word}:${typos}`);
              expect(typoFound.sort()).toEqual(expected.sort());
            }
          }
        }
      }
    });

    it(`forEachNear finds what minisearch's fuzzyGet finds (alphabet ${alphabet})`, () => {
      for (const query of queries) {
        for (const distance of [0, 1, 2]) {
          const found: string[] = [];
          lexicon.forEachNear(query, distance, (index) => found.push(lexicon.words[index] as string));
          const expected = [...tree.fuzzyGet(query, distance).keys()].sort();
          expect(found, `${query} within ${distance}`).toEqual(expected);
        }
      }
    });

    it(`forEachTypoMatch keeps exactly the proposals typosBetween accepts (alphabet ${alphabet})`, { timeout: 60_000 }, () => {
      for (const term of queries) {
        const centers = [term, ...Array.from({ length: 3 }, () => mutate(random, term, alphabet))];
        for (const center of centers) {
          for (const budget of [1, 2] as const) {
            for (const centerDistance of [budget - 1, budget]) {
              for (const asPrefix of [false, true]) {
                const found: Array<[string, number]> = [];
                lexicon.forEachTypoMatch(center, centerDistance, term, budget, asPrefix, (index, typos) => {
                  found.push([lexicon.words[index] as string, typos]);
                });
                const expected: Array<[string, number]> = [];
                lexicon.forEachNear(center, centerDistance, (index) => {
                  const word = lexicon.words[index] as string;
                  const typos = typosBetween(term, word, budget, asPrefix);
                  if (typos !== null) expected.push([word, typos]);
                });
                expect(found, `${term} around ${center}±${centerDistance}, budget ${budget}${asPrefix ? ', prefix' : ''}`).toEqual(
                  expected,
                );
              }
            }
          }
        }
      }
    });
  }
});
