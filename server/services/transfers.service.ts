import type { DataSource } from 'typeorm';
import type { User } from '../../shared/schemas/auth';
import {
  TRANSFER_STEPS,
  type TransferConflictDetails,
  type TransferRequestBody,
  type TransferStep,
  type TransferStepBody,
  type TransfersQuery,
} from '../../shared/schemas/locations';
import { AppError } from '../errors';
import type { JobQueue } from '../jobs/queue';
import { audit } from '../repositories/audit.repository';
import { findLocation } from '../repositories/locations.repository';
import { findPartRows } from '../repositories/parts.repository';
import { moveStock } from '../repositories/stock.repository';
import {
  advanceTransfer,
  countTransfersOf,
  findTransfer,
  insertTransfer,
  transfersOf,
  type TransferRow,
} from '../repositories/transfers.repository';

/** Who reads the Transfers page and acts on it: a person and their home store (an admin may have none). */
export type Reader = Pick<User, 'id' | 'role' | 'homeLocationId'>;

/** The steps a reader may take on a transfer now: the source store's staff pick, send or refuse, the requesting store's receive or cancel. */
export function stepsFor(t: Pick<TransferRow, 'state' | 'from_location_id' | 'to_location_id'>, reader: Reader): TransferStep[] {
  return (Object.keys(TRANSFER_STEPS) as TransferStep[]).filter((step) => {
    const rule = TRANSFER_STEPS[step];
    if (rule.from !== t.state) return false;
    if (reader.role === 'admin') return true;
    return reader.homeLocationId === (rule.by === 'source' ? t.from_location_id : t.to_location_id);
  });
}

function homeOf(reader: Reader): string {
  if (!reader.homeLocationId) throw AppError.forbidden('You have no home store to ask for parts.');
  return reader.homeLocationId;
}

export async function listTransfers(ds: DataSource, reader: Reader, q: TransfersQuery): Promise<{ rows: TransferRow[]; total: number }> {
  // Someone without a home store (an admin of the whole chain) sees every store's.
  const location = reader.homeLocationId;
  const [rows, total] = await Promise.all([transfersOf(ds.manager, location, q.limit, q.offset), countTransfersOf(ds.manager, location)]);
  return { rows, total };
}

/** A clerk asks another store for N of a part, to their own home store; the requester is told of each step by mail. */
export function requestTransfer(ds: DataSource, reader: Reader, body: TransferRequestBody): Promise<TransferRow> {
  const to = homeOf(reader);
  if (to === body.fromLocationId) throw AppError.badRequest('fromLocationId: ask another store than your own');
  return ds.transaction(async (m) => {
    if (!(await findLocation(m, body.fromLocationId))) throw AppError.badRequest('fromLocationId: no such store');
    if (!(await findPartRows(m, [body.partId])).has(body.partId)) throw AppError.badRequest('partId: no such part');
    const id = await insertTransfer(m, { ...body, toLocationId: to, requestedBy: reader.id });
    await audit(m, {
      actorId: reader.id,
      action: 'transfer.request',
      entityType: 'transfer',
      entityId: id,
      data: { ...body, toLocationId: to },
    });
    const row = await findTransfer(m, id);
    if (!row) throw AppError.notFound('Transfer');
    return row;
  });
}

/**
 * One step of a transfer, in one transaction: the state moves on only from the state the step
 * expects (a conditional UPDATE), so of two people acting at once one wins and the other gets a 409.
 * Receiving moves the stock: taken from the source store (never below zero) and added here.
 */
export async function stepTransfer(
  ds: DataSource,
  jobs: JobQueue,
  reader: Reader,
  id: string,
  body: TransferStepBody,
): Promise<TransferRow> {
  const rule = TRANSFER_STEPS[body.step];
  return ds.transaction(async (m) => {
    const t = await findTransfer(m, id);
    if (!t) throw AppError.notFound('Transfer');
    const side = rule.by === 'source' ? t.from_name : t.to_name;
    if (reader.role !== 'admin' && reader.homeLocationId !== (rule.by === 'source' ? t.from_location_id : t.to_location_id)) {
      throw AppError.forbidden(`Only the staff of ${side} may do this.`);
    }
    const reason = body.step === 'refuse' ? body.reason : null;
    if (!(await advanceTransfer(m, id, rule.from, rule.to, reader.id, reason))) {
      const details: TransferConflictDetails = { state: t.state };
      throw AppError.conflict(`This transfer is no longer ${rule.from}: someone else acted on it first.`, details);
    }
    if (body.step === 'receive') {
      const move = { partId: t.part_id, reason: 'transfer', actorId: reader.id, transferId: id };
      const left = await moveStock(m, { ...move, locationId: t.from_location_id, delta: -t.quantity });
      if (left === null) throw AppError.conflict(`${t.from_name} does not have ${t.quantity} on hand to send.`);
      await moveStock(m, { ...move, locationId: t.to_location_id, delta: t.quantity });
    }
    await audit(m, {
      actorId: reader.id,
      action: `transfer.${body.step}`,
      entityType: 'transfer',
      entityId: id,
      data: { from: rule.from, to: rule.to, quantity: t.quantity, ...(reason ? { reason } : {}) },
    });
    // The requester hears of every step but their own cancelling.
    if (body.step !== 'cancel') await jobs.enqueue(m, 'mail.transfer', { transferId: id, state: rule.to });
    const row = await findTransfer(m, id);
    if (!row) throw AppError.notFound('Transfer');
    return row;
  });
}
