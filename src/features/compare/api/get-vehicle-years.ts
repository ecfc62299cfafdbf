import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { compareKeys } from './keys';

const yearsResponseSchema = z.object({ years: z.array(z.number().int()) });

export const getVehicleYears = async (): Promise<number[]> =>
  (await api('GET', '/api/vehicles/years', { schema: yearsResponseSchema })).years;

// The vehicle lists change only when the catalog does: keep them for the session.
export const vehicleYearsQueryOptions = () => queryOptions({ queryKey: compareKeys.years, queryFn: getVehicleYears, staleTime: Infinity });

export const useVehicleYears = () => useQuery(vehicleYearsQueryOptions());
