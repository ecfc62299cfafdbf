import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { fitReportSchema, type FitReport } from '@shared/schemas/compat';
import { api } from '@/lib/api-client';
import { fitReportKeys } from './keys';

const detailResponseSchema = z.object({ fitReport: fitReportSchema });

export const getFitReport = async (id: string): Promise<FitReport> =>
  (await api('GET', `/api/fit-reports/${encodeURIComponent(id)}`, { schema: detailResponseSchema })).fitReport;

export const fitReportQueryOptions = (id: string) => queryOptions({ queryKey: fitReportKeys.detail(id), queryFn: () => getFitReport(id) });

export const useFitReport = (id: string) => useQuery(fitReportQueryOptions(id));
