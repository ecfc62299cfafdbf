import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { BENCH_VERDICTS } from '@shared/compat/bench-test';
import { sideLabelSchema, type BenchBody } from '@shared/schemas/compat';
import { api } from '@/lib/api-client';

// shared/schemas has no response schema for the bench test yet; this follows shared/compat/bench-test.ts's BenchTestResult.
const benchVerdictSchema = z.enum(BENCH_VERDICTS);
export const benchResultSchema = z.object({
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
  coil: sideLabelSchema.optional(),
  cautions: z.array(z.string()),
});
export type BenchResult = z.infer<typeof benchResultSchema>;
export type BenchVerdict = z.infer<typeof benchVerdictSchema>;

export const runBenchTest = (body: BenchBody): Promise<BenchResult> => api('POST', '/api/bench/coil', { body, schema: benchResultSchema });

/** Corrects the readings to 20 °C and holds them against the coil's windows (on the server, with the admin's settings). */
export const useRunBenchTest = () => useMutation({ mutationFn: runBenchTest });
