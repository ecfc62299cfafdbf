import { describe, expect, it } from 'vitest';
import { looksLikePartNumber, normalizePartNumber } from '../../shared/part-number';

describe('normalizePartNumber', () => {
  it.each([
    ['QW-IC 3140', 'QWIC3140'],
    ['qw ic 3140', 'QWIC3140'],
    ['qw.ic/3140', 'QWIC3140'],
    ['  QW–IC—3140 ', 'QWIC3140'],
    ['NR/IR 2208', 'NRIR2208'],
    ['sf_52.135', 'SF52135'],
    ['ＱＷ３１４０', 'QW3140'],
  ])('%s → %s', (printed, norm) => {
    expect(normalizePartNumber(printed)).toBe(norm);
  });

  it('is idempotent', () => {
    for (const s of ['QW-IC 3140', 'a.b/c-d e', 'X']) expect(normalizePartNumber(normalizePartNumber(s))).toBe(normalizePartNumber(s));
  });

  it('keeps letters and digits apart from the folded characters', () => {
    expect(normalizePartNumber('A1-B2')).not.toBe(normalizePartNumber('A1-B3'));
  });

  it('tells numbers from free text', () => {
    expect(looksLikePartNumber('QW-IC 3140')).toBe(true);
    expect(looksLikePartNumber('6291041500213')).toBe(true);
    expect(looksLikePartNumber('coil pack')).toBe(false);
    expect(looksLikePartNumber('ab')).toBe(false);
  });
});
