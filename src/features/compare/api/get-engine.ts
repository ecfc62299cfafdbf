import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { engineDetailSchema, type EngineDetail } from '@shared/schemas/vehicles';
import { api } from '@/lib/api-client';
import { compareKeys } from './keys';

// Compare needs an engine's spec for the summary and its fitted parts for the default original.
export const getEngine = (id: string): Promise<EngineDetail> =>
  api('GET', `/api/engines/${encodeURIComponent(id)}`, { schema: engineDetailSchema });

export const engineQueryOptions = (id: string | null) =>
  queryOptions({ queryKey: compareKeys.engine(id ?? ''), queryFn: id === null ? skipToken : () => getEngine(id), staleTime: 60_000 });

export const useEngine = (id: string | null) => useQuery(engineQueryOptions(id));
