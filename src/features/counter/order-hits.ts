import type { SearchHit } from '@shared/schemas/search';

/**
 * The server's order, except that an interchange claim whose check says no-go moves below the
 * rest: with a customer waiting, a clerk takes the first row, and a wrong cross-reference row
 * must not be it. It stays listed, marked, so the clerk sees why it is not offered.
 */
export function orderHits(hits: SearchHit[]): SearchHit[] {
  const offered = hits.filter((h) => h.check?.verdict !== 'no-go');
  return offered.length === hits.length ? hits : [...offered, ...hits.filter((h) => h.check?.verdict === 'no-go')];
}
