import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { apiKeyKeys } from './keys';

export const revokeApiKey = (id: string) => api('DELETE', `/api/api-keys/${id}`);

export function useRevokeApiKey() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: revokeApiKey, onSuccess: () => qc.invalidateQueries({ queryKey: apiKeyKeys.list }) });
}
