import { useMutation, useQueryClient } from '@tanstack/react-query';
import { locationResponseSchema, type UpdateLocationBody } from '@shared/schemas/locations';
import { api } from '@/lib/api-client';
import { locationKeys } from './keys';

export const updateLocation = async ({ id, body }: { id: string; body: UpdateLocationBody }) =>
  (await api('PATCH', `/api/locations/${encodeURIComponent(id)}`, { body, schema: locationResponseSchema })).location;

export function useUpdateLocation() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: updateLocation, onSuccess: () => qc.invalidateQueries({ queryKey: locationKeys.all }) });
}
