import type { StockView } from '@shared/schemas/parts';
import { yesNo } from '@shared/format';

/** On hand and bin for the store's staff; in stock yes/no for a shop's technician. */
export function StockNote({ stock }: { stock: StockView }) {
  if (!('onHand' in stock)) return <span>in stock: {yesNo(stock.inStock)}</span>;
  return (
    <span className="whitespace-nowrap">
      <strong className={stock.onHand > 0 ? 'font-semibold' : 'font-semibold text-nogo'}>{stock.onHand}</strong> on hand
      {stock.bin && (
        <>
          {' · bin '}
          <span className="font-mono">{stock.bin}</span>
        </>
      )}
    </span>
  );
}
