import { normalizePartNumber } from '../../shared/part-number';
import type { MatchedBy } from '../../shared/schemas/search';
import type { PartDocument } from './part-document';

/** Optimal-string-alignment distance: a swap of two neighbours is one typo, as a person counts it. */
export function typoDistance(a: string, b: string, max = 2): number {
  if (Math.abs(a.length - b.length) > max) return max + 1;
  const d: number[][] = Array.from({ length: a.length + 1 }, (_, i) =>
    Array.from({ length: b.length + 1 }, (_, j) => (i === 0 ? j : j === 0 ? i : 0)),
  );
  for (let i = 1; i <= a.length; i++) {
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let v = Math.min(d[i - 1]![j]! + 1, d[i]![j - 1]! + 1, d[i - 1]![j - 1]! + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) v = Math.min(v, d[i - 2]![j - 2]! + 1);
      d[i]![j] = v;
    }
  }
  return d[a.length]![b.length]!;
}

export interface MatchReason {
  matchedBy: MatchedBy;
  matchedNumber: string | null;
}

/**
 * Why a hit came back: the number the clerk typed (or the closest within a typo or two) found
 * among ours, the interchange numbers and the superseded ones — in that order — else a vehicle or
 * free-text match.
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
        const hit = numbers.find((n) => (exact ? n === q : typoDistance(n, q) <= (q.length >= 9 ? 2 : 1)));
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
