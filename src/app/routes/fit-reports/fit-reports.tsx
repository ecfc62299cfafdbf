import { Link } from 'react-router-dom';
import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { useFitReports } from '@/features/fit-reports/api/get-fit-reports';
import { FitReportList } from '@/features/fit-reports/components/fit-report-list';

export function FitReportsPage() {
  const reports = useFitReports();
  return (
    <>
      <PageHeader title="Fit reports">
        <Link to="/compare" className="rounded-md bg-accent px-3 py-1.5 text-sm font-medium text-white hover:bg-accent-strong">
          New comparison
        </Link>
      </PageHeader>
      <Panel>
        <ErrorNote error={reports.error} />
        {reports.isPending && <p className="text-ink-soft">Loading…</p>}
        {reports.data && <FitReportList reports={reports.data} />}
      </Panel>
    </>
  );
}
