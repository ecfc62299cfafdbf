import { dictionary } from '@zxcvbn-ts/language-common';
import { describe, expect, it } from 'vitest';
import { passwordProblem } from '../../shared/password-policy';
import { PASSWORD_MIN_LENGTH } from '../../shared/schemas/auth';

const EMAIL = 'robin.example@harborlane.test';

describe('password rule', () => {
  it('refuses blank and space-only passwords of any length', () => {
    for (const p of ['', ' ', ' '.repeat(PASSWORD_MIN_LENGTH), '\t'.repeat(12), ' \u00a0 '.repeat(5)]) {
      expect(passwordProblem(p, EMAIL), JSON.stringify(p)).toBe('must not be blank or only spaces');
    }
  });

  it(`refuses fewer than ${PASSWORD_MIN_LENGTH} characters`, () => {
    expect(passwordProblem('x7#Kq!2m', EMAIL)).toBe(`must have at least ${PASSWORD_MIN_LENGTH} characters`);
  });

  it('refuses the e-mail address or its name part, in any case', () => {
    expect(passwordProblem(EMAIL, EMAIL)).toBe('must not be your e-mail address or its name part');
    expect(passwordProblem('Robin.Example', EMAIL)).toBe('must not be your e-mail address or its name part');
  });

  it('refuses every long-enough password among the 2,000 most common of zxcvbn-ts’s own list', () => {
    // The list is in rank order, most common first (@zxcvbn-ts/language-common, passwords-common).
    const top = dictionary['passwords-common'].slice(0, 2000).filter((p) => p.length >= PASSWORD_MIN_LENGTH);
    expect(top.length).toBeGreaterThan(20);
    for (const p of top) expect(passwordProblem(p, EMAIL), p).toMatch(/^is a common password/);
  });

  it('refuses a common word with a digit or a year added (under a million guesses)', () => {
    for (const p of ['sunshine2024', 'football10', 'Password1!', 'qwertyuiop1']) expect(passwordProblem(p, EMAIL), p).not.toBeNull();
  });

  it('accepts a passphrase of one’s own', () => {
    for (const p of ['feeler-gauge-at-0.8mm', 'coil tower and boot', 'a-new-password-1']) expect(passwordProblem(p, EMAIL), p).toBeNull();
  });
});
