import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { compareKeys } from './keys';

const makesResponseSchema = z.object({ makes: z.array(z.string()) });

export const getVehicleMakes = async (year: number): Promise<string[]> =>
  (await api('GET', `/api/vehicles/makes?${new URLSearchParams({ year: String(year) })}`, { schema: makesResponseSchema })).makes;

export const vehicleMakesQueryOptions = (year: number | null) =>
  queryOptions({
    queryKey: compareKeys.makes(year ?? 0),
    queryFn: year === null ? skipToken : () => getVehicleMakes(year),
    staleTime: Infinity,
  });

export const useVehicleMakes = (year: number | null) => useQuery(vehicleMakesQueryOptions(year));
