import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiKeyListSchema } from '@shared/schemas/api-keys';
import { api } from '@/lib/api-client';
import { apiKeyKeys } from './keys';

export const getApiKeys = async () => (await api('GET', '/api/api-keys', { schema: apiKeyListSchema })).apiKeys;

export const apiKeysQueryOptions = () => queryOptions({ queryKey: apiKeyKeys.list, queryFn: getApiKeys });

export const useApiKeys = () => useQuery(apiKeysQueryOptions());
