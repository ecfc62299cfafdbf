import { queryOptions, useQuery } from '@tanstack/react-query';
import { sharedFitReportResponseSchema, type SharedFitReport } from '@shared/schemas/fit-reports';
import { api } from '@/lib/api-client';
import { fitReportKeys } from './keys';

/** A report opened by its share link: no sign-in, read-only. */
export const getSharedFitReport = async (token: string): Promise<SharedFitReport> =>
  (
    await api('GET', `/api/shared/fit-reports/${encodeURIComponent(token)}`, {
      schema: sharedFitReportResponseSchema,
      allowUnauthorized: true,
    })
  ).fitReport;

export const sharedFitReportQueryOptions = (token: string) =>
  queryOptions({ queryKey: fitReportKeys.shared(token), queryFn: () => getSharedFitReport(token), retry: false });

export const useSharedFitReport = (token: string) => useQuery(sharedFitReportQueryOptions(token));
