import type { CoilCompareBody, CompatResult, PlugCompareBody } from '../../shared/schemas/compat';
import type {
  EmailSentResponse,
  FitReport,
  FitReportResponse,
  FitReportsResponse,
  FitReportSummary,
} from '../../shared/schemas/fit-reports';

interface FitReportColumns {
  id: string;
  title: string;
  notes: string;
  /** The result as presented when the report was saved (jsonb). */
  result: CompatResult;
  verdict: FitReport['verdict'];
  share_token: string;
  created_at: Date;
  created_by_name: string;
  shop_id: string | null;
  shop_name: string | null;
}

/** A fit_report row with its author and shop; `inputs` is the compare request it was made from (jsonb). */
export type FitReportRecord = FitReportColumns & ({ kind: 'coil'; inputs: CoilCompareBody } | { kind: 'plug'; inputs: PlugCompareBody });

export const shareUrlOf = (appUrl: string, token: string) => `${appUrl}/shared/fit-reports/${token}`;

function summary(r: FitReportRecord): FitReportSummary {
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

export function presentFitReport(r: FitReportRecord, appUrl: string): FitReport {
  const base = { ...summary(r), notes: r.notes, result: r.result, shareUrl: shareUrlOf(appUrl, r.share_token) };
  return r.kind === 'coil' ? { ...base, kind: 'coil', inputs: r.inputs } : { ...base, kind: 'plug', inputs: r.inputs };
}

export const presentFitReportResponse = (r: FitReportRecord, appUrl: string): FitReportResponse => ({
  fitReport: presentFitReport(r, appUrl),
});

export const presentFitReports = (rows: FitReportRecord[]): FitReportsResponse => ({ fitReports: rows.map(summary) });

export const presentEmailSent = (): EmailSentResponse => ({ sent: true });
