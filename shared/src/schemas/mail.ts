import { z } from 'zod';

/**
 * Mail: what the server sent (its outbox, with delivery state) and what its local SMTP sink received
 * (when SMTP_URL is unset). Responses of /api/admin/mail and /api/mail/mine; dates as ISO 8601 text.
 */

export const OUTBOX_STATES = ['queued', 'sent', 'failed'] as const;
export const outboxStateSchema = z.enum(OUTBOX_STATES);
export type OutboxState = z.infer<typeof outboxStateSchema>;

const recipientFilter = z
  .string({ error: 'to must be text' })
  .trim()
  .toLowerCase()
  .max(254, 'to must have at most 254 characters')
  .describe('Only messages to this address (or to addresses containing this text)');

const limitText = z.coerce
  .number({ error: 'limit must be a whole number' })
  .int('limit must be a whole number')
  .min(1, 'limit must be at least 1')
  .max(500, 'limit must be at most 500');

export const listMailQuerySchema = z.object({
  to: recipientFilter.optional(),
  limit: limitText.default(100),
});
export type ListMailQuery = z.infer<typeof listMailQuerySchema>;

export const listOutboxQuerySchema = listMailQuerySchema.extend({
  state: outboxStateSchema.optional(),
});
export type ListOutboxQuery = z.infer<typeof listOutboxQuerySchema>;

/** One message as the local sink received it over SMTP, parsed. */
export const receivedMailSchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  /** The envelope recipients (RCPT TO), lower-case. */
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string(),
  messageId: z.string().nullable(),
});
export type ReceivedMail = z.infer<typeof receivedMailSchema>;

/** One message the server means to send, with how its delivery went. */
export const outboxMessageSchema = z.object({
  id: z.string(),
  createdAt: z.string(),
  to: z.string(),
  subject: z.string(),
  link: z.string(),
  state: outboxStateSchema,
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  sentAt: z.string().nullable(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
