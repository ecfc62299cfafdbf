import { z } from 'zod';
import { text } from './text';

/** Pieces every resource's schemas use. */

export const uuidSchema = z.string().uuid();
export const idParamSchema = z.object({ id: uuidSchema });

/** An e-mail address as typed: trimmed and lower-cased before it is checked. */
export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email())
  .pipe(z.string().max(254))
  // The document shows what the pipe checks, not the trimming before it.
  .meta({ format: 'email', maxLength: 254 });

/** A moment in time as the API writes it: ISO 8601 in UTC. */
export const timestampSchema = z.iso.datetime();

/** A list's page, from the query string. */
export const offsetQuerySchema = (max: number) => z.coerce.number().int().min(0).max(max).default(0);
export const limitQuerySchema = (max: number, fallback: number) => z.coerce.number().int().min(1).max(max).default(fallback);
/** Which way a list the server sorts runs, from the query string (`sort` names the column). */
export const SORT_DIRECTIONS = ['asc', 'desc'] as const;
export type SortDirection = (typeof SORT_DIRECTIONS)[number];
export const sortDirQuerySchema = z.enum(SORT_DIRECTIONS).default('asc');

/** A part number as printed on the box or in a supplier's list ("CP-4417", "ix 7 18"). */
export const printedNumberSchema = text({ min: 1, max: 60 });
