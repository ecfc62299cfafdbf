import type { OutboxMessage, OutboxResponse } from '../../shared/schemas/outbox';

/** GET /api/outbox: what the local mail catcher holds, newest as it lists them. */
export const presentOutbox = (messages: OutboxMessage[]): OutboxResponse => ({
  messages: messages.map((m) => ({ to: m.to, subject: m.subject, text: m.text, html: m.html, date: m.date })),
});
