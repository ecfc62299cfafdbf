import { useNavigate, useSearchParams } from 'react-router-dom';
import { pickedVehicleOf } from '@/features/parts/compare-link';
import { fitReportBodySchema, type FitReportBody } from '@shared/schemas/fit-reports';
import { Button } from '@/components/ui/button';
import { Field, Form, useSchemaForm } from '@/components/ui/form';
import { useCreateFitReport } from '../api/create-fit-report';

// The one field typed here, on the request's own schema (the same for a coil and a plug report).
const titleFormSchema = fitReportBodySchema.options[0].pick({ title: true });

/** Saves the comparison on screen as a fit report and opens it. */
export function SaveFitReportForm({ request }: { request: FitReportBody }) {
  const form = useSchemaForm(titleFormSchema, { defaultValues: { title: '' } });
  const create = useCreateFitReport();
  const navigate = useNavigate();
  // The vehicle picked at the Counter, when Compare was opened from there.
  const [params] = useSearchParams();
  const vehicle = pickedVehicleOf(params);
  return (
    <Form
      form={form}
      aria-label="Save as fit report"
      onSubmit={({ title }) =>
        create.mutate(
          { ...request, ...(title ? { title } : {}), ...(vehicle ? { vehicle } : {}) },
          { onSuccess: (report) => navigate(`/fit-reports/${report.id}`) },
        )
      }
      serverError={create.error}
      className="flex flex-wrap items-start gap-3 print:hidden"
    >
      <div className="min-w-0 flex-1 basis-[18rem]">
        <Field
          name="title"
          label="Fit report title"
          maxLength={120}
          placeholder="e.g. Coil for the blue Halvard, job 4412"
          hint="Optional: without one the parts and the engine name the report."
        />
      </div>
      <Button type="submit" disabled={create.isPending} className="mt-[22px]">
        {create.isPending ? 'Saving…' : 'Save as fit report'}
      </Button>
    </Form>
  );
}
