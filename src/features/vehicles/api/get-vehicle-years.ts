import { queryOptions, useQuery } from '@tanstack/react-query';
import { vehicleYearsResponseSchema } from '@shared/schemas/vehicles';
import { api } from '@/lib/api-client';
import { vehicleKeys } from './keys';

export const getVehicleYears = async (): Promise<number[]> =>
  (await api('GET', '/api/vehicles/years', { schema: vehicleYearsResponseSchema })).years;

// The vehicle lists change only when the catalog does: keep them for the session.
export const vehicleYearsQueryOptions = () => queryOptions({ queryKey: vehicleKeys.years, queryFn: getVehicleYears, staleTime: Infinity });

export const useVehicleYears = () => useQuery(vehicleYearsQueryOptions());
