import { useMutation, useQueryClient } from '@tanstack/react-query';
import { createdApiKeySchema, type CreateApiKeyBody } from '@shared/schemas/api-keys';
import { api } from '@/lib/api-client';
import { apiKeyKeys } from './keys';

export const createApiKey = (body: CreateApiKeyBody) => api('POST', '/api/api-keys', { body, schema: createdApiKeySchema });

export function useCreateApiKey() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createApiKey, onSuccess: () => qc.invalidateQueries({ queryKey: apiKeyKeys.list }) });
}
