import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { settingsSchema, type Settings } from '@shared/schemas/settings';
import { api } from '@/lib/api-client';
import { settingsKeys } from './keys';

const settingsResponseSchema = z.object({ settings: settingsSchema });

export const updateSettings = async (settings: Settings): Promise<Settings> =>
  (await api('PUT', '/api/settings', { body: { settings }, schema: settingsResponseSchema })).settings;

export const useUpdateSettings = () => {
  const qc = useQueryClient();
  return useMutation({ mutationFn: updateSettings, onSuccess: (saved) => qc.setQueryData(settingsKeys.all, saved) });
};
