/**
 * `npm run dev`: the data cluster (migrated, demo seeded), the API server under
 * `tsx watch` (restarts on server changes) and Vite's dev server with hot
 * reload, which proxies /api to the API's PORT (vite.config.ts).
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process'
import { loadConfig } from '../server/config'
import { mainCluster, projectRoot } from '../server/db/cluster'
import { createRuntime } from '../server/runtime'
import { DEMO_PASSWORD, seedDemoWithScenarios } from '../server/services/demo-seed'
import { migrateDatabase, prepareCluster } from './db'

async function main(): Promise<void> {
  if (spawnSync('bash', ['scripts/ensure-tools.sh', 'postgres'], { cwd: projectRoot, stdio: 'inherit' }).status !== 0) process.exit(1)
  if (process.env.DATABASE_URL) await migrateDatabase(process.env.DATABASE_URL)
  else await prepareCluster(mainCluster)
  const config = loadConfig()
  const devPublicUrl = process.env.PUBLIC_URL ?? 'http://127.0.0.1:5173'
  if (config.seedDemo) {
    // A short-lived runtime: the demo scenarios are saved with their run summaries.
    const runtime = await createRuntime({ ...config, publicUrl: devPublicUrl })
    const demo = await seedDemoWithScenarios(runtime.ctx)
    await runtime.close()
    if (demo.shareUrl) console.log(`A demo scenario shared with anyone: ${demo.shareUrl}`)
  }

  // The API serves no client in dev mode: Vite does, on its own port.
  const env = { ...process.env, CLIENT_DIR: '', PUBLIC_URL: devPublicUrl }
  const children: ChildProcess[] = [
    spawn('npx', ['tsx', 'watch', '--clear-screen=false', 'server/index.ts'], { cwd: projectRoot, env, stdio: 'inherit' }),
    spawn('npx', ['vite'], { cwd: projectRoot, env, stdio: 'inherit' }),
  ]
  console.log(`\nChimeline dev: open http://127.0.0.1:5173 (API on port ${config.port}); demo password ${DEMO_PASSWORD}. Ctrl-C stops both.\n`)

  let stopping = false
  const stop = (code: number) => {
    if (stopping) return
    stopping = true
    for (const child of children) if (child.exitCode === null) child.kill('SIGTERM')
    setTimeout(() => process.exit(code), 500).unref()
  }
  for (const child of children) child.on('exit', (code) => stop(code ?? 0))
  process.on('SIGINT', () => stop(0))
  process.on('SIGTERM', () => stop(0))
}

main().catch((err: unknown) => {
  console.error(`dev: ${err instanceof Error ? err.message : String(err)}`)
  process.exit(1)
})
