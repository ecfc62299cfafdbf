import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { vehicleMakesResponseSchema } from '@shared/schemas/vehicles';
import { api } from '@/lib/api-client';
import { vehicleKeys } from './keys';

export const getVehicleMakes = async (year: number): Promise<string[]> =>
  (await api('GET', `/api/vehicles/makes?${new URLSearchParams({ year: String(year) })}`, { schema: vehicleMakesResponseSchema })).makes;

export const vehicleMakesQueryOptions = (year: number | null) =>
  queryOptions({
    queryKey: vehicleKeys.makes(year ?? 0),
    queryFn: year === null ? skipToken : () => getVehicleMakes(year),
    staleTime: Infinity,
  });

/** Fetched once a year is chosen. */
export const useVehicleMakes = (year: number | null) => useQuery(vehicleMakesQueryOptions(year));
