import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { compareKeys } from './keys';

const modelsResponseSchema = z.object({ models: z.array(z.string()) });

export const getVehicleModels = async (year: number, make: string): Promise<string[]> =>
  (await api('GET', `/api/vehicles/models?${new URLSearchParams({ year: String(year), make })}`, { schema: modelsResponseSchema })).models;

export const vehicleModelsQueryOptions = (year: number | null, make: string | null) =>
  queryOptions({
    queryKey: compareKeys.models(year ?? 0, make ?? ''),
    queryFn: year === null || make === null ? skipToken : () => getVehicleModels(year, make),
    staleTime: Infinity,
  });

export const useVehicleModels = (year: number | null, make: string | null) => useQuery(vehicleModelsQueryOptions(year, make));
