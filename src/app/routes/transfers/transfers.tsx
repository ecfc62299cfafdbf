import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { useTransfers } from '@/features/transfers/api/get-transfers';
import { TransfersTable } from '@/features/transfers/components/transfers-table';

/** Parts asked of this store by the others, and asked by this store of them, with this store's next steps. */
export function TransfersPage() {
  const transfers = useTransfers();
  return (
    <>
      <PageHeader title="Transfers" />
      <Panel>
        <ErrorNote error={transfers.error} />
        {transfers.isPending && <p className="text-ink-faint">Loading the transfers…</p>}
        {transfers.data && <TransfersTable transfers={transfers.data.transfers} />}
      </Panel>
    </>
  );
}
