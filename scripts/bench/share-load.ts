/**
 * Load check of the public share endpoint (npm run bench:share): 200
 * concurrent readers of one share link on loopback, with autocannon, against
 * a real server on the test database. Prints p50/p99 latency, throughput and
 * errors as one JSON line; the README keeps the figures.
 *
 *   npm run bench:share [-- --connections 200 --seconds 10]
 */
import type { Server } from 'node:http'
import autocannon from 'autocannon'
import { loadConfig } from '../../server/config'
import { databaseUrl, testCluster } from '../../server/db/cluster'
import { Membership, User, Workspace } from '../../server/models'
import { createRuntime, listen } from '../../server/runtime'
import { createScenario } from '../../server/services/scenarios'
import { createShareLink } from '../../server/services/share-links'
import { prepareCluster } from '../db'

function arg(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`)
  const v = i >= 0 ? Number(process.argv[i + 1]) : fallback
  if (!Number.isInteger(v) || v <= 0) {
    console.error(`--${name} takes a positive integer`)
    process.exit(2)
  }
  return v
}

const connections = arg('connections', 200)
const seconds = arg('seconds', 10)

await prepareCluster(testCluster)
const runtime = await createRuntime({
  ...loadConfig({ NODE_ENV: 'test', DATABASE_URL: databaseUrl(testCluster), JWT_SECRET: 'share-load-bench-only-secret-0123456789', SMTP_SINK_PORT: '0', CLIENT_DIR: '', PORT: '0' }),
})
let server: Server | null = null
try {
  const listening = await listen(runtime)
  server = listening.server
  const user = await User.create({ email: `bench-${Date.now()}@example.test`, name: 'Bench Reader', passwordHash: 'not-a-login' })
  const workspace = await Workspace.create({ name: 'Share load bench' })
  await Membership.create({ workspaceId: workspace.id, userId: user.id, role: 'owner' })
  const program = '  li a0, 64\nloop:\n  vsetvli t0, a0, e64, m1, ta, ma\n  vfadd.vv v1, v1, v2\n  sub a0, a0, t0\n  bnez a0, loop\n'
  const scenario = await createScenario(runtime.ctx, user, workspace.id, { content: { title: 'Bench', description: '', tags: [], program, machine: (await import('../../shared/schemas/machine')).defaultMachine, initialData: [], view: { cursor: 10, window: null, selected: 0 }, expectations: [] }, message: '' })
  const { token } = await createShareLink(runtime.ctx, user, workspace.id, scenario.id, { accessMode: 'anyone', expiresAt: null })
  const url = `${listening.url}/api/shares/${token}`

  const result = await autocannon({ url, connections, duration: seconds })
  const figures = {
    connections,
    seconds,
    requests: result.requests.total,
    requestsPerSecond: Math.round(result.requests.average),
    latencyMs: { p50: result.latency.p50, p99: result.latency.p99, max: result.latency.max },
    errors: result.errors,
    timeouts: result.timeouts,
    non2xx: result.non2xx,
  }
  console.log(JSON.stringify(figures))
  await Workspace.destroy({ where: { id: workspace.id }, force: true })
  await user.destroy()
  if (figures.errors || figures.non2xx || figures.timeouts) process.exitCode = 1
} finally {
  server?.close()
  server?.closeAllConnections()
  await runtime.close()
}
