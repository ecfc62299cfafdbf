/**
 * GS1 GTIN check digits (GTIN-8, -12, -13, -14: EAN-8, UPC-A, EAN-13, ITF-14).
 * Algorithm from the GS1 General Specifications, "Check digit calculation": weight the body's
 * digits 3, 1, 3, 1 … starting from the digit next to the check digit, and the check digit
 * brings the weighted sum up to a multiple of ten. Weights run from the right, so leading
 * zeros change nothing: a GTIN-12 padded to 14 digits keeps its check digit.
 */

export const GTIN_LENGTHS = [8, 12, 13, 14] as const;

const DIGITS = /^\d+$/;

/** The check digit for a GTIN body (every digit except the last). Throws on a non-digit body. */
export function gtinCheckDigit(body: string): number {
  if (!DIGITS.test(body)) throw new Error('GTIN body must be digits only');
  let sum = 0;
  let weight = 3;
  for (let i = body.length - 1; i >= 0; i--) {
    sum += (body.charCodeAt(i) - 48) * weight;
    weight = 4 - weight;
  }
  return (10 - (sum % 10)) % 10;
}

/** True for an 8, 12, 13 or 14 digit code whose last digit is its GS1 check digit. */
export function isValidGtin(code: string): boolean {
  if (!DIGITS.test(code)) return false;
  if (!(GTIN_LENGTHS as readonly number[]).includes(code.length)) return false;
  return gtinCheckDigit(code.slice(0, -1)) === code.charCodeAt(code.length - 1) - 48;
}
