import { queryOptions, useQuery } from '@tanstack/react-query';
import { fitReportResponseSchema, type FitReport } from '@shared/schemas/fit-reports';
import { api } from '@/lib/api-client';
import { fitReportKeys } from './keys';

export const getFitReport = async (id: string): Promise<FitReport> =>
  (await api('GET', `/api/fit-reports/${encodeURIComponent(id)}`, { schema: fitReportResponseSchema })).fitReport;

export const fitReportQueryOptions = (id: string) => queryOptions({ queryKey: fitReportKeys.detail(id), queryFn: () => getFitReport(id) });

export const useFitReport = (id: string) => useQuery(fitReportQueryOptions(id));
