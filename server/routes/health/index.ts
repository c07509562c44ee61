import type { HealthResponse } from '../../../shared/schemas/health'
import { access } from '../../auth/access'
import type { AppContext } from '../../context'
import type { SecureRouter } from '../../http/secure-router'
import { appVersion } from '../../version'

/** A database that does not answer within this time counts as down. */
const DB_TIMEOUT_MS = 2000

async function databaseUp(ctx: AppContext): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined
  const timeout = new Promise<false>((resolve) => { timer = setTimeout(() => resolve(false), DB_TIMEOUT_MS) })
  const probe = ctx.sequelize.query('SELECT 1').then(() => true, () => false)
  try {
    return await Promise.race([probe, timeout])
  } finally {
    clearTimeout(timer)
  }
}

export function healthRoutes(ctx: AppContext, r: SecureRouter): void {
  r.get('/health', { access: access.public }, async (_req, res) => {
    const up = await databaseUp(ctx)
    const body: HealthResponse = { status: up ? 'ok' : 'degraded', version: appVersion, database: up ? 'up' : 'down' }
    // 503 lets a monitor or load balancer see the degraded state without parsing.
    res.status(up ? 200 : 503).json(body)
  })
}
