import type { Request } from 'express';
import type { z } from 'zod';

/**
 * Parses one part of a request with a shared schema. Throws the ZodError, which the error
 * middleware turns into a 400 naming the fields.
 */
export function parseBody<S extends z.ZodType>(schema: S, req: Request): z.infer<S> {
  return schema.parse(req.body ?? {});
}
export function parseQuery<S extends z.ZodType>(schema: S, req: Request): z.infer<S> {
  return schema.parse(req.query);
}
export function parseParams<S extends z.ZodType>(schema: S, req: Request): z.infer<S> {
  return schema.parse(req.params);
}
