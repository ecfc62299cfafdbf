import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import type { SellPriceRule } from '@shared/schemas/sell-price';
import type { Supplier } from '@shared/schemas/suppliers';
import { DataTable } from '@/components/ui/data-table';
import { SelectField } from '@/components/ui/field';
import { ErrorNote } from '@/components/ui/panel';
import { useSellPriceRules, useSetSellPriceRule } from '../api/sell-price-rules';

const LOWEST = '';
const col = createColumnHelper<SellPriceRule>();

/**
 * The sell-price rule, per brand: which supplier's list price the Counter sells at. "Lowest list
 * price" is the default; a preferred supplier wins whenever it prices the part.
 */
export function SellPriceRules({ suppliers }: { suppliers: Supplier[] }) {
  const rules = useSellPriceRules();
  const set = useSetSellPriceRule();
  const columns = useMemo(
    () => [
      col.accessor('brand', { header: 'Brand', enableSorting: true }),
      col.display({
        id: 'rule',
        header: 'Counter sells at',
        cell: (c) => {
          const r = c.row.original;
          return (
            <SelectField
              label={`Sell price for ${r.brand}`}
              className="max-w-xs"
              value={r.supplierId ?? LOWEST}
              disabled={set.isPending}
              onChange={(e) => set.mutate({ brandId: r.brandId, supplierId: e.target.value === LOWEST ? null : e.target.value })}
            >
              <option value={LOWEST}>Lowest list price</option>
              {suppliers.map((s) => (
                <option key={s.id} value={s.id}>
                  Preferred supplier: {s.name}
                </option>
              ))}
            </SelectField>
          );
        },
      }),
    ],
    [suppliers, set],
  );
  return (
    <div className="flex flex-col gap-2">
      <p className="text-sm text-ink-soft">
        Without a preferred supplier a part sells at the lowest list price among its suppliers. With one, it sells at that supplier’s list
        price whenever that supplier prices the part. The Counter and the part panel say which supplier and why.
      </p>
      <ErrorNote error={rules.error ?? set.error} />
      {rules.data && (
        <DataTable
          label="Sell-price rule by brand"
          data={rules.data}
          columns={columns}
          getRowId={(r) => r.brandId}
          empty="No brand has prices yet."
        />
      )}
    </div>
  );
}
