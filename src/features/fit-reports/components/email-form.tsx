import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { fieldErrorsOf } from '@/components/ui/field-errors';
import { useEmailFitReport } from '../api/email-fit-report';

/** E-mails the report (its verdict rows and the share link) to a customer or a colleague. */
export function EmailForm({ reportId }: { reportId: string }) {
  const [to, setTo] = useState('');
  const [sentTo, setSentTo] = useState<string | null>(null);
  const email = useEmailFitReport();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const address = to.trim();
    email.mutate({ id: reportId, to: address }, { onSuccess: () => setSentTo(address) });
  };
  const fieldError = fieldErrorsOf(email.error).to ?? email.error?.message;
  return (
    <form aria-label="E-mail the fit report" onSubmit={submit} className="flex flex-col gap-2">
      <div className="flex items-end gap-2">
        <div className="flex-1">
          <TextField
            label="E-mail to"
            type="email"
            required
            value={to}
            onChange={(e) => {
              setTo(e.target.value);
              setSentTo(null);
            }}
            placeholder="name@example.com"
            error={fieldError}
          />
        </div>
        <Button type="submit" disabled={email.isPending || to.trim() === ''}>
          {email.isPending ? 'Sending…' : 'Send'}
        </Button>
      </div>
      <p role="status" className="min-h-4 text-sm text-go">
        {sentTo ? `Sent to ${sentTo}.` : ''}
      </p>
    </form>
  );
}
