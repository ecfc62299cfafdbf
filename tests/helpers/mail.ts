import { inject } from 'vitest';
import type { OutboxMessage } from '../../shared/schemas/outbox';

/** Messages the real SMTP catcher received, newest first. */
export async function caughtMail(): Promise<OutboxMessage[]> {
  const res = await fetch(`${inject('mailCatcherUrl')}/messages`);
  return ((await res.json()) as { messages: OutboxMessage[] }).messages;
}

/** Waits for a message to an address (SMTP delivery is asynchronous). */
export async function waitForMail(to: string, timeoutMs = 5000): Promise<OutboxMessage> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = (await caughtMail()).find((m) => m.to.includes(to));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`no mail to ${to} within ${timeoutMs} ms`);
}
