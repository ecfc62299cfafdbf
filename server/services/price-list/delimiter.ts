import { DELIMITERS, type Delimiter } from '../../../shared/price-list/delimiters';

export { DELIMITERS, type Delimiter };

const MAX_RECORDS = 50;

/**
 * Counts a delimiter per record over the first records, outside quoted fields. A quote opens a
 * field only at the field's start, as csv-parse reads it, so `5/8" hex` does not swallow the
 * rest of the sample.
 */
function countsPerRecord(sample: string, delimiter: string, complete: boolean): number[] {
  const counts: number[] = [];
  let count = 0;
  let quoting = false;
  let fieldStart = true;
  let recordEmpty = true;
  const n = sample.length;
  for (let i = 0; i < n && counts.length < MAX_RECORDS; i++) {
    const c = sample[i];
    if (quoting) {
      if (c === '"') {
        if (sample[i + 1] === '"') i++;
        else quoting = false;
      }
      continue;
    }
    if (c === '"' && fieldStart) {
      quoting = true;
      fieldStart = false;
      recordEmpty = false;
    } else if (c === delimiter) {
      count++;
      fieldStart = true;
      recordEmpty = false;
    } else if (c === '\n' || c === '\r') {
      if (!recordEmpty) counts.push(count);
      count = 0;
      fieldStart = true;
      recordEmpty = true;
    } else {
      fieldStart = false;
      recordEmpty = false;
    }
  }
  // The last record of a cut-off sample may be partial; of a whole file it counts.
  if (complete && !recordEmpty && counts.length < MAX_RECORDS) counts.push(count);
  return counts;
}

/**
 * Picks the delimiter whose count in the header is matched by the most data records, then the
 * one giving more columns. The header decides because decimal commas in a semicolon file are
 * frequent in data but absent from the header. Falls back to comma (a one-column file then
 * fails the mapping, with a clear message, rather than here).
 */
export function detectDelimiter(sample: string, complete = true): Delimiter {
  let best: Delimiter = ',';
  let bestScore = -1;
  let bestColumns = 0;
  for (const delimiter of DELIMITERS) {
    const counts = countsPerRecord(sample, delimiter, complete);
    const header = counts[0] ?? 0;
    if (header === 0) continue;
    const data = counts.slice(1);
    const score = data.length === 0 ? 1 : data.filter((c) => c === header).length / data.length;
    if (score > bestScore || (score === bestScore && header > bestColumns)) {
      best = delimiter;
      bestScore = score;
      bestColumns = header;
    }
  }
  return best;
}
