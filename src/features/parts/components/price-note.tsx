import type { Price } from '@shared/schemas/parts';
import { formatMoney } from '@shared/format';

/** The sell price, with the core charge when the part carries one. */
export function PriceNote({ price, large = false }: { price: Price | null; large?: boolean }) {
  if (!price) return <span className="text-ink-faint">no price</span>;
  return (
    <span className="whitespace-nowrap">
      <span className={large ? 'text-xl font-semibold' : 'font-semibold'}>{formatMoney(price.listCents)}</span>
      {price.coreCents > 0 && <span className="text-ink-soft"> + {formatMoney(price.coreCents)} core</span>}
    </span>
  );
}
