/**
 * `npm start`: PostgreSQL (installed when missing), the private data cluster,
 * migrations, a client build, the demo seed, then app + API on one port.
 * Ctrl-C stops the app; `npm run db:stop` stops the database.
 * CHIMELINE_EXIT_WHEN_HEALTHY=1 exits 0 once /api/health answers ok (fresh-clone check).
 */
import { spawnSync } from 'node:child_process'
import { loadConfig } from '../server/config'
import { mainCluster, projectRoot } from '../server/db/cluster'
import { createRuntime, listen } from '../server/runtime'
import { DEMO_PASSWORD, DEMO_USERS, DEMO_WORKSPACE, seedDemoWithScenarios } from '../server/services/demo-seed'
import { migrateDatabase, prepareCluster } from './db'

function run(cmd: string, args: string[], what: string): void {
  const r = spawnSync(cmd, args, { cwd: projectRoot, stdio: 'inherit' })
  if (r.status !== 0) throw new Error(`${what} failed (exit ${r.status ?? r.signal})`)
}

async function waitHealthy(url: string, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs
  for (;;) {
    try {
      const res = await fetch(`${url}/api/health`)
      const body = (await res.json()) as { status?: string }
      if (body.status === 'ok') return
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`${url}/api/health did not answer ok within ${timeoutMs / 1000} s`)
    await new Promise((resolve) => setTimeout(resolve, 200))
  }
}

async function main(): Promise<void> {
  console.log('Chimeline: checking PostgreSQL ...')
  run('bash', ['scripts/ensure-tools.sh', 'postgres'], 'Installing PostgreSQL')
  if (process.env.DATABASE_URL) await migrateDatabase(process.env.DATABASE_URL)
  else await prepareCluster(mainCluster)

  // The client is built before the app exists, so the very first start serves it.
  console.log('Chimeline: building the client ...')
  run('npx', ['vite', 'build', '--logLevel', 'warn'], 'vite build')

  const config = loadConfig()
  const runtime = await createRuntime(config)
  const demo = config.seedDemo ? await seedDemoWithScenarios(runtime.ctx) : null

  const { server, url } = await listen(runtime)
  const stop = async (code: number) => {
    server.close()
    server.closeAllConnections()
    await runtime.close()
    process.exit(code)
  }
  process.on('SIGINT', () => void stop(0))
  process.on('SIGTERM', () => void stop(0))

  console.log(`\nChimeline is running at ${url}`)
  if (config.seedDemo) {
    console.log(`\nDemo sign-ins (workspace "${DEMO_WORKSPACE}"), password for all: ${DEMO_PASSWORD}`)
    for (const u of DEMO_USERS) console.log(`  ${u.email.padEnd(26)} ${u.workspace ?? `site ${u.site}`}`)
    if (demo?.shareUrl) console.log(`\nA demo scenario shared with anyone (no sign-in): ${demo.shareUrl}`)
  }
  if (runtime.sink) console.log(`\nE-mail goes to the local sink (127.0.0.1:${runtime.sink.port}); read it on the Outbox page as admin.`)
  console.log('\nCtrl-C stops the app; `npm run db:stop` stops the database.')

  if (process.env.CHIMELINE_EXIT_WHEN_HEALTHY === '1') {
    await waitHealthy(url, 30_000)
    console.log('Healthy: exiting as CHIMELINE_EXIT_WHEN_HEALTHY=1 asks.')
    await stop(0)
  }
}

main().catch((err: unknown) => {
  console.error(`Chimeline could not start: ${err instanceof Error ? err.message : String(err)}`)
  process.exit(1)
})
