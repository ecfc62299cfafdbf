import type {
  EmailSentResponse,
  FitReport,
  FitReportResponse,
  FitReportsResponse,
  FitReportSummary,
} from '../../shared/schemas/fit-reports';
import type { FitReportRow } from '../repositories/fit-reports.repository';

export const shareUrlOf = (appUrl: string, token: string) => `${appUrl}/shared/fit-reports/${token}`;

function summary(r: FitReportRow): FitReportSummary {
  return {
    id: r.id,
    kind: r.kind,
    title: r.title,
    verdict: r.verdict,
    createdAt: r.created_at.toISOString(),
    createdBy: r.created_by_name,
    shopName: r.shop_name,
  };
}

export function presentFitReport(r: FitReportRow, appUrl: string): FitReport {
  const base = { ...summary(r), notes: r.notes, result: r.result, shareUrl: shareUrlOf(appUrl, r.share_token) };
  return r.kind === 'coil' ? { ...base, kind: 'coil', inputs: r.inputs } : { ...base, kind: 'plug', inputs: r.inputs };
}

export const presentFitReportResponse = (r: FitReportRow, appUrl: string): FitReportResponse => ({
  fitReport: presentFitReport(r, appUrl),
});

export const presentFitReports = (rows: FitReportRow[]): FitReportsResponse => ({ fitReports: rows.map(summary) });

export const presentEmailSent = (): EmailSentResponse => ({ sent: true });
