import { z } from 'zod'

/** One e-mail the local SMTP sink received. */
export const outboxMessageSchema = z.object({
  id: z.uuid(),
  to: z.array(z.string()),
  from: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string(),
  receivedAt: z.iso.datetime(),
})
export type OutboxMessage = z.infer<typeof outboxMessageSchema>

/** GET /api/admin/outbox, newest first. */
export const outboxResponseSchema = z.object({ messages: z.array(outboxMessageSchema) })
export type OutboxResponse = z.infer<typeof outboxResponseSchema>
