import { z } from 'zod';
import { stockSchema } from '@shared/schemas/catalog';
import { coilSpecSchema, resolvedPlugSpecSchema, type CoilSpec, type ResolvedPlugSpec } from '@shared/schemas/specs';

/**
 * Pieces of the engine, part and alternates responses that shared/ has no schema for yet:
 * the stock a role may see and the spec of either kind.
 */

/** Clerks, buyers and admins get count and bin; a technician gets only in-stock yes/no. */
export const stockViewSchema = z.union([stockSchema, z.object({ inStock: z.boolean() })]);
export type StockView = z.infer<typeof stockViewSchema>;

export const partSpecSchema = z.union([coilSpecSchema, resolvedPlugSpecSchema]);
export type PartSpec = CoilSpec | ResolvedPlugSpec;

export const isCoilSpec = (spec: PartSpec): spec is CoilSpec => 'architecture' in spec;

export const partRefSchema = z.object({ id: z.string(), partNumber: z.string() });
export type PartRef = z.infer<typeof partRefSchema>;
