import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { partSummarySchema, priceSchema } from '@shared/schemas/catalog';
import { engineSpecSchema } from '@shared/schemas/specs';
import { api } from '@/lib/api-client';
import { catalogKeys } from './keys';
import { partSpecSchema, stockViewSchema } from './response-shapes';

const engineSchema = engineSpecSchema.extend({ id: z.string(), description: z.string(), systemVoltage: z.number() });
export type EngineDetail = z.infer<typeof engineSchema>;

const fitmentSchema = z.object({
  part: partSummarySchema,
  spec: partSpecSchema.nullable(),
  position: z.enum(['ignition coil', 'spark plug']),
  quantity: z.number().int(),
  stock: stockViewSchema,
  price: priceSchema.nullable(),
});
export type Fitment = z.infer<typeof fitmentSchema>;

const engineResponseSchema = z.object({ engine: engineSchema, fitments: z.array(fitmentSchema) });
export type EngineResponse = z.infer<typeof engineResponseSchema>;

export const getEngine = (id: string): Promise<EngineResponse> =>
  api('GET', `/api/engines/${encodeURIComponent(id)}`, { schema: engineResponseSchema });

export const engineQueryOptions = (id: string | null) =>
  queryOptions({ queryKey: catalogKeys.engine(id ?? ''), queryFn: id === null ? skipToken : () => getEngine(id) });

/** An engine with its fitted coil and plug; idle until an engine is chosen. */
export const useEngine = (id: string | null) => useQuery(engineQueryOptions(id));
