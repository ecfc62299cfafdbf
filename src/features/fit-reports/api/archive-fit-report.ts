import { useMutation, useQueryClient } from '@tanstack/react-query';
import { fitReportResponseSchema } from '@shared/schemas/fit-reports';
import { api } from '@/lib/api-client';
import { fitReportKeys } from './keys';

export const archiveFitReport = async ({ id, archived }: { id: string; archived: boolean }) =>
  (await api('PATCH', `/api/fit-reports/${encodeURIComponent(id)}`, { body: { archived }, schema: fitReportResponseSchema })).fitReport;

export function useArchiveFitReport() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: archiveFitReport, onSuccess: () => qc.invalidateQueries({ queryKey: fitReportKeys.all }) });
}
