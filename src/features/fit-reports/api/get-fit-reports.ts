import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { fitReportsResponseSchema, type FitReportSummary } from '@shared/schemas/fit-reports';
import { api } from '@/lib/api-client';
import { fitReportKeys } from './keys';

export interface FitReportsFilter {
  q: string;
  includeArchived: boolean;
}

export const getFitReports = async ({ q, includeArchived }: FitReportsFilter): Promise<FitReportSummary[]> => {
  const params = new URLSearchParams();
  if (q.trim()) params.set('q', q.trim());
  if (includeArchived) params.set('archived', 'include');
  const query = params.toString();
  return (await api('GET', `/api/fit-reports${query ? `?${query}` : ''}`, { schema: fitReportsResponseSchema })).fitReports;
};

export const fitReportsQueryOptions = (filter: FitReportsFilter) =>
  queryOptions({
    queryKey: [...fitReportKeys.list, filter.q.trim(), filter.includeArchived] as const,
    queryFn: () => getFitReports(filter),
    placeholderData: keepPreviousData,
  });

/** The reports this user may see, newest first (a technician: its own shop's), found by words. */
export const useFitReports = (filter: FitReportsFilter) => useQuery(fitReportsQueryOptions(filter));
