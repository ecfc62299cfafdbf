import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { fitReportSchema, type FitReport } from '@shared/schemas/compat';
import { api } from '@/lib/api-client';
import { fitReportKeys } from './keys';

const sharedResponseSchema = z.object({ fitReport: fitReportSchema });

/** A report opened by its share link: no sign-in, read-only. */
export const getSharedFitReport = async (token: string): Promise<FitReport> =>
  (await api('GET', `/api/shared/fit-reports/${encodeURIComponent(token)}`, { schema: sharedResponseSchema, allowUnauthorized: true }))
    .fitReport;

export const sharedFitReportQueryOptions = (token: string) =>
  queryOptions({ queryKey: fitReportKeys.shared(token), queryFn: () => getSharedFitReport(token), retry: false });

export const useSharedFitReport = (token: string) => useQuery(sharedFitReportQueryOptions(token));
