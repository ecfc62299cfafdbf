import { z } from 'zod';
import { BENCH_VERDICTS } from '../compat/bench-test';
import { uuidSchema } from './common';
import { sideLabelSchema } from './compat';
import { coilSpecSchema } from './specs';

/** Bench test: a coil's measured resistances against its windows, corrected to 20 °C. */

export const benchMeasuredSchema = z.object({
  primaryOhm: z.number().min(0).nullable(),
  secondaryKohm: z.number().min(0).nullable().optional(),
  temperatureC: z.number().min(-40).max(150),
});

/** The coil by its part in the catalog, or by its spec typed in; and what the meter read. */
export const benchByPartSchema = z.object({ partId: uuidSchema, measured: benchMeasuredSchema });
export const benchBySpecSchema = z.object({ spec: coilSpecSchema, measured: benchMeasuredSchema });
export const benchBodySchema = z.union([benchByPartSchema, benchBySpecSchema]);
export type BenchBody = z.infer<typeof benchBodySchema>;

export const benchVerdictSchema = z.enum(BENCH_VERDICTS);

/** POST /api/bench/coil. */
export const benchResultSchema = z
  .object({
    verdict: benchVerdictSchema,
    primaryVerdict: benchVerdictSchema,
    secondaryVerdict: benchVerdictSchema.nullable(),
    primaryAt20Ohm: z.number().nullable(),
    secondaryAt20Kohm: z.number().nullable(),
    window: z.object({
      primaryOhmMin: z.number(),
      primaryOhmMax: z.number(),
      secondaryKohmMin: z.number().nullable().optional(),
      secondaryKohmMax: z.number().nullable().optional(),
    }),
    reason: z.string(),
    coil: sideLabelSchema,
    cautions: z.array(z.string()),
  })
  .meta({ id: 'BenchResult' });
export type BenchResult = z.infer<typeof benchResultSchema>;
