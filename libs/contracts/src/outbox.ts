import { z } from 'zod';

/** One message the development SMTP server received. */
export const outboxMessageSchema = z.object({
  /** Recipient addresses, comma-separated. */
  to: z.string(),
  subject: z.string(),
  /** Plain-text body. */
  text: z.string(),
  /** ISO 8601 date-time of receipt. */
  sentAt: z.iso.datetime(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

/** Answer of `GET /api/dev/outbox` (development and test mode only): newest first. */
export const outboxResponseSchema = z.array(outboxMessageSchema);
export type OutboxResponse = z.infer<typeof outboxResponseSchema>;
