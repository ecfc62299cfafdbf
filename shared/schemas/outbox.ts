import { z } from 'zod';

/** A message the local mail catcher holds (the Outbox page, admin). */
export const outboxMessageSchema = z.object({
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string(),
  date: z.string(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

export const outboxResponseSchema = z.object({ messages: z.array(outboxMessageSchema) });
export type OutboxResponse = z.infer<typeof outboxResponseSchema>;
