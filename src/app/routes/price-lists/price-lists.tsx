import { Link, useSearchParams } from 'react-router-dom';
import { SelectField } from '@/components/ui/field';
import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { usePriceLists } from '@/features/price-lists/api/get-price-lists';
import { HistoryTable } from '@/features/price-lists/components/history-table';
import { PriceListIntake } from '@/features/price-lists/components/intake';
import { useSuppliers } from '@/features/suppliers/api/get-suppliers';

export function PriceListsPage() {
  const [params, setParams] = useSearchParams();
  const suppliers = useSuppliers();
  const supplierId = params.get('supplier');
  const listId = params.get('list');
  const supplier = suppliers.data?.find((s) => s.id === supplierId) ?? null;
  const history = usePriceLists(supplier ? supplier.id : null);

  const choose = (next: { supplier?: string | null; list?: string | null }) =>
    setParams((prev) => {
      const p = new URLSearchParams(prev);
      for (const [k, v] of Object.entries(next)) {
        if (v) p.set(k, v);
        else p.delete(k);
      }
      return p;
    });

  return (
    <>
      <PageHeader title="Price lists" />
      <div className="flex flex-col gap-4">
        <ErrorNote error={suppliers.error} />
        <div className="flex flex-wrap items-end gap-4">
          <div className="w-80">
            <SelectField
              label="Supplier"
              value={supplier?.id ?? ''}
              onChange={(e) => choose({ supplier: e.target.value, list: null })}
              disabled={!suppliers.data}
            >
              <option value="">Choose the supplier of the file</option>
              {suppliers.data?.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name}
                </option>
              ))}
            </SelectField>
          </div>
          {suppliers.data?.length === 0 && (
            <p className="pb-2 text-sm text-ink-soft">
              No suppliers yet.{' '}
              <Link to="/suppliers" className="text-accent underline">
                Add one on the Suppliers page
              </Link>
              .
            </p>
          )}
        </div>

        {supplier ? (
          <>
            <PriceListIntake key={supplier.id} supplierId={supplier.id} listId={listId} onListChange={(id) => choose({ list: id })} />
            <Panel title={`History · ${supplier.name}`}>
              <ErrorNote error={history.error} />
              {history.data && (
                <>
                  <HistoryTable lists={history.data.priceLists} openId={listId} onOpen={(id) => choose({ list: id })} />
                  {history.data.total > history.data.priceLists.length && (
                    <p className="pt-2 text-sm text-ink-soft">
                      The latest {history.data.priceLists.length} of {history.data.total} files.
                    </p>
                  )}
                </>
              )}
            </Panel>
          </>
        ) : (
          suppliers.data &&
          suppliers.data.length > 0 && (
            <p className="text-ink-soft">Choose a supplier first: its last mapping and its prices are what the file is read against.</p>
          )
        )}
      </div>
    </>
  );
}
