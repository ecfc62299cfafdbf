import { z } from 'zod';

/** What a readiness check found: 'ok', or why the dependency failed. */
export const checkResultSchema = z.string();
export const readinessChecksSchema = z.object({ database: checkResultSchema, search: checkResultSchema });
export type ReadinessChecks = z.infer<typeof readinessChecksSchema>;

/** GET /healthz: the process serves. */
export const livenessSchema = z.object({ status: z.literal('ok') });
export type Liveness = z.infer<typeof livenessSchema>;

/** GET /readyz when ready; otherwise 503 in the error shape with the checks as details. */
export const readinessSchema = z.object({ status: z.literal('ready'), checks: readinessChecksSchema });
export type Readiness = z.infer<typeof readinessSchema>;
