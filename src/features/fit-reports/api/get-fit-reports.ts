import { queryOptions, useQuery } from '@tanstack/react-query';
import { fitReportsResponseSchema, type FitReportSummary } from '@shared/schemas/fit-reports';
import { api } from '@/lib/api-client';
import { fitReportKeys } from './keys';

export const getFitReports = async (): Promise<FitReportSummary[]> =>
  (await api('GET', '/api/fit-reports', { schema: fitReportsResponseSchema })).fitReports;

export const fitReportsQueryOptions = () => queryOptions({ queryKey: fitReportKeys.list, queryFn: getFitReports });

/** The reports this user may see, newest first (a technician: its own shop's). */
export const useFitReports = () => useQuery(fitReportsQueryOptions());
