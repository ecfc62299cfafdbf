import { expect } from 'vitest';
import type { Check } from '../../../shared/compat/types';

/** A reason is one plain English sentence: capitalised, one full stop at the end, no line breaks. */
export function expectOneSentence(check: Check): void {
  expect(check.reason, check.id).toMatch(/^[A-Z]/);
  expect(check.reason, check.id).toMatch(/[^.]\.$/);
  expect(check.reason.slice(0, -1), check.id).not.toMatch(/\.\s/);
  expect(check.reason, check.id).not.toMatch(/\n|NaN|Infinity|undefined|null/);
}

/** Rows that compare numbers say them, with a unit. */
export function expectFigures(check: Check, unitPattern: RegExp): void {
  expect(check.reason, check.id).toMatch(/\d/);
  expect(check.reason, check.id).toMatch(unitPattern);
}
