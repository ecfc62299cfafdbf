import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { vehicleEnginesResponseSchema, type VehicleEngine } from '@shared/schemas/vehicles';
import { api } from '@/lib/api-client';
import { vehicleKeys } from './keys';

export const getVehicleEngines = async (year: number, make: string, model: string): Promise<VehicleEngine[]> =>
  (
    await api('GET', `/api/vehicles/engines?${new URLSearchParams({ year: String(year), make, model })}`, {
      schema: vehicleEnginesResponseSchema,
    })
  ).engines;

export const vehicleEnginesQueryOptions = (year: number | null, make: string | null, model: string | null) =>
  queryOptions({
    queryKey: vehicleKeys.engines(year ?? 0, make ?? '', model ?? ''),
    queryFn: year === null || make === null || model === null ? skipToken : () => getVehicleEngines(year, make, model),
    staleTime: Infinity,
  });

/** Fetched once year, make and model are chosen. */
export const useVehicleEngines = (year: number | null, make: string | null, model: string | null) =>
  useQuery(vehicleEnginesQueryOptions(year, make, model));
