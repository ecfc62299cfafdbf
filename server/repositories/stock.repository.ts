import { z } from 'zod';
import { queryRows, type Executor } from '../db/executor';

/** A part's stock: the count on the shelf and the bin it is in. */
export interface StockLevel {
  onHand: number;
  bin: string;
}

/** What a part without a stock row has. */
export const NO_STOCK: StockLevel = { onHand: 0, bin: '' };

const stockRowSchema = z.object({ part_id: z.string(), on_hand: z.number().int(), bin: z.string() });

/** The one place stock is read for parts by id. */
export async function stockOf(ex: Executor, partIds: readonly string[]): Promise<Map<string, StockLevel>> {
  if (!partIds.length) return new Map();
  const rows = await queryRows(ex, stockRowSchema, `SELECT part_id, on_hand, bin FROM stock WHERE part_id = ANY($1::uuid[])`, [partIds]);
  return new Map(rows.map((r) => [r.part_id, { onHand: r.on_hand, bin: r.bin }]));
}
