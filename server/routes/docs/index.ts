import { access } from '../../auth/access'
import type { SecureRouter } from '../../http/secure-router'
import { openApiDocument } from '../../services/openapi'

export function docsRoutes(r: SecureRouter): void {
  r.get('/docs', { access: access.public }, (_req, res) => {
    res.json(openApiDocument())
  })
}
