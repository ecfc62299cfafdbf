import { createColumnHelper } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { formatCount, formatDateTime } from '@shared/format';
import { TRANSFER_STATE_LABELS, TRANSFER_STEP_LABELS, type Transfer } from '@shared/schemas/locations';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { ErrorNote } from '@/components/ui/panel';
import { useStepTransfer } from '../api/step-transfer';
import { stepErrorMessage } from '../step-error';
import { RefuseDialog } from './refuse-dialog';

const col = createColumnHelper<Transfer>();

/**
 * The transfers of the reader's store, with the steps the reader's store may take on each now
 * (the server lists them). Refusing asks for a reason first; the other steps are taken at once.
 */
export function TransfersTable({ transfers }: { transfers: Transfer[] }) {
  const step = useStepTransfer();
  const { mutate } = step;
  const [refusing, setRefusing] = useState<Transfer | null>(null);
  const busy = step.isPending;
  const columns = useMemo(
    () => [
      col.accessor((t) => `${t.brand} ${t.partNumber}`, {
        id: 'part',
        header: 'Part',
        enableSorting: true,
        meta: { cellClassName: 'whitespace-nowrap' },
      }),
      col.accessor('quantity', { header: 'Qty', cell: ({ getValue }) => formatCount(getValue()), meta: { align: 'right' } }),
      col.accessor((t) => t.from.name, { id: 'from', header: 'From', enableSorting: true }),
      col.accessor((t) => t.to.name, { id: 'to', header: 'To', enableSorting: true }),
      col.accessor((t) => TRANSFER_STATE_LABELS[t.state], {
        id: 'state',
        header: 'State',
        enableSorting: true,
        cell: ({ row: { original: t } }) => (
          <>
            <span className={t.state === 'refused' ? 'font-medium text-nogo' : 'font-medium'}>{TRANSFER_STATE_LABELS[t.state]}</span>
            {t.refusalReason && <span className="block text-sm text-ink-soft">{t.refusalReason}</span>}
          </>
        ),
      }),
      col.display({
        id: 'actions',
        header: 'Next step',
        cell: ({ row: { original: t } }) => (
          <span className="flex flex-wrap gap-2">
            {t.steps.map((s) =>
              s === 'refuse' ? (
                <Button key={s} variant="danger" disabled={busy} onClick={() => setRefusing(t)}>
                  {TRANSFER_STEP_LABELS[s]}…
                </Button>
              ) : (
                <Button
                  key={s}
                  variant={s === 'cancel' ? 'secondary' : 'primary'}
                  disabled={busy}
                  onClick={() => mutate({ id: t.id, body: { step: s } })}
                >
                  {TRANSFER_STEP_LABELS[s]}
                </Button>
              ),
            )}
          </span>
        ),
      }),
      col.accessor('requestedBy', { header: 'Asked by' }),
      col.accessor('updatedAt', {
        id: 'updated',
        header: 'Last change',
        enableSorting: true,
        cell: ({ getValue }) => formatDateTime(getValue()),
      }),
    ],
    [mutate, busy],
  );
  return (
    <>
      <ErrorNote error={step.variables && stepErrorMessage(step.error, TRANSFER_STEP_LABELS[step.variables.body.step])} />
      <DataTable
        label="Transfers"
        data={transfers}
        columns={columns}
        getRowId={(t) => t.id}
        initialSorting={[{ id: 'updated', desc: true }]}
        empty="No transfers yet. A clerk asks another store for a part from the part panel at the Counter."
      />
      <RefuseDialog transfer={refusing} onClose={() => setRefusing(null)} />
    </>
  );
}
