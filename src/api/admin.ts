import { outboxResponseSchema } from '@shared/schemas/outbox'
import type { Http } from './http'

export function createAdminApi(http: Http) {
  return {
    /** E-mails the local SMTP sink received, newest first (site admins only). */
    outbox: () => http.request('/api/admin/outbox', { schema: outboxResponseSchema }),
  }
}
