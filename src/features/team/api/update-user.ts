import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateUserBody } from '@shared/schemas/users';
import { api } from '@/lib/api-client';
import { teamKeys } from './keys';

export const updateUser = ({ id, ...body }: UpdateUserBody & { id: string }) => api('PATCH', `/api/users/${id}`, { body });

export function useUpdateUser() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: updateUser, onSuccess: () => qc.invalidateQueries({ queryKey: teamKeys.users }) });
}
