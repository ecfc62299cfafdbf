/**
 * The one normaliser of part numbers: every number is folded by this function once, on write,
 * and every search folds its query the same way. Case, spaces, dashes, dots, slashes and
 * underscores are folded because customers and suppliers print the same number all of these ways.
 */
export function normalizePartNumber(printed: string): string {
  return printed
    .normalize('NFKC')
    .toUpperCase()
    .replace(/[\s\-‐‑‒–—./\\_]+/g, '');
}

/** True when a string looks like a part number rather than free text: one token, has a digit. */
export function looksLikePartNumber(query: string): boolean {
  const trimmed = query.trim();
  return trimmed.length >= 3 && /\d/.test(trimmed) && !/\s{2,}/.test(trimmed) && trimmed.split(/\s+/).length <= 3;
}
