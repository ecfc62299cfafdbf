/**
 * Field delimiters suppliers use: comma, semicolon (European spreadsheets, where the comma is the
 * decimal mark), tab (text exports), pipe (fixed exports of older order systems) — common practice.
 * The file's delimiter is guessed from its first lines; the buyer may choose another.
 */
export const DELIMITERS = [',', ';', '\t', '|'] as const;
export type Delimiter = (typeof DELIMITERS)[number];

export const DELIMITER_LABELS: Record<Delimiter, string> = {
  ',': 'Comma ( , )',
  ';': 'Semicolon ( ; )',
  '\t': 'Tab',
  '|': 'Pipe ( | )',
};

export const isDelimiter = (value: string | null | undefined): value is Delimiter =>
  (DELIMITERS as readonly string[]).includes(value ?? '');
