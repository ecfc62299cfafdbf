import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { formatCount, formatDateTime } from '@shared/format';
import { TRANSFER_STATE_LABELS, TRANSFER_STEP_LABELS, type Transfer, type TransferStep } from '@shared/schemas/locations';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { ErrorNote } from '@/components/ui/panel';
import { useStepTransfer } from '../api/transfers';

const col = createColumnHelper<Transfer>();

/** The transfers of the reader's store, with the steps the reader may take on each (refusing asks for a reason through the API). */
export function TransfersTable({ transfers }: { transfers: Transfer[] }) {
  const step = useStepTransfer();
  const columns = useMemo(
    () => [
      col.accessor((t) => `${t.brand} ${t.partNumber}`, { id: 'part', header: 'Part', enableSorting: true }),
      col.accessor((t) => formatCount(t.quantity), { id: 'quantity', header: 'Qty', meta: { align: 'right' } }),
      col.accessor((t) => t.from.name, { id: 'from', header: 'From', enableSorting: true }),
      col.accessor((t) => t.to.name, { id: 'to', header: 'To', enableSorting: true }),
      col.accessor((t) => (t.refusalReason ? `${TRANSFER_STATE_LABELS[t.state]}: ${t.refusalReason}` : TRANSFER_STATE_LABELS[t.state]), {
        id: 'state',
        header: 'State',
        enableSorting: true,
      }),
      col.accessor('requestedBy', { header: 'Asked by' }),
      col.accessor((t) => formatDateTime(t.updatedAt), { id: 'updated', header: 'Last change' }),
      col.display({
        id: 'actions',
        header: 'Actions',
        cell: ({ row }) => (
          <span className="flex flex-wrap gap-2">
            {row.original.steps
              .filter((s): s is Exclude<TransferStep, 'refuse'> => s !== 'refuse')
              .map((s) => (
                <Button
                  key={s}
                  variant="secondary"
                  disabled={step.isPending}
                  onClick={() => step.mutate({ id: row.original.id, body: { step: s } })}
                >
                  {TRANSFER_STEP_LABELS[s]}
                </Button>
              ))}
          </span>
        ),
      }),
    ],
    [step],
  );
  return (
    <>
      <ErrorNote error={step.error} />
      <DataTable label="Transfers" data={transfers} columns={columns} getRowId={(t) => t.id} empty="No transfers yet." />
    </>
  );
}
