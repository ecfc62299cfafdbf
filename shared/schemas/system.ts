import { z } from 'zod';

/** GET /api/health: the app answers. */
export const healthResponseSchema = z.object({ ok: z.literal(true) });
export type HealthResponse = z.infer<typeof healthResponseSchema>;

/** GET /api/openapi.json: this API's OpenAPI 3.1 document. */
export const openApiDocumentSchema = z
  .object({ openapi: z.string(), info: z.object({ title: z.string(), version: z.string() }).catchall(z.unknown()) })
  .catchall(z.unknown());
