import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';
import { PASSWORD_MIN_LENGTH } from './schemas/auth';

/**
 * The password rule, the same on the server (invitation accepted, any password set) and in the
 * client (said before the form is sent). The length comes from the request schema; the rest
 * needs the account's e-mail, so it runs here rather than in that schema. zxcvbn-ts's common
 * dictionaries (its password list, keyboard walks, repeats, sequences) judge what is guessable.
 */

/**
 * Scores 0 and 1 are under a million guesses (zxcvbn's README: 1 is "very guessable: protection
 * from throttled online attacks", below 10^6): a common password, or one with a digit added.
 */
const MIN_SCORE = 2;

let estimator: ZxcvbnFactory | null = null;

/** Built on first use: ranking the dictionaries takes a moment that a page without a password form need not pay. */
function zxcvbn(): ZxcvbnFactory {
  estimator ??= new ZxcvbnFactory({ dictionary, graphs: adjacencyGraphs });
  return estimator;
}

/** What is wrong with a new password for this account, in plain words, or null when it may be used. */
export function passwordProblem(password: string, email: string): string | null {
  if (password.trim() === '') return 'must not be blank or only spaces';
  if (password.length < PASSWORD_MIN_LENGTH) return `must have at least ${PASSWORD_MIN_LENGTH} characters`;
  const address = email.trim().toLowerCase();
  const localPart = address.split('@')[0] ?? '';
  const folded = password.trim().toLowerCase();
  if (folded === address || (localPart !== '' && folded === localPart)) return 'must not be your e-mail address or its name part';
  if (zxcvbn().check(password, [address, localPart]).score < MIN_SCORE) {
    return 'is a common password or too close to one; choose a longer phrase of your own';
  }
  return null;
}
