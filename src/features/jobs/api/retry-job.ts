import { useMutation, useQueryClient } from '@tanstack/react-query';
import { retryJobResponseSchema } from '@shared/schemas/jobs';
import { api } from '@/lib/api-client';
import { jobsKeys } from './keys';

export const retryJob = async (id: string) => (await api('POST', `/api/jobs/${id}/retry`, { schema: retryJobResponseSchema })).job;

export function useRetryJob() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: retryJob, onSettled: () => qc.invalidateQueries({ queryKey: jobsKeys.all }) });
}
