import { z } from 'zod';
import { uuidSchema } from './common';
import { interchangeCheckSchema } from './compat';
import { chainStockSchema } from './locations';
import { COIL_ARCHITECTURES, COIL_DRIVERS, PART_KINDS, PLUG_SEATS } from './specs';
import { text } from './text';

export const SEARCH_LIMIT_MAX = 100;
export const MATCHED_BY = ['number', 'interchange', 'supersession', 'gtin', 'text', 'vehicle'] as const;
export type MatchedBy = (typeof MATCHED_BY)[number];

const bool = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1');
const num = z.coerce.number().finite();

/** The spec facets a clerk can filter on, by their spec field names. */
export const searchFacetQuerySchema = z.object({
  brand: text({ max: 80 }).optional(),
  architecture: z.enum(COIL_ARCHITECTURES).optional(),
  driver: z.enum(COIL_DRIVERS).optional(),
  connectorPins: z.coerce.number().int().optional(),
  connectorKey: text({ max: 40 }).optional(),
  /** A measured or quoted primary resistance: coils whose window contains it. */
  primaryOhm: num.optional(),
  threadMm: num.optional(),
  reachMm: num.optional(),
  seat: z.enum(PLUG_SEATS).optional(),
  hexMm: num.optional(),
  heatStep: z.coerce.number().int().min(1).max(15).optional(),
  resistor: bool.optional(),
  gapMm: num.optional(),
});
export const FACET_FIELDS = Object.keys(searchFacetQuerySchema.shape) as (keyof z.infer<typeof searchFacetQuerySchema>)[];

export const searchQuerySchema = searchFacetQuerySchema.extend({
  q: text({ max: 200 }).default(''),
  kind: z.enum(PART_KINDS).optional(),
  limit: z.coerce.number().int().min(1).max(SEARCH_LIMIT_MAX).default(20),
  offset: z.coerce.number().int().min(0).max(10_000).default(0),
  /** The vehicle's engine the clerk picked: interchange claims are judged on it. */
  engineId: uuidSchema.optional(),
  /** Also count every match by spec field, for the filter controls (a pass over all matches). */
  facets: bool.optional(),
  /** For an API key, which has no home store: the store whose stock is "here" (else the chain's first). */
  location: uuidSchema.optional(),
});
export type SearchQuery = z.infer<typeof searchQuerySchema>;

export const searchHitSchema = z
  .object({
    partId: uuidSchema,
    brand: z.string(),
    partNumber: z.string(),
    kind: z.enum(PART_KINDS),
    description: z.string(),
    matchedBy: z.enum(MATCHED_BY),
    /** The number that matched, folded (SPF52135): what the index holds. */
    matchedNumber: z.string().nullable(),
    /**
     * The same number as its part or interchange row prints it (SPF 52.135), for a close (typo)
     * match, where the clerk's typing is not the number found. Null for exact and word matches.
     */
    matchedPrinted: z.string().nullable().optional(),
    /** On hand at any store of the chain. */
    inStock: z.boolean(),
    /** This store's count and bin, then the other stores': absent for technicians, who see in stock yes/no only. */
    stock: chainStockSchema.optional(),
    hasSpec: z.boolean(),
    /** For a hit found through interchange: the verdict of the foreign part's spec against ours. */
    check: interchangeCheckSchema.nullable().optional(),
  })
  .meta({ id: 'SearchHit' });
export type SearchHit = z.infer<typeof searchHitSchema>;

export const searchResponseSchema = z.object({
  hits: z.array(searchHitSchema),
  total: z.number().int(),
  facets: z.record(z.string(), z.record(z.string(), z.number())),
});
export type SearchResponse = z.infer<typeof searchResponseSchema>;
