import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { fitReportSchema } from '@shared/schemas/compat';
import { api } from '@/lib/api-client';
import { fitReportKeys } from './keys';

const fitReportSummarySchema = fitReportSchema.pick({
  id: true,
  kind: true,
  title: true,
  verdict: true,
  createdAt: true,
  createdBy: true,
  shopName: true,
});
export type FitReportSummary = z.infer<typeof fitReportSummarySchema>;

const listResponseSchema = z.object({ fitReports: z.array(fitReportSummarySchema) });

export const getFitReports = async (): Promise<FitReportSummary[]> =>
  (await api('GET', '/api/fit-reports', { schema: listResponseSchema })).fitReports;

export const fitReportsQueryOptions = () => queryOptions({ queryKey: fitReportKeys.list, queryFn: getFitReports });

/** The reports this user may see, newest first (a technician: its own shop's). */
export const useFitReports = () => useQuery(fitReportsQueryOptions());
