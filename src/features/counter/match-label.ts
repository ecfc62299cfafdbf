import { normalizePartNumber } from '@shared/part-number';
import type { SearchHit } from '@shared/schemas/search';

/**
 * How a hit matched, in the clerk's words. The server names the matched number in its folded
 * form (SPF52135); when that is what the clerk typed, the typed form is shown (SPF 52.135), and
 * for a close (typo) match the form the part prints (matchedPrinted).
 */
export function matchLabel(hit: Pick<SearchHit, 'matchedBy' | 'matchedNumber' | 'matchedPrinted'>, query: string): string {
  const typed = query.trim();
  // With no words typed, every hit is there because of the kind and spec filters.
  if (typed === '') return 'spec filters';
  const exact = hit.matchedNumber !== null && normalizePartNumber(typed) === hit.matchedNumber;
  // A close match shows the number found as it is printed, when the server knows the spelling.
  const number = exact ? typed.toUpperCase() : (hit.matchedPrinted ?? hit.matchedNumber ?? '');
  const close = exact ? '' : ' (close match)';
  switch (hit.matchedBy) {
    case 'number':
      return `number${close}`;
    case 'interchange':
      return `via interchange ${number}${close}`;
    case 'supersession':
      return `replaces ${number}${close}`;
    case 'gtin':
      return 'barcode';
    case 'vehicle':
      return 'fits vehicle';
    case 'text':
      return 'text';
  }
}
