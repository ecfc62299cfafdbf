import typoDistance from 'damerau-levenshtein';
import { normalizePartNumber } from '../../shared/part-number';
import type { MatchedBy } from '../../shared/schemas/search';
import type { PartDocument } from './part-document';

export interface MatchReason {
  matchedBy: MatchedBy;
  matchedNumber: string | null;
}

/**
 * Why a hit came back: the number the clerk typed (or the closest within a typo or two, a swap of
 * neighbours counting as one) found among ours, the interchange numbers and the superseded ones — in
 * that order — else a vehicle or free-text match.
 */
export function matchReason(doc: PartDocument, rawQuery: string): MatchReason {
  const q = normalizePartNumber(rawQuery);
  if (q.length >= 3) {
    if (doc.gtin && doc.gtin === q) return { matchedBy: 'gtin', matchedNumber: doc.gtin };
    const groups: [MatchedBy, string[]][] = [
      ['number', [doc.number]],
      ['interchange', doc.interchangeNumbers],
      ['supersession', doc.supersededNumbers],
    ];
    for (const exact of [true, false]) {
      for (const [by, numbers] of groups) {
        const hit = numbers.find((n) => (exact ? n === q : typoDistance(n, q).steps <= (q.length >= 9 ? 2 : 1)));
        if (hit) return { matchedBy: by, matchedNumber: hit };
      }
    }
  }
  const words = rawQuery
    .toLowerCase()
    .split(/\s+/)
    .filter((w) => w.length >= 2);
  const vehicleText = [...doc.vehicles, ...doc.engineCodes].join(' ').toLowerCase();
  if (words.length && words.some((w) => vehicleText.includes(w)) && !words.some((w) => doc.description.toLowerCase().includes(w))) {
    return { matchedBy: 'vehicle', matchedNumber: null };
  }
  return { matchedBy: 'text', matchedNumber: null };
}
