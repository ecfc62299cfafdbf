import { defuseFormula, FORMULA_START } from './formula-text';

/**
 * CSV export that a spreadsheet opens as data, not as formulas. Rejected lines keep their cells
 * as they came, so a cell such as =HYPERLINK(…) or @SUM(…) must be defused on every way out
 * (rejected-rows download, history exports): a leading apostrophe makes Excel, LibreOffice and
 * Google Sheets show the text instead of evaluating it (the OWASP "CSV injection" advice).
 */

// Quoting also on ';' so a file opened with a semicolon locale cannot split a cell in two.
const NEEDS_QUOTES = /[",;\r\n\t]|^\s|\s$/;

/**
 * One cell, defused and quoted by RFC 4180 when it has to be. A number passed as a number is
 * ours, not a supplier's text, so -5 stays a number a spreadsheet can sum.
 */
export function escapeCsvCell(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const s = FORMULA_START.test(value) ? defuseFormula(value) : value;
  return NEEDS_QUOTES.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Rows to CSV text with CRLF line ends (RFC 4180), every cell through escapeCsvCell. */
export function toCsv(rows: readonly (readonly (string | number | null | undefined)[])[]): string {
  return rows.map((row) => row.map(escapeCsvCell).join(',')).join('\r\n') + (rows.length > 0 ? '\r\n' : '');
}
