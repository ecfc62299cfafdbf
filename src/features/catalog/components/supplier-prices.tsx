import type { Price } from '@shared/schemas/parts';
import { formatMoney, formatPercent } from '@shared/format';

/** Each supplier's prices; cost and margin columns appear only when the server sent them (buyers, admins). */
export function SupplierPrices({ prices }: { prices: Price[] }) {
  if (prices.length === 0) return <p className="text-ink-soft">No supplier prices on file.</p>;
  const showCost = prices.some((p) => p.costCents !== undefined);
  const head = ['Supplier', 'List', 'Core', 'Pack', ...(showCost ? ['Cost', 'Margin'] : [])];
  return (
    <table className="w-full text-left text-[15px]">
      <thead className="text-xs uppercase tracking-wide text-ink-soft">
        <tr>
          {head.map((h) => (
            <th key={h} scope="col" className={`py-1 pr-2 font-semibold ${h === 'Supplier' ? '' : 'text-right'}`}>
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {prices.map((p) => (
          <tr key={p.supplierId} className="border-t border-ink/5">
            <td className="py-1 pr-2">
              {p.supplier}
              <span className="block text-xs text-ink-faint">from {p.effectiveDate}</span>
            </td>
            <td className="py-1 pr-2 text-right tabular-nums">{formatMoney(p.listCents)}</td>
            <td className="py-1 pr-2 text-right tabular-nums">{p.coreCents > 0 ? formatMoney(p.coreCents) : '—'}</td>
            <td className="py-1 pr-2 text-right tabular-nums">{p.packQty}</td>
            {showCost && (
              <>
                <td className="py-1 pr-2 text-right tabular-nums">{p.costCents !== undefined ? formatMoney(p.costCents) : '—'}</td>
                <td className="py-1 pr-2 text-right tabular-nums">{p.marginPct !== undefined ? formatPercent(p.marginPct) : '—'}</td>
              </>
            )}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
