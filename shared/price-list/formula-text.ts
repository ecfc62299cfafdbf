/**
 * Text that a spreadsheet would run as a formula (the OWASP "CSV injection" starters): "=", "+",
 * "-" or "@", also full-width and after leading spaces, or a leading tab or CR, which some
 * spreadsheets strip before reading what follows. Supplier files are checked for it on intake
 * (row.ts) and every CSV export escapes it again (csv-escape.ts).
 */
export const FORMULA_START = /^[\t\r]|^\s*[=+\-@＝＋－＠]/;

/** Dashes alone are how many suppliers write "none", not a formula. */
const ONLY_DASHES = /^[\s\-－]*$/;

export function startsLikeFormula(value: string): boolean {
  return FORMULA_START.test(value) && !ONLY_DASHES.test(value);
}

/** The sign a formula would start with, to name in a reason. */
export function formulaSign(value: string): string {
  return value.trimStart().charAt(0);
}

/**
 * A description that starts like a formula keeps its words behind a leading apostrophe, which
 * every spreadsheet shows as text and never runs. The preview marks such descriptions.
 */
export function defuseFormula(value: string): string {
  return `'${value}`;
}

export function isDefusedFormula(value: string): boolean {
  return value.startsWith("'") && startsLikeFormula(value.slice(1));
}
