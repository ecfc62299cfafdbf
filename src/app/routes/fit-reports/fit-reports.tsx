import { useDeferredValue, useState } from 'react';
import { Link } from 'react-router-dom';
import { CheckboxField, TextField } from '@/components/ui/field';
import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { useFitReports } from '@/features/fit-reports/api/get-fit-reports';
import { FitReportList } from '@/features/fit-reports/components/fit-report-list';

export function FitReportsPage() {
  const [q, setQ] = useState('');
  const [includeArchived, setIncludeArchived] = useState(false);
  const reports = useFitReports({ q: useDeferredValue(q), includeArchived });
  return (
    <>
      <PageHeader title="Fit reports">
        <Link to="/compare" className="rounded-md bg-accent px-3 py-1.5 text-sm font-medium text-white hover:bg-accent-strong">
          New comparison
        </Link>
      </PageHeader>
      <Panel>
        <div className="mb-3 flex flex-wrap items-end gap-4">
          <div className="min-w-[16rem] flex-1">
            <TextField
              label="Find reports"
              type="search"
              value={q}
              maxLength={120}
              onChange={(e) => setQ(e.target.value)}
              hint="Vehicle, part numbers, engine, title or note"
            />
          </div>
          <CheckboxField label="Show archived reports" checked={includeArchived} onChange={(e) => setIncludeArchived(e.target.checked)} />
        </div>
        <ErrorNote error={reports.error} />
        {reports.isPending && <p className="text-ink-soft">Loading…</p>}
        {reports.data && (
          <FitReportList
            reports={reports.data}
            empty={q.trim() ? 'No report matches these words.' : 'No fit reports yet. Save one from Compare.'}
          />
        )}
      </Panel>
    </>
  );
}
