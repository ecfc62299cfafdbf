import { outboxResponseSchema, type OutboxMessage } from '../../shared/schemas/outbox';
import { AppError } from '../errors';

/** Reads the local mail catcher's messages; there is no outbox when a real SMTP server is used. */
export async function readOutbox(catcherUrl: string | undefined): Promise<OutboxMessage[]> {
  if (!catcherUrl) throw new AppError(404, 'not_found', 'The outbox exists only while the local mail catcher is in use.');
  const res = await fetch(`${catcherUrl}/messages`);
  if (!res.ok) throw new AppError(503, 'unavailable', 'The local mail catcher did not answer.');
  return outboxResponseSchema.parse(await res.json()).messages;
}
