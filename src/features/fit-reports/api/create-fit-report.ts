import { useMutation, useQueryClient } from '@tanstack/react-query';
import { fitReportResponseSchema, type FitReport, type FitReportBody } from '@shared/schemas/fit-reports';
import { api } from '@/lib/api-client';
import { fitReportKeys } from './keys';

/** Saves a comparison's inputs; the server recomputes the verdict from them. */
export const createFitReport = async (body: FitReportBody): Promise<FitReport> =>
  (await api('POST', '/api/fit-reports', { body, schema: fitReportResponseSchema })).fitReport;

export const useCreateFitReport = () => {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createFitReport,
    onSuccess: (report) => {
      qc.setQueryData(fitReportKeys.detail(report.id), report);
      return qc.invalidateQueries({ queryKey: fitReportKeys.list });
    },
  });
};
