import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { vehicleModelsResponseSchema } from '@shared/schemas/vehicles';
import { api } from '@/lib/api-client';
import { vehicleKeys } from './keys';

export const getVehicleModels = async (year: number, make: string): Promise<string[]> =>
  (await api('GET', `/api/vehicles/models?${new URLSearchParams({ year: String(year), make })}`, { schema: vehicleModelsResponseSchema }))
    .models;

export const vehicleModelsQueryOptions = (year: number | null, make: string | null) =>
  queryOptions({
    queryKey: vehicleKeys.models(year ?? 0, make ?? ''),
    queryFn: year === null || make === null ? skipToken : () => getVehicleModels(year, make),
    staleTime: Infinity,
  });

/** Fetched once a year and a make are chosen. */
export const useVehicleModels = (year: number | null, make: string | null) => useQuery(vehicleModelsQueryOptions(year, make));
