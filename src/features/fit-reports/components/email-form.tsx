import { emailFitReportBodySchema } from '@shared/schemas/fit-reports';
import { Button } from '@/components/ui/button';
import { Field, Form, useResultIsCurrent, useSchemaForm } from '@/components/ui/form';
import { useEmailFitReport } from '../api/email-fit-report';

/** E-mails the report (its verdict rows and the share link) to a customer or a colleague. */
export function EmailForm({ reportId }: { reportId: string }) {
  const form = useSchemaForm(emailFitReportBodySchema, { defaultValues: { to: '' } });
  const email = useEmailFitReport();
  // "Sent to …" speaks of the address in the box: it goes the moment the address is changed.
  const { isCurrent, shown } = useResultIsCurrent(form);
  const sentTo = email.isSuccess && isCurrent ? email.variables.to : null;
  return (
    <Form
      form={form}
      aria-label="E-mail the fit report"
      onSubmit={({ to }) => {
        shown();
        email.mutate({ id: reportId, to });
      }}
      serverError={email.error}
      className="flex flex-col gap-2"
    >
      <div className="flex items-start gap-2">
        <div className="min-w-0 flex-1">
          <Field name="to" label="E-mail to" type="email" required placeholder="name@example.com" />
        </div>
        <Button type="submit" disabled={email.isPending} className="mt-[22px]">
          {email.isPending ? 'Sending…' : 'Send'}
        </Button>
      </div>
      <p role="status" className="min-h-4 text-sm text-go">
        {sentTo ? `Sent to ${sentTo}.` : ''}
      </p>
    </Form>
  );
}
