import type { Request } from 'express';
import type { z } from 'zod';
import { plainWords } from '../../shared/validation/plain-words';

/**
 * Parses one part of a request with a shared schema, in plain words where the schema has no
 * message of its own. Throws the ZodError, which the error middleware turns into a 400 naming
 * the fields.
 */
export function parseBody<S extends z.ZodType>(schema: S, req: Request): z.infer<S> {
  return schema.parse(req.body ?? {}, { error: plainWords });
}
export function parseQuery<S extends z.ZodType>(schema: S, req: Request): z.infer<S> {
  return schema.parse(req.query, { error: plainWords });
}
export function parseParams<S extends z.ZodType>(schema: S, req: Request): z.infer<S> {
  return schema.parse(req.params, { error: plainWords });
}
