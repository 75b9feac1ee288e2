import { z } from 'zod';

/** A message the local fake SMTP server received (the development outbox). */
export const outboxMessage = z.object({
  id: z.number().int(),
  to: z.string(),
  from: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string(),
  receivedAt: z.string(),
});
export type OutboxMessage = z.infer<typeof outboxMessage>;
