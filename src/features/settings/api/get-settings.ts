import { queryOptions, useQuery } from '@tanstack/react-query';
import { settingsResponseSchema, type Settings } from '@shared/schemas/settings';
import { api } from '@/lib/api-client';
import { settingsKeys } from './keys';

export const getSettings = async (): Promise<Settings> => (await api('GET', '/api/settings', { schema: settingsResponseSchema })).settings;

export const settingsQueryOptions = () => queryOptions({ queryKey: settingsKeys.all, queryFn: getSettings });

export const useSettings = () => useQuery(settingsQueryOptions());
