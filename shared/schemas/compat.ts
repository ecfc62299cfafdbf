import { z } from 'zod';
import { uuidSchema } from './common';
import { coilSpecSchema, engineSpecSchema, resolvedPlugSpecSchema } from './specs';

/** Compare: an original against a substitute, coil or plug, on an engine (compat-model.md). */

// ---------- requests ----------

/** A coil or plug given by its part in the catalog, or by a spec typed in (a part we do not stock, a measured coil). */
export const coilRefSchema = z.union([z.object({ partId: uuidSchema }).strict(), z.object({ spec: coilSpecSchema }).strict()]);
export const plugRefSchema = z.union([z.object({ partId: uuidSchema }).strict(), z.object({ spec: resolvedPlugSpecSchema }).strict()]);
export const engineRefSchema = z.union([z.object({ engineId: uuidSchema }).strict(), z.object({ spec: engineSpecSchema }).strict()]);
export type CoilRef = z.infer<typeof coilRefSchema>;
export type PlugRef = z.infer<typeof plugRefSchema>;
export type EngineRef = z.infer<typeof engineRefSchema>;

export const coilCompareBodySchema = z.object({ original: coilRefSchema, substitute: coilRefSchema, engine: engineRefSchema });
export type CoilCompareBody = z.infer<typeof coilCompareBodySchema>;

export const plugCompareBodySchema = z.object({
  original: plugRefSchema,
  substitute: plugRefSchema,
  engine: engineRefSchema,
  /** The coil that supplies the voltage; the engine's fitted coil when left out. */
  coil: coilRefSchema.optional(),
});
export type PlugCompareBody = z.infer<typeof plugCompareBodySchema>;

// ---------- responses ----------

export const VERDICTS = ['go', 'review', 'no-go'] as const;
export const verdictSchema = z.enum(VERDICTS);

export const checkSchema = z
  .object({
    id: z.string(),
    verdict: verdictSchema,
    original: z.union([z.number(), z.string(), z.null()]),
    substitute: z.union([z.number(), z.string(), z.null()]),
    unit: z.string(),
    reason: z.string(),
  })
  .meta({ id: 'CheckRow' });
export type CheckRow = z.infer<typeof checkSchema>;

/**
 * A claim of equivalence judged: the foreign part's own spec against ours, on the engine named.
 * `concerns` are the checks that are not go, with their reasons.
 */
export const interchangeCheckSchema = z
  .object({
    verdict: verdictSchema,
    concerns: z.array(checkSchema.pick({ id: true, verdict: true, reason: true })),
    engine: z.string(),
  })
  .meta({ id: 'InterchangeCheck' });
export type InterchangeCheck = z.infer<typeof interchangeCheckSchema>;

export const loadPointSchema = z.object({
  name: z.enum(['idle', 'cruise', 'full', 'boost']),
  mapKpa: z.number(),
  advanceDeg: z.number(),
  gapMm: z.number(),
  requiredKv: z.number(),
  availableKv: z.number(),
  reservePct: z.number(),
});

const currentSampleSchema = z.object({ tMs: z.number(), amps: z.number() });
const curvePairSchema = z.object({ original: z.array(currentSampleSchema), substitute: z.array(currentSampleSchema) });

export const sideLabelSchema = z.object({ label: z.string(), partId: uuidSchema.nullable() });
export type SideLabel = z.infer<typeof sideLabelSchema>;

/** POST /api/compat/coil and /api/compat/plug; also the `result` of a fit report. */
export const compatResultSchema = z
  .object({
    kind: z.enum(['coil', 'plug']),
    verdict: verdictSchema,
    checks: z.array(checkSchema),
    loadPoints: z.array(loadPointSchema),
    /** The original's own load points, for the chart's second line. */
    originalLoadPoints: z.array(loadPointSchema),
    /** Coils only: primary current at charging voltage over 0 … 1.5 × running dwell. */
    currents: curvePairSchema.optional(),
    /** Coils only: the same at cranking voltage over 0 … 1.5 × cranking dwell. */
    crankingCurrents: curvePairSchema.optional(),
    energyMj: z.object({ original: z.number(), substitute: z.number() }).optional(),
    driverLimitA: z.number().nullable().optional(),
    dwellMs: z.number().optional(),
    crankingDwellMs: z.number().optional(),
    original: sideLabelSchema,
    substitute: sideLabelSchema,
    engine: z.object({ label: z.string(), engineId: uuidSchema.nullable() }),
    cautions: z.array(z.string()),
  })
  .meta({ id: 'CompatResult' });
export type CompatResult = z.infer<typeof compatResultSchema>;

/** The cautions of the product, shown on Compare, Bench test and every fit report. */
export const CAUTIONS = [
  'Secondary ignition voltage reaches tens of kilovolts: keep clear of coil towers and leads with the engine running.',
  'A wrong reach or heat range can damage an engine.',
  "Verdicts support a decision; they do not replace the vehicle maker's service information, local regulations or licensed practice.",
] as const;
