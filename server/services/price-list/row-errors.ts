import type pg from 'pg';
import type { RowError } from '../../../shared/price-list/row';

/** A rejected line's cells kept for the download, each cut to this: enough to find and fix the line. */
const RAW_CELL_CHARS = 2000;

export interface RowErrorEntry {
  line: number;
  column: string | null;
  field: string | null;
  message: string;
  raw: string[] | null;
}

const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

/** Text cut inside a surrogate pair would make JSON that PostgreSQL refuses; U+FFFD stands in. */
function wellFormed(s: string): string {
  return s.replace(LONE_SURROGATE, '\uFFFD');
}

function keepCell(cell: string): string {
  return wellFormed(cell.length > RAW_CELL_CHARS ? `${cell.slice(0, RAW_CELL_CHARS)}…` : cell);
}

export function toEntries(errors: readonly RowError[], cells: readonly string[] | null): RowErrorEntry[] {
  const raw = cells === null ? null : cells.map(keepCell);
  return errors.map((e) => ({
    line: e.line,
    column: e.column === null ? null : wellFormed(e.column),
    field: e.field,
    message: wellFormed(e.message),
    raw,
  }));
}

/** Writes rejected-line reasons in one statement per batch, on the connection (and transaction) given. */
export async function insertRowErrors(client: pg.PoolClient, listId: string, entries: readonly RowErrorEntry[]): Promise<void> {
  if (entries.length === 0) return;
  await client.query(
    `INSERT INTO price_list_row_error (price_list_id, line, "column", field, message, raw, source)
     SELECT $1, x.line, x."column", x.field, x.message, x.raw, 'file'
       FROM jsonb_to_recordset($2::jsonb) AS x(line integer, "column" text, field text, message text, raw jsonb)`,
    [listId, JSON.stringify(entries)],
  );
}
