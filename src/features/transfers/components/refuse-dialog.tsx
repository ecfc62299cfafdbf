import { transferRefuseBodySchema, type Transfer } from '@shared/schemas/locations';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Field, Form, useSchemaForm } from '@/components/ui/form';
import { ErrorNote } from '@/components/ui/panel';
import { formatCount } from '@shared/format';
import { useStepTransfer } from '../api/step-transfer';
import { isConflict, stepErrorMessage } from '../step-error';

export interface RefuseDialogProps {
  /** The transfer being refused; null keeps the dialog closed. */
  transfer: Transfer | null;
  onClose: () => void;
}

/** Refusing a request asks why: the reason is required, and the asking store reads it. */
export function RefuseDialog({ transfer, onClose }: RefuseDialogProps) {
  return (
    <Dialog
      title={transfer ? `Refuse ${formatCount(transfer.quantity)} × ${transfer.brand} ${transfer.partNumber}?` : 'Refuse'}
      description={transfer ? `${transfer.to.name} asked for them. Say why, so they can look elsewhere.` : undefined}
      open={transfer !== null}
      onOpenChange={(open) => !open && onClose()}
    >
      {transfer && <RefuseForm key={transfer.id} transfer={transfer} onDone={onClose} />}
    </Dialog>
  );
}

function RefuseForm({ transfer, onDone }: { transfer: Transfer; onDone: () => void }) {
  const form = useSchemaForm(transferRefuseBodySchema, { defaultValues: { step: 'refuse', reason: '' } });
  const step = useStepTransfer();
  // A 409 is not about the reason: it is worded for people, with the list read again behind the dialog.
  const conflict = isConflict(step.error) ? stepErrorMessage(step.error, 'Refuse') : null;
  return (
    <Form
      form={form}
      serverError={conflict ? null : step.error}
      onSubmit={(body) => step.mutate({ id: transfer.id, body }, { onSuccess: onDone })}
      aria-label="Refuse the transfer"
      className="flex flex-col gap-3"
    >
      <Field name="reason" label="Reason" autoComplete="off" hint="For example: the last ones are set aside for a customer." />
      {conflict && <ErrorNote error={conflict} />}
      <div className="mt-2 flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={onDone} disabled={step.isPending}>
          {conflict ? 'Close' : 'Keep it'}
        </Button>
        {!conflict && (
          <Button type="submit" variant="danger" disabled={step.isPending} aria-busy={step.isPending || undefined}>
            Refuse the request
          </Button>
        )}
      </div>
    </Form>
  );
}
