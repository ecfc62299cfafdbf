import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InviteBody } from '@shared/schemas/users';
import { api } from '@/lib/api-client';
import { teamKeys } from './keys';

export const inviteUser = (body: InviteBody) => api('POST', '/api/users/invite', { body });

export function useInviteUser() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: inviteUser, onSuccess: () => qc.invalidateQueries({ queryKey: teamKeys.users }) });
}
