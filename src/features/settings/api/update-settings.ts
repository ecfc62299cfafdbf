import { useMutation, useQueryClient } from '@tanstack/react-query';
import { settingsResponseSchema, type Settings } from '@shared/schemas/settings';
import { api } from '@/lib/api-client';
import { settingsKeys } from './keys';

export const updateSettings = async (settings: Settings): Promise<Settings> =>
  (await api('PUT', '/api/settings', { body: { settings }, schema: settingsResponseSchema })).settings;

export const useUpdateSettings = () => {
  const qc = useQueryClient();
  return useMutation({ mutationFn: updateSettings, onSuccess: (saved) => qc.setQueryData(settingsKeys.all, saved) });
};
