import type {
  EmailSentResponse,
  FitReport,
  FitReportResponse,
  FitReportsResponse,
  FitReportSummary,
  SharedFitReportResponse,
} from '../../shared/schemas/fit-reports';
import type { StoreSettings } from '../../shared/schemas/settings';
import type { FitReportRow } from '../repositories/fit-reports.repository';

export const shareUrlOf = (appUrl: string, token: string) => `${appUrl}/shared/fit-reports/${token}`;

/** A report as read, with the store that made it (from the Settings). */
export interface FitReportRecord {
  row: FitReportRow;
  store: StoreSettings;
}

function summary(r: FitReportRow): FitReportSummary {
  return {
    id: r.id,
    kind: r.kind,
    title: r.title,
    notes: r.notes,
    verdict: r.verdict,
    createdAt: r.created_at.toISOString(),
    createdBy: r.created_by_name,
    shopName: r.shop_name,
    vehicle: r.vehicle,
    originalLabel: r.result.original.label,
    substituteLabel: r.result.substitute.label,
    archivedAt: r.archived_at?.toISOString() ?? null,
  };
}

export function presentFitReport({ row: r, store }: FitReportRecord, appUrl: string): FitReport {
  const base = { ...summary(r), result: r.result, prices: r.prices, store, shareUrl: shareUrlOf(appUrl, r.share_token) };
  return r.kind === 'coil' ? { ...base, kind: 'coil', inputs: r.inputs } : { ...base, kind: 'plug', inputs: r.inputs };
}

export const presentFitReportResponse = (r: FitReportRecord, appUrl: string): FitReportResponse => ({
  fitReport: presentFitReport(r, appUrl),
});

/** The share page's answer: the staff member's name is not for the public. */
export function presentSharedFitReport(r: FitReportRecord, appUrl: string): SharedFitReportResponse {
  const { createdBy: _staff, ...shared } = presentFitReport(r, appUrl);
  return { fitReport: shared };
}

export const presentFitReports = (rows: FitReportRow[]): FitReportsResponse => ({ fitReports: rows.map(summary) });

export const presentEmailSent = (): EmailSentResponse => ({ sent: true });
