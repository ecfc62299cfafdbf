import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { useSuppliers } from '@/features/suppliers/api/get-suppliers';
import { SupplierForm } from '@/features/suppliers/components/supplier-form';
import { SuppliersTable } from '@/features/suppliers/components/suppliers-table';

export function SuppliersPage() {
  const suppliers = useSuppliers();
  return (
    <>
      <PageHeader title="Suppliers" />
      <div className="flex flex-col gap-4">
        <Panel title="Add a supplier">
          <SupplierForm />
        </Panel>
        <Panel title="All suppliers">
          <ErrorNote error={suppliers.error} />
          {suppliers.isPending && <p className="text-ink-soft">Loading…</p>}
          {suppliers.data && <SuppliersTable suppliers={suppliers.data} />}
        </Panel>
      </div>
    </>
  );
}
