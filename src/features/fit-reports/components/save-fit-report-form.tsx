import { useState, type FormEvent } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { pickedVehicleOf } from '@/features/parts/compare-link';
import type { FitReportBody } from '@shared/schemas/fit-reports';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNote } from '@/components/ui/panel';
import { useCreateFitReport } from '../api/create-fit-report';

/** Saves the comparison on screen as a fit report and opens it. */
export function SaveFitReportForm({ request }: { request: FitReportBody }) {
  const [title, setTitle] = useState('');
  const create = useCreateFitReport();
  const navigate = useNavigate();
  // The vehicle picked at the Counter, when Compare was opened from there.
  const [params] = useSearchParams();
  const vehicle = pickedVehicleOf(params);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const t = title.trim();
    create.mutate(
      { ...request, ...(t ? { title: t } : {}), ...(vehicle ? { vehicle } : {}) },
      { onSuccess: (report) => navigate(`/fit-reports/${report.id}`) },
    );
  };
  return (
    <form aria-label="Save as fit report" onSubmit={submit} className="flex flex-wrap items-end gap-3 print:hidden">
      <div className="min-w-[18rem] flex-1">
        <TextField
          label="Fit report title"
          value={title}
          maxLength={120}
          onChange={(e) => setTitle(e.target.value)}
          placeholder="e.g. Coil for the blue Halvard, job 4412"
          hint="Optional: without one the parts and the engine name the report."
        />
      </div>
      <Button type="submit" disabled={create.isPending}>
        {create.isPending ? 'Saving…' : 'Save as fit report'}
      </Button>
      {create.error && (
        <div className="basis-full">
          <ErrorNote error={create.error} />
        </div>
      )}
    </form>
  );
}
