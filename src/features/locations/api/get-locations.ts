import { queryOptions, useQuery } from '@tanstack/react-query';
import { locationsResponseSchema } from '@shared/schemas/locations';
import { api } from '@/lib/api-client';
import { locationKeys } from './keys';

export const getLocations = async () => (await api('GET', '/api/locations', { schema: locationsResponseSchema })).locations;

// The chain's stores change seldom: an admin's edit refreshes them at once (the mutations invalidate this key).
export const locationsQueryOptions = () => queryOptions({ queryKey: locationKeys.all, queryFn: getLocations, staleTime: 300_000 });

export const useLocations = () => useQuery(locationsQueryOptions());
