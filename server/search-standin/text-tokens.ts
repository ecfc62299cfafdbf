/**
 * Word splitting and folding shared by indexing, querying and highlighting, so a query term and
 * an indexed term are always folded the same way. Meilisearch (charabia) lowercases, drops
 * diacritics and splits on anything that is neither a letter nor a digit; this does the same for
 * Latin-script text, which is all the stand-in has to handle.
 */
const NON_WORD = /[^\p{L}\p{N}]+/u;
const COMBINING_MARKS = /\p{M}+/gu;
const NEEDS_FOLDING = /[^a-z0-9]/;

export function foldWord(word: string): string {
  const lower = word.toLowerCase();
  // Fast path: most indexed words (part numbers, plain words) are already ASCII.
  if (!NEEDS_FOLDING.test(lower)) return lower;
  return lower.normalize('NFKD').replace(COMBINING_MARKS, '');
}

export function tokenize(text: string): string[] {
  const words: string[] = [];
  for (const raw of text.split(NON_WORD)) {
    if (raw.length > 0) words.push(foldWord(raw));
  }
  return words;
}

/** Meilisearch only looks at the first ten words of a query. */
export const MAX_QUERY_WORDS = 10;

/** Folding of facet values for filters and facet counts: Meilisearch compares them case-insensitively. */
export function foldFacetValue(value: string): string {
  return value.trim().toLowerCase();
}
