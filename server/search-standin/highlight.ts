/**
 * `_formatted` for attributesToHighlight: matched words wrapped in the highlight tags (only the
 * typed part of a prefix match, as Meilisearch does). Cropping is not done; values are returned
 * whole. Non-string values are stringified, as Meilisearch does in `_formatted`.
 */
import { isJsonObject, type JsonObject } from './field-paths';
import { foldWord } from './text-tokens';

/** What the query matched: whole words, and prefixes highlighted only up to their own length. */
export interface MatchedWords {
  words: ReadonlySet<string>;
  prefixes: readonly string[];
}

export interface HighlightOptions {
  /** null means every retrieved attribute. */
  attributes: readonly string[] | null;
  preTag: string;
  postTag: string;
}

const WORD = /[\p{L}\p{N}]+/gu;

function highlightText(text: string, matched: MatchedWords, options: HighlightOptions): string {
  return text.replace(WORD, (word) => {
    const folded = foldWord(word);
    let length = matched.words.has(folded) ? word.length : 0;
    for (const prefix of matched.prefixes) if (folded.startsWith(prefix)) length = Math.max(length, prefix.length);
    if (length === 0) return word;
    const cut = Math.min(length, word.length);
    return `${options.preTag}${word.slice(0, cut)}${options.postTag}${word.slice(cut)}`;
  });
}

function formatValue(value: unknown, highlight: boolean, words: MatchedWords, options: HighlightOptions): unknown {
  if (typeof value === 'string') return highlight ? highlightText(value, words, options) : value;
  if (typeof value === 'number' || typeof value === 'boolean') {
    return highlight ? highlightText(String(value), words, options) : String(value);
  }
  if (Array.isArray(value)) return value.map((item) => formatValue(item, highlight, words, options));
  if (isJsonObject(value)) {
    const formatted: JsonObject = {};
    for (const [key, inner] of Object.entries(value)) formatted[key] = formatValue(inner, highlight, words, options);
    return formatted;
  }
  return value;
}

const NOTHING_MATCHED: MatchedWords = { words: new Set(), prefixes: [] };

export function formatHit(retrieved: JsonObject, words: MatchedWords | null, options: HighlightOptions): JsonObject {
  const formatted: JsonObject = {};
  const matched = words ?? NOTHING_MATCHED;
  for (const [key, value] of Object.entries(retrieved)) {
    const highlight = words !== null && (options.attributes === null || options.attributes.includes(key));
    formatted[key] = formatValue(value, highlight, matched, options);
  }
  return formatted;
}
