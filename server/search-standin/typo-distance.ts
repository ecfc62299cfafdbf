/**
 * Meilisearch's typo rules. Its automata count a transposition as one typo (Damerau) while the
 * lexicon's fuzzy lookup counts plain Levenshtein (as minisearch's radix tree did), so that lookup
 * only proposes candidate words and every candidate is checked by these rules (the term's own
 * lookup applies them during the walk, Lexicon.forEachTypoMatch). Meilisearch also counts a typo
 * on the first letter as two: with a one-typo budget the first letter must match.
 */

export interface TypoBudgetRules {
  enabled: boolean;
  oneTypoMinLength: number;
  twoTyposMinLength: number;
  disableOnWords: ReadonlySet<string>;
  disableOnNumbers: boolean;
}

const ALL_DIGITS = /^\d+$/;

export function typoBudget(term: string, rules: TypoBudgetRules): 0 | 1 | 2 {
  if (!rules.enabled || rules.disableOnWords.has(term)) return 0;
  if (rules.disableOnNumbers && ALL_DIGITS.test(term)) return 0;
  const length = [...term].length;
  if (length >= rules.twoTyposMinLength) return 2;
  if (length >= rules.oneTypoMinLength) return 1;
  return 0;
}

/**
 * Optimal-string-alignment distance (Levenshtein plus adjacent transpositions). When
 * `asPrefix` is set it is the distance from `query` to the closest prefix of `word`, which is how
 * Meilisearch matches the last, still-being-typed word of a query.
 */
export function osaDistance(query: string, word: string, asPrefix: boolean): number {
  const a = query;
  const b = word;
  const rows = a.length + 1;
  const cols = b.length + 1;
  // Three rolling rows are enough for OSA: the transposition looks two rows back. They are
  // reused between calls: a fuzzy lookup re-checks hundreds of candidate words.
  if (rowBuffers[0].length < cols) rowBuffers = [new Int32Array(cols * 2), new Int32Array(cols * 2), new Int32Array(cols * 2)];
  let [before, previous, current] = rowBuffers;
  before.fill(0, 0, cols);
  for (let j = 0; j < cols; j++) previous[j] = j;
  current.fill(0, 0, cols);
  for (let i = 1; i < rows; i++) {
    current[0] = i;
    const left = a.charCodeAt(i - 1);
    const leftBefore = i > 1 ? a.charCodeAt(i - 2) : -1;
    for (let j = 1; j < cols; j++) {
      const right = b.charCodeAt(j - 1);
      const cost = left === right ? 0 : 1;
      let best = Math.min((previous[j] as number) + 1, (current[j - 1] as number) + 1, (previous[j - 1] as number) + cost);
      if (i > 1 && j > 1 && left === b.charCodeAt(j - 2) && leftBefore === right) {
        best = Math.min(best, (before[j - 2] as number) + 1);
      }
      current[j] = best;
    }
    [before, previous, current] = [previous, current, before];
  }
  if (!asPrefix) return previous[cols - 1] as number;
  let closest = previous[0] as number;
  for (let j = 1; j < cols; j++) if ((previous[j] as number) < closest) closest = previous[j] as number;
  return closest;
}

let rowBuffers: [Int32Array, Int32Array, Int32Array] = [new Int32Array(64), new Int32Array(64), new Int32Array(64)];

/**
 * Number of typos Meilisearch would charge for matching `word` with query term `term`, or null
 * when the word is out of budget.
 */
export function typosBetween(term: string, word: string, budget: 0 | 1 | 2, asPrefix: boolean): number | null {
  if (budget === 0) return null;
  const distance = osaDistance(term, word, asPrefix);
  const sameFirstLetter = term[0] === word[0];
  const charged = sameFirstLetter ? distance : distance + 1;
  if (distance === 0 || charged > budget) return null;
  return charged;
}

/** All words one adjacent swap away, so transposition typos can be looked up as exact words. */
export function adjacentTranspositions(term: string): string[] {
  const variants = new Set<string>();
  for (let i = 0; i + 1 < term.length; i++) {
    if (term[i] === term[i + 1]) continue;
    variants.add(term.slice(0, i) + (term[i + 1] ?? '') + (term[i] ?? '') + term.slice(i + 2));
  }
  return [...variants];
}
