import { inStockHere, type PartStock } from '../../repositories/stock.repository';

/**
 * An engine's fitted parts in the order the clerk reads them: by position as fitted, and among
 * the parts of one position, those on the shelf here first (a stable sort keeps the rest as they were).
 */
export function fittedOrder<F extends { position: string; stock: PartStock }>(fitments: readonly F[]): F[] {
  const firstSeen = new Map<string, number>();
  fitments.forEach((f, i) => {
    if (!firstSeen.has(f.position)) firstSeen.set(f.position, i);
  });
  const here = (f: F): number => (inStockHere(f.stock) ? 0 : 1);
  return [...fitments].sort((a, b) => firstSeen.get(a.position)! - firstSeen.get(b.position)! || here(a) - here(b));
}
