import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { engineDetailSchema, type EngineDetail } from '@shared/schemas/vehicles';
import { api } from '@/lib/api-client';
import { vehicleKeys } from './keys';

export const getEngine = (id: string): Promise<EngineDetail> =>
  api('GET', `/api/engines/${encodeURIComponent(id)}`, { schema: engineDetailSchema });

export const engineQueryOptions = (id: string | null) =>
  queryOptions({ queryKey: vehicleKeys.engine(id ?? ''), queryFn: id === null ? skipToken : () => getEngine(id), staleTime: 60_000 });

/** An engine with its fitted coil and plug; idle until an engine is chosen. */
export const useEngine = (id: string | null) => useQuery(engineQueryOptions(id));
