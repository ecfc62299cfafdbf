import { useState } from 'react';
import { CheckboxField } from '@/components/ui/field';
import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { SellPriceRules } from '@/features/sell-price/components/sell-price-rules';
import { useSuppliers } from '@/features/suppliers/api/get-suppliers';
import { SupplierForm } from '@/features/suppliers/components/supplier-form';
import { SuppliersTable } from '@/features/suppliers/components/suppliers-table';

export function SuppliersPage() {
  const [showArchived, setShowArchived] = useState(false);
  const suppliers = useSuppliers(showArchived);
  const active = useSuppliers();
  return (
    <>
      <PageHeader title="Suppliers" />
      <div className="flex flex-col gap-4">
        <Panel title="Add a supplier">
          <SupplierForm />
        </Panel>
        <Panel title="All suppliers">
          <div className="mb-2">
            <CheckboxField label="Show archived suppliers" checked={showArchived} onChange={(e) => setShowArchived(e.target.checked)} />
          </div>
          <ErrorNote error={suppliers.error} />
          {suppliers.isPending && <p className="text-ink-soft">Loading…</p>}
          {suppliers.data && <SuppliersTable suppliers={suppliers.data} />}
        </Panel>
        <Panel title="Sell-price rule">{active.data && <SellPriceRules suppliers={active.data} />}</Panel>
      </div>
    </>
  );
}
