import { z } from 'zod';
import type { StockElsewhere, StockHere } from '../../shared/schemas/locations';
import { execute, queryOne, queryRows, type Executor } from '../db/executor';

/** A part's stock across the chain: the reader's own store first, then the others that hold it. */
export interface PartStock {
  /** Null only when the chain has no store to call "here". */
  here: StockHere | null;
  /** Stores other than here with some on hand, most first. */
  elsewhere: StockElsewhere[];
}

/** What a part without a stock row at any store has. */
export const noStock = (hereId: string | null): PartStock => ({
  here: hereId ? { locationId: hereId, onHand: 0, bin: '' } : null,
  elsewhere: [],
});

export const inStockHere = (s: PartStock): boolean => (s.here?.onHand ?? 0) > 0;
export const inStockAnywhere = (s: PartStock): boolean => inStockHere(s) || s.elsewhere.length > 0;

const stockRowSchema = z.object({
  part_id: z.string(),
  location_id: z.string(),
  name: z.string(),
  on_hand: z.number().int(),
  bin: z.string(),
});

/** The one place stock is read for parts by id: one query for every part and store. */
export async function stockOf(ex: Executor, partIds: readonly string[], hereId: string | null): Promise<Map<string, PartStock>> {
  const out = new Map<string, PartStock>(partIds.map((id) => [id, noStock(hereId)]));
  if (!partIds.length) return out;
  const rows = await queryRows(
    ex,
    stockRowSchema,
    `SELECT s.part_id, s.location_id, l.name, s.on_hand, s.bin
       FROM stock s JOIN location l ON l.id = s.location_id
      WHERE s.part_id = ANY($1::uuid[]) AND (s.location_id = $2 OR s.on_hand > 0)
      ORDER BY s.on_hand DESC, l.name`,
    [partIds, hereId],
  );
  for (const r of rows) {
    const entry = out.get(r.part_id)!;
    if (r.location_id === hereId) entry.here = { locationId: r.location_id, onHand: r.on_hand, bin: r.bin };
    else entry.elsewhere.push({ locationId: r.location_id, name: r.name, onHand: r.on_hand });
  }
  return out;
}

const onHandRow = z.object({ on_hand: z.number().int() });

export interface StockMove {
  locationId: string;
  partId: string;
  delta: number;
  reason: string;
  actorId: string | null;
  transferId?: string | null;
}

/**
 * Adds (or takes, with a negative delta) stock at a store and records the change. The UPDATE is
 * guarded so the count never goes below zero: taking more than is on hand changes nothing and
 * answers null (the check constraint is the second line of defence).
 */
export async function moveStock(ex: Executor, move: StockMove): Promise<number | null> {
  const row =
    move.delta >= 0
      ? await queryOne(
          ex,
          onHandRow,
          `INSERT INTO stock (location_id, part_id, on_hand) VALUES ($1, $2, $3)
           ON CONFLICT (location_id, part_id) DO UPDATE SET on_hand = stock.on_hand + EXCLUDED.on_hand
           RETURNING on_hand`,
          [move.locationId, move.partId, move.delta],
        )
      : await queryOne(
          ex,
          onHandRow,
          `UPDATE stock SET on_hand = on_hand + $3 WHERE location_id = $1 AND part_id = $2 AND on_hand + $3 >= 0 RETURNING on_hand`,
          [move.locationId, move.partId, move.delta],
        );
  if (!row) return null;
  await execute(
    ex,
    `INSERT INTO stock_change (location_id, part_id, delta, on_hand_after, reason, transfer_id, actor_id) VALUES ($1,$2,$3,$4,$5,$6,$7)`,
    [move.locationId, move.partId, move.delta, row.on_hand, move.reason, move.transferId ?? null, move.actorId],
  );
  return row.on_hand;
}

const changeRowSchema = z.object({
  location_id: z.string(),
  delta: z.number().int(),
  on_hand_after: z.number().int(),
  reason: z.string(),
  transfer_id: z.string().nullable(),
  actor_id: z.string().nullable(),
});
export type StockChangeRow = z.infer<typeof changeRowSchema>;

/** A part's stock history, newest first. */
export function stockChanges(ex: Executor, partId: string): Promise<StockChangeRow[]> {
  return queryRows(
    ex,
    changeRowSchema,
    `SELECT location_id, delta, on_hand_after, reason, transfer_id, actor_id FROM stock_change WHERE part_id = $1 ORDER BY id DESC`,
    [partId],
  );
}
