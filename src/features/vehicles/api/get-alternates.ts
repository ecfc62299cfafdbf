import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { alternatesResponseSchema, type Alternate } from '@shared/schemas/alternates';
import type { PartKind } from '@shared/schemas/specs';
import { api, ApiError } from '@/lib/api-client';
import { vehicleKeys } from './keys';

/** `available: false` while the server has no alternates route (or no ranking for this engine). */
export type AlternatesResult = { available: true; alternates: Alternate[] } | { available: false };

export async function getAlternates(engineId: string, kind: PartKind, includeNoGo: boolean): Promise<AlternatesResult> {
  const params = new URLSearchParams({ kind });
  if (includeNoGo) params.set('all', '1');
  try {
    const res = await api('GET', `/api/engines/${encodeURIComponent(engineId)}/alternates?${params}`, { schema: alternatesResponseSchema });
    return { available: true, alternates: res.alternates };
  } catch (e) {
    // The ranking is built by another part of the team; until it is mounted the route answers 404.
    if (e instanceof ApiError && e.status === 404) return { available: false };
    throw e;
  }
}

export const alternatesQueryOptions = (engineId: string | null, kind: PartKind, includeNoGo: boolean) =>
  queryOptions({
    queryKey: vehicleKeys.alternates(engineId ?? '', kind, includeNoGo),
    queryFn: engineId === null ? skipToken : () => getAlternates(engineId, kind, includeNoGo),
  });

/** The engine's alternates for one position, ranked by the server (best verdict first). */
export const useAlternates = (engineId: string | null, kind: PartKind, includeNoGo: boolean) =>
  useQuery(alternatesQueryOptions(engineId, kind, includeNoGo));
