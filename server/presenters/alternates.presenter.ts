import type { Check, Verdict } from '../../shared/compat';
import type { Role } from '../../shared/roles';
import type { AlternatesResponse } from '../../shared/schemas/alternates';
import type { PartRow } from '../repositories/parts.repository';
import type { PriceRow } from '../repositories/prices.repository';
import type { PartStock } from '../repositories/stock.repository';
import { presentCheck } from './compat.presenter';
import { presentPart } from './part.presenter';
import { presentStock, sellPrice } from './stock-price.presenter';

export interface AlternatesRecord {
  /** The engine's fitted part of the kind asked for; null when none is on file. */
  original: PartRow | null;
  /** Ranked best first (compat-model.md §7). */
  alternates: { row: PartRow; verdict: Verdict; deviation: number; checks: Check[]; stock: PartStock; prices: PriceRow[] }[];
}

/** GET /api/engines/:id/alternates: the ranking, with the sell price as the role may see it. */
export function presentAlternates(r: AlternatesRecord, role: Role): AlternatesResponse {
  return {
    original: r.original && presentPart(r.original),
    alternates: r.alternates.map((a) => ({
      part: presentPart(a.row),
      verdict: a.verdict,
      deviation: a.deviation,
      checks: a.checks.map(presentCheck),
      stock: presentStock(a.stock, role),
      price: sellPrice(a.prices, role),
    })),
  };
}
