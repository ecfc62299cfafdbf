import { useMutation, useQueryClient } from '@tanstack/react-query';
import { locationResponseSchema, type LocationBody } from '@shared/schemas/locations';
import { api } from '@/lib/api-client';
import { locationKeys } from './keys';

export const createLocation = async (body: LocationBody) =>
  (await api('POST', '/api/locations', { body, schema: locationResponseSchema })).location;

export function useCreateLocation() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createLocation, onSuccess: () => qc.invalidateQueries({ queryKey: locationKeys.all }) });
}
