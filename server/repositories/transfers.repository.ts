import { z } from 'zod';
import { TRANSFER_STATES, type TransferState } from '../../shared/schemas/locations';
import { insertReturningId, queryCount, queryOne, queryRows, type Executor } from '../db/executor';

const transferRowSchema = z.object({
  id: z.string(),
  part_id: z.string(),
  part_number: z.string(),
  brand: z.string(),
  from_location_id: z.string(),
  from_name: z.string(),
  to_location_id: z.string(),
  to_name: z.string(),
  quantity: z.number().int(),
  state: z.enum(TRANSFER_STATES),
  refusal_reason: z.string().nullable(),
  requested_by: z.string(),
  requester_name: z.string(),
  requester_email: z.string(),
  created_at: z.date(),
  updated_at: z.date(),
});
export type TransferRow = z.infer<typeof transferRowSchema>;

const SELECT = `
  SELECT t.id, t.part_id, p.part_number, b.name AS brand, t.from_location_id, lf.name AS from_name,
         t.to_location_id, lt.name AS to_name, t.quantity, t.state, t.refusal_reason, t.requested_by,
         u.name AS requester_name, u.email AS requester_email, t.created_at, t.updated_at
    FROM transfer t
    JOIN part p ON p.id = t.part_id JOIN brand b ON b.id = p.brand_id
    JOIN location lf ON lf.id = t.from_location_id JOIN location lt ON lt.id = t.to_location_id
    JOIN "user" u ON u.id = t.requested_by`;

export interface NewTransfer {
  partId: string;
  fromLocationId: string;
  toLocationId: string;
  quantity: number;
  requestedBy: string;
}

export function insertTransfer(ex: Executor, t: NewTransfer): Promise<string> {
  return insertReturningId(
    ex,
    `INSERT INTO transfer (part_id, from_location_id, to_location_id, quantity, requested_by, updated_by)
     VALUES ($1,$2,$3,$4,$5,$5) RETURNING id`,
    [t.partId, t.fromLocationId, t.toLocationId, t.quantity, t.requestedBy],
  );
}

export function findTransfer(ex: Executor, id: string): Promise<TransferRow | null> {
  return queryOne(ex, transferRowSchema, `${SELECT} WHERE t.id = $1`, [id]);
}

/** The transfers a store sends or receives, newest first. */
export function transfersOf(ex: Executor, locationId: string | null, limit: number, offset: number): Promise<TransferRow[]> {
  return queryRows(
    ex,
    transferRowSchema,
    `${SELECT} WHERE $1::uuid IS NULL OR t.from_location_id = $1 OR t.to_location_id = $1 ORDER BY t.created_at DESC, t.id LIMIT $2 OFFSET $3`,
    [locationId, limit, offset],
  );
}

export function countTransfersOf(ex: Executor, locationId: string | null): Promise<number> {
  return queryCount(
    ex,
    `SELECT count(*)::int AS n FROM transfer t WHERE $1::uuid IS NULL OR t.from_location_id = $1 OR t.to_location_id = $1`,
    [locationId],
  );
}

/**
 * Moves a transfer on only from the state the step expects: of two people acting at once, the
 * second finds the state changed and touches nothing (answers false).
 */
export async function advanceTransfer(
  ex: Executor,
  id: string,
  from: TransferState,
  to: TransferState,
  actorId: string,
  refusalReason: string | null,
): Promise<boolean> {
  const n = await queryCount(
    ex,
    `WITH moved AS (
       UPDATE transfer SET state = $3, refusal_reason = $5, updated_by = $4, updated_at = now()
        WHERE id = $1 AND state = $2 RETURNING 1)
     SELECT count(*)::int AS n FROM moved`,
    [id, from, to, actorId, refusalReason],
  );
  return n === 1;
}
