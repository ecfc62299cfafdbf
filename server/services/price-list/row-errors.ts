import type { RowError } from '../../../shared/price-list/row';
import type { RowErrorEntry } from '../../repositories/price-list-rows.repository';

/** A rejected line's cells kept for the download, each cut to this: enough to find and fix the line. */
const RAW_CELL_CHARS = 2000;

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
