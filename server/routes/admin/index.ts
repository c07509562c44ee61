import type { OutboxResponse } from '../../../shared/schemas/outbox'
import { access } from '../../auth/access'
import type { SecureRouter } from '../../http/secure-router'
import { OutboxMessage } from '../../models'

/** The Outbox shows the newest messages only. */
export const OUTBOX_LIMIT = 200

export function adminRoutes(r: SecureRouter): void {
  r.get('/admin/outbox', { access: access.site('admin') }, async (_req, res) => {
    const rows = await OutboxMessage.findAll({ order: [['receivedAt', 'DESC']], limit: OUTBOX_LIMIT })
    const body: OutboxResponse = { messages: rows.map((m) => m.toDto()) }
    res.json(body)
  })
}
