import { createColumnHelper } from '@tanstack/react-table';
import type { Price } from '@shared/schemas/parts';
import { formatDate, formatMoney, formatPercent } from '@shared/format';
import { DataTable } from '@/components/ui/data-table';

const column = createColumnHelper<Price>();
const right = { align: 'right' } as const;

const COLUMNS = [
  column.accessor('supplier', {
    header: 'Supplier',
    cell: (c) => (
      <>
        {c.getValue()}
        <span className="block text-xs text-ink-faint">from {formatDate(c.row.original.effectiveDate)}</span>
      </>
    ),
  }),
  column.accessor('listCents', { header: 'List', meta: right, cell: (c) => formatMoney(c.getValue()) }),
  column.accessor('coreCents', { header: 'Core', meta: right, cell: (c) => (c.getValue() > 0 ? formatMoney(c.getValue()) : '—') }),
  column.accessor('packQty', { header: 'Pack', meta: right }),
  column.accessor('costCents', {
    header: 'Cost',
    meta: right,
    cell: (c) => (c.getValue() !== undefined ? formatMoney(c.getValue()!) : '—'),
  }),
  column.accessor('marginPct', {
    header: 'Margin',
    meta: right,
    cell: (c) => (c.getValue() !== undefined ? formatPercent(c.getValue()!) : '—'),
  }),
];

/** Each supplier's prices; cost and margin columns appear only when the server sent them (buyers, admins). */
export function SupplierPrices({ prices }: { prices: Price[] }) {
  const showCost = prices.some((p) => p.costCents !== undefined);
  return (
    <DataTable
      label="Supplier prices"
      data={prices}
      columns={COLUMNS}
      getRowId={(p) => p.supplierId}
      columnVisibility={{ costCents: showCost, marginPct: showCost }}
      empty="No supplier prices on file."
    />
  );
}
