import { queryOptions, useQuery } from '@tanstack/react-query';
import { jobsResponseSchema } from '@shared/schemas/jobs';
import { api } from '@/lib/api-client';
import { jobsKeys } from './keys';

export const getJobs = async () => (await api('GET', '/api/jobs', { schema: jobsResponseSchema })).jobs;

// Retries happen on their own: the list follows them.
export const jobsQueryOptions = () => queryOptions({ queryKey: jobsKeys.all, queryFn: getJobs, refetchInterval: 5000 });

export const useJobs = () => useQuery(jobsQueryOptions());
