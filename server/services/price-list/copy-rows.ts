import type { z } from 'zod';
import type { NormalisedRow } from '../../../shared/price-list/row';
import { coilSpecSchema, plugSpecSchema } from '../../../shared/schemas/specs';
import { brandNameNorm } from './brand-norm';

/**
 * Valid rows in PostgreSQL's COPY text format, for the staging table. Hand-written rather than
 * through a CSV library: escaping four characters is all COPY text needs, and this runs once per
 * row of files with hundreds of thousands of rows.
 */

export const STAGING_COLUMNS = [
  'price_list_id',
  'line',
  'brand',
  'brand_norm',
  'part_number',
  'part_number_norm',
  'description',
  'cost_cents',
  'list_cents',
  'core_cents',
  'pack_qty',
  'gtin',
  'supersedes',
  'supersedes_norm',
  'kind',
  'coil',
  'plug',
] as const;

export const STAGING_COPY_SQL = `COPY price_list_row (${STAGING_COLUMNS.join(', ')}) FROM STDIN`;

const SPECIAL = /[\\\t\n\r]/;
const SPECIAL_ALL = /[\\\t\n\r]/g;
const ESCAPES: Record<string, string> = { '\\': '\\\\', '\t': '\\t', '\n': '\\n', '\r': '\\r' };

function text(value: string | null): string {
  if (value === null) return '\\N';
  return SPECIAL.test(value) ? value.replace(SPECIAL_ALL, (c) => ESCAPES[c] ?? c) : value;
}

function int(value: number | null): string {
  return value === null ? '\\N' : String(value);
}

/** The keys a spec must have to be stored: those its schema does not let be left out. */
function requiredKeys(shape: Record<string, z.ZodType>): string[] {
  return Object.entries(shape)
    .filter(([, schema]) => !schema.safeParse(undefined).success)
    .map(([key]) => key);
}
const COIL_REQUIRED = requiredKeys(coilSpecSchema.shape);
const PLUG_REQUIRED = requiredKeys(plugSpecSchema.shape);

/**
 * The spec as JSON when the file gave all of it, else null: a part with half a spec would get a
 * verdict from values nobody gave, so it is stored without one ("no spec — no verdict").
 * The row validator has checked each value; the schema adds the checks across fields.
 */
function completeSpec(spec: Record<string, unknown> | undefined, required: string[], schema: z.ZodType): string | null {
  if (spec === undefined) return null;
  for (const key of required) if (spec[key] === undefined) return null;
  const parsed = schema.safeParse(spec);
  return parsed.success ? JSON.stringify(parsed.data) : null;
}

/** One row as a COPY text line, newline included. */
export function copyLine(listId: string, row: NormalisedRow): string {
  const coil = completeSpec(row.coil, COIL_REQUIRED, coilSpecSchema);
  const plug = completeSpec(row.plug, PLUG_REQUIRED, plugSpecSchema);
  return (
    `${listId}\t${row.line}\t${text(row.brand)}\t${text(brandNameNorm(row.brand))}\t${text(row.partNumber)}\t${text(row.partNumberNorm)}\t` +
    `${text(row.description)}\t${row.costCents}\t${row.listCents}\t${int(row.coreCents)}\t${int(row.packQty)}\t${text(row.gtin)}\t` +
    `${text(row.supersedes)}\t${text(row.supersedesNorm)}\t${text(row.kind)}\t${text(coil)}\t${text(plug)}\n`
  );
}
