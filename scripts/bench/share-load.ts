/**
 * Load check of the public share endpoint (npm run bench:share): a crowd
 * opening one `anyone` share link on loopback, against the app (this
 * process, test database, request log on at `info` into a file) and, in the
 * same run, against a bare Node `http` server (its own process) that answers
 * every request with the same body and headers of the same size class. The
 * load generator is autocannon's command line in a third process. Prints
 * opens a second, p50, p99 and errors for both, and the app's share of the
 * bare server's rate; the README keeps the figures.
 *
 *   npm run bench:share [-- --connections 200 --seconds 10]
 *
 * Targets (issue 15): at least 0.25 of the bare server, p99 under 50 ms,
 * no errors. Nothing here is a test: figures vary with the machine's load.
 */
import { execFile, spawn } from 'node:child_process'
import fs from 'node:fs'
import type { Server } from 'node:http'
import os from 'node:os'
import path from 'node:path'
import readline from 'node:readline'
import { promisify } from 'node:util'
import { loadConfig } from '../../server/config'
import { databaseUrl, projectRoot, testCluster } from '../../server/db/cluster'
import { Membership, User, Workspace } from '../../server/models'
import { createRuntime, listen } from '../../server/runtime'
import { createScenario } from '../../server/services/scenarios'
import { createShareLink } from '../../server/services/share-links'
import { defaultMachine } from '../../shared/schemas/machine'
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
const WARMUP_SECONDS = 2

interface Figures {
  opensPerSecond: number
  p50: number
  p99: number
  errors: number
  /** CPU time (user + system) the server spent per answer, µs: less sensitive to other load than the rates. */
  cpuPerOpen: number
}

interface Load extends Omit<Figures, 'cpuPerOpen'> {
  requests: number
}

/** autocannon in its own process, so it does not take the measured server's thread. */
async function load(url: string, duration: number): Promise<Load> {
  const bin = path.join(projectRoot, 'node_modules', 'autocannon', 'autocannon.js')
  const { stdout } = await promisify(execFile)(process.execPath, [bin, '-j', '-c', String(connections), '-d', String(duration), url], { maxBuffer: 16 * 1024 * 1024 })
  const r = JSON.parse(stdout) as { requests: { average: number; total: number }; latency: { p50: number; p99: number }; errors: number; timeouts: number; non2xx: number }
  return { opensPerSecond: r.requests.average, requests: r.requests.total, p50: r.latency.p50, p99: r.latency.p99, errors: r.errors + r.timeouts + r.non2xx }
}

/** `cpu` reads the server's CPU time so far, in µs. */
async function measure(url: string, cpu: () => Promise<number>): Promise<Figures> {
  await load(url, WARMUP_SECONDS) // JIT, connection pools, the app's cache
  const before = await cpu()
  const { requests, ...figures } = await load(url, seconds)
  return { ...figures, cpuPerOpen: ((await cpu()) - before) / Math.max(1, requests) }
}

const cpuNow = (u: NodeJS.CpuUsage) => u.user + u.system

/**
 * A bare Node http server in its own process that answers every request with
 * `bodyFile`; a line on its stdin makes it print its CPU time so far.
 */
async function startBare(bodyFile: string): Promise<{ url: string; cpu: () => Promise<number>; stop: () => void }> {
  const code = `
    const http = require('node:http')
    const body = require('node:fs').readFileSync(${JSON.stringify(bodyFile)})
    http.createServer((req, res) => {
      res.writeHead(200, { 'Content-Type': 'application/json; charset=utf-8', 'Content-Length': body.length })
      res.end(body)
    }).listen(0, '127.0.0.1', function () { console.log(this.address().port) })
    require('node:readline').createInterface({ input: process.stdin }).on('line', () => {
      const u = process.cpuUsage()
      console.log(u.user + u.system)
    })`
  const child = spawn(process.execPath, ['-e', code], { stdio: ['pipe', 'pipe', 'inherit'] })
  const lines = readline.createInterface({ input: child.stdout })
  const next = () =>
    new Promise<string>((resolve, reject) => {
      lines.once('line', resolve)
      child.once('exit', (c) => reject(new Error(`bare server exited (${c})`)))
    })
  const port = await next()
  const cpu = async () => {
    const answer = next()
    child.stdin.write('\n')
    return Number(await answer)
  }
  return { url: `http://127.0.0.1:${port}/`, cpu, stop: () => child.kill() }
}

const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'chimeline-share-bench-'))
await prepareCluster(testCluster)
const runtime = await createRuntime({
  ...loadConfig({
    NODE_ENV: 'test',
    DATABASE_URL: databaseUrl(testCluster),
    JWT_SECRET: 'share-load-bench-only-secret-0123456789',
    SMTP_SINK_PORT: '0',
    CLIENT_DIR: '',
    PORT: '0',
    LOG_LEVEL: 'info',
    LOG_FILE: path.join(tmp, 'app.log'),
  }),
})
let server: Server | null = null
let bare: Awaited<ReturnType<typeof startBare>> | null = null
let workspace: Workspace | null = null
let user: User | null = null
try {
  const listening = await listen(runtime)
  server = listening.server
  user = await User.create({ email: `bench-${Date.now()}@example.test`, name: 'Bench Reader', passwordHash: 'not-a-login' })
  workspace = await Workspace.create({ name: 'Share load bench' })
  await Membership.create({ workspaceId: workspace.id, userId: user.id, role: 'owner' })
  const program = '  li a0, 64\nloop:\n  vsetvli t0, a0, e64, m1, ta, ma\n  vfadd.vv v1, v1, v2\n  sub a0, a0, t0\n  bnez a0, loop\n'
  const scenario = await createScenario(runtime.ctx, user, workspace.id, { content: { title: 'Bench', description: '', tags: [], program, machine: defaultMachine, initialData: [], view: { cursor: 10, window: null, selected: 0 }, expectations: [], walkthroughs: [] }, message: '' })
  const { token } = await createShareLink(runtime.ctx, user, workspace.id, scenario.id, { accessMode: 'anyone', expiresAt: null })
  const appUrl = `${listening.url}/api/shares/${token}`

  const body = Buffer.from(await (await fetch(appUrl)).arrayBuffer())
  fs.writeFileSync(path.join(tmp, 'body.json'), body)
  bare = await startBare(path.join(tmp, 'body.json'))

  const loadBefore = fs.readFileSync('/proc/loadavg', 'utf8').split(' ').slice(0, 3).join(' ')
  const app = await measure(appUrl, async () => cpuNow(process.cpuUsage()))
  const base = await measure(bare.url, bare.cpu)
  const loadAfter = fs.readFileSync('/proc/loadavg', 'utf8').split(' ').slice(0, 3).join(' ')

  const ratio = app.opensPerSecond / base.opensPerSecond
  const row = (name: string, f: Figures) => `${name.padEnd(12)} ${Math.round(f.opensPerSecond).toLocaleString('en-US').padStart(9)} ${`${f.p50} ms`.padStart(8)} ${`${f.p99} ms`.padStart(8)} ${String(f.errors).padStart(7)} ${`${Math.round(f.cpuPerOpen)} µs`.padStart(14)}`
  console.log(`GET /api/shares/:token, ${body.length} B body, ${connections} connections, ${seconds} s each (after ${WARMUP_SECONDS} s warm-up); load average ${loadBefore} before, ${loadAfter} after`)
  console.log(`${'server'.padEnd(12)} ${'opens/s'.padStart(9)} ${'p50'.padStart(8)} ${'p99'.padStart(8)} ${'errors'.padStart(7)} ${'CPU per open'.padStart(14)}`)
  console.log(row('Chimeline', app))
  console.log(row('bare Node', base))
  console.log(`ratio ${ratio.toFixed(3)} of bare (target >= 0.25); p99 ${app.p99} ms (target < 50); errors ${app.errors} (target 0); CPU per open ${(base.cpuPerOpen / app.cpuPerOpen).toFixed(3)} of bare's`)
  if (app.errors > 0) process.exitCode = 1
} finally {
  bare?.stop()
  server?.close()
  server?.closeAllConnections()
  if (workspace) await Workspace.destroy({ where: { id: workspace.id }, force: true })
  await user?.destroy()
  await runtime.close()
  fs.rmSync(tmp, { recursive: true, force: true })
}
