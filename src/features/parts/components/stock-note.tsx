import type { StockView } from '@shared/schemas/parts';
import { formatCount, formatElsewhere, formatStock } from '@shared/format';

/**
 * This store's on hand and bin first, then what the other stores hold, for the store's staff; in
 * stock yes/no for a shop's technician.
 */
export function StockNote({ stock }: { stock: StockView }) {
  if (!('here' in stock)) return <span className={stock.inStock ? '' : 'font-medium text-nogo'}>{formatStock(stock)}</span>;
  const onHand = stock.here?.onHand ?? 0;
  const elsewhere = formatElsewhere(stock.elsewhere);
  return (
    <span className="whitespace-nowrap">
      <strong className={onHand > 0 ? 'font-semibold' : 'font-semibold text-nogo'}>{formatCount(onHand)}</strong> here
      {stock.here?.bin && (
        <>
          {' · bin '}
          <span className="font-mono">{stock.here.bin}</span>
        </>
      )}
      {elsewhere && <span className="text-ink-soft">{` · ${elsewhere}`}</span>}
    </span>
  );
}
