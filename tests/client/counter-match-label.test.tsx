import { describe, expect, it } from 'vitest';
import type { SearchHit } from '@shared/schemas/search';
import { matchLabel } from '@/features/counter/match-label';
import { orderHits } from '@/features/counter/order-hits';

describe('how a hit matched', () => {
  it('shows an interchange or superseded number as the clerk typed it', () => {
    expect(matchLabel({ matchedBy: 'interchange', matchedNumber: 'SPF52135' }, 'spf 52.135')).toBe('via interchange SPF 52.135');
    expect(matchLabel({ matchedBy: 'supersession', matchedNumber: 'QWIC3138' }, ' qw-ic 3138 ')).toBe('replaces QW-IC 3138');
  });

  it('says when the number found is only close to what was typed (a typo)', () => {
    expect(matchLabel({ matchedBy: 'interchange', matchedNumber: 'SPF52135' }, 'SPF 52.153')).toBe(
      'via interchange SPF52135 (close match)',
    );
    expect(matchLabel({ matchedBy: 'number', matchedNumber: 'QWSP1406' }, 'QW-SP 1406')).toBe('number');
    // With the printed spelling from the server, a typo shows the number as the part prints it, not folded.
    expect(matchLabel({ matchedBy: 'interchange', matchedNumber: 'SPF52135', matchedPrinted: 'SPF 52.135' }, 'SPF 52.153')).toBe(
      'via interchange SPF 52.135 (close match)',
    );
    expect(matchLabel({ matchedBy: 'supersession', matchedNumber: 'QWIC3138', matchedPrinted: 'QW-IC 3138' }, 'qwic 3183')).toBe(
      'replaces QW-IC 3138 (close match)',
    );
    expect(matchLabel({ matchedBy: 'number', matchedNumber: 'QWSP1406' }, 'QW-SP 1046')).toBe('number (close match)');
  });

  it('names barcode, vehicle, text and spec-only matches in plain words', () => {
    expect(matchLabel({ matchedBy: 'gtin', matchedNumber: '2091450031018' }, '2091450031018')).toBe('barcode');
    expect(matchLabel({ matchedBy: 'vehicle', matchedNumber: null }, 'halvard')).toBe('fits vehicle');
    expect(matchLabel({ matchedBy: 'text', matchedNumber: null }, 'iridium')).toBe('text');
    expect(matchLabel({ matchedBy: 'text', matchedNumber: null }, '')).toBe('spec filters');
  });
});

const hit = (partNumber: string, verdict?: 'go' | 'review' | 'no-go'): SearchHit => ({
  partId: partNumber,
  brand: 'Quaywell',
  partNumber,
  kind: 'plug',
  description: '',
  matchedBy: 'interchange',
  matchedNumber: 'SPF52135',
  inStock: true,
  hasSpec: true,
  check: verdict ? { verdict, concerns: [], engine: 'KM13' } : null,
});

describe('order of hits', () => {
  it('moves interchange claims judged no-go below the rest, keeping the server order otherwise', () => {
    const ordered = orderHits([hit('A', 'no-go'), hit('B'), hit('C', 'review'), hit('D', 'no-go'), hit('E', 'go')]);
    expect(ordered.map((h) => h.partNumber)).toEqual(['B', 'C', 'E', 'A', 'D']);
  });

  it('returns the same list when nothing is no-go', () => {
    const hits = [hit('A', 'go'), hit('B')];
    expect(orderHits(hits)).toBe(hits);
  });
});
