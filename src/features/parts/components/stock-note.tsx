import { formatStock } from '@shared/format';

/** What a stock figure may hold: count and bin for the store's staff, in stock yes/no for a technician. */
export interface StockShown {
  inStock: boolean;
  onHand?: number | undefined;
  bin?: string | null | undefined;
}

/**
 * Stock as every screen shows it ("14 on hand · bin A-3", or "in stock" for a technician): fitted
 * parts, alternates, search results and the part panel all render this one component.
 */
export function StockNote({ stock }: { stock: StockShown }) {
  return <span className={`whitespace-nowrap ${stock.inStock ? '' : 'font-medium text-nogo'}`}>{formatStock(stock)}</span>;
}
