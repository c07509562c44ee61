/**
 * A private PostgreSQL cluster for the project, made from Debian's `postgresql`
 * binaries: one for the user's data (`npm start`, `npm run dev`) and one for the
 * tests (fsync off, its database recreated per run). Both listen on 127.0.0.1
 * only, on non-default ports, with their Unix socket inside the cluster folder,
 * and trust connections from loopback (see the README's Configuration section).
 *
 * As root, initdb and postgres refuse to run: they run as the `postgres` system
 * user, which owns the cluster folder. When that user cannot reach the project
 * folder (a checkout under /root), the cluster lives under /var/lib/chimeline/
 * and `.data/<name>.location` records where.
 */
import { execFileSync, spawnSync } from 'node:child_process'
import { createHash } from 'node:crypto'
import fs from 'node:fs'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import pg from 'pg'

export const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..')
/** The git-ignored folder for everything a run creates (clusters, JWT secret). */
export const dataDir = path.resolve(process.env.CHIMELINE_DATA_DIR ?? path.join(projectRoot, '.data'))

export interface ClusterSpec {
  /** Folder name, also used in messages: `postgres` or `postgres-test`. */
  name: string
  port: number
  database: string
  /** Only for the throw-away test cluster: trades crash safety for speed. */
  fast: boolean
}

export const mainCluster: ClusterSpec = {
  name: 'postgres',
  port: Number(process.env.CHIMELINE_DB_PORT ?? 54329),
  database: 'chimeline',
  fast: false,
}

export const testCluster: ClusterSpec = {
  name: 'postgres-test',
  port: Number(process.env.CHIMELINE_TEST_DB_PORT ?? 54330),
  database: 'chimeline_test',
  fast: true,
}

/** The superuser initdb creates; trust auth on loopback, so no password. */
const SUPERUSER = 'postgres'

export function databaseUrl(spec: ClusterSpec, database = spec.database): string {
  return `postgres://${SUPERUSER}@127.0.0.1:${spec.port}/${database}`
}

const isRoot = process.getuid?.() === 0

function binDir(): string {
  const base = '/usr/lib/postgresql'
  const versions = fs.existsSync(base)
    ? fs.readdirSync(base).filter((v) => fs.existsSync(path.join(base, v, 'bin', 'initdb')))
    : []
  versions.sort((a, b) => Number(b) - Number(a))
  if (versions.length === 0) {
    throw new Error('PostgreSQL is not installed. Run: bash scripts/ensure-tools.sh postgres (as root) or sudo apt-get install -y postgresql')
  }
  return path.join(base, versions[0] as string, 'bin')
}

interface RunResult {
  status: number
  output: string
}

/** Runs a PostgreSQL binary, as the `postgres` user when we are root. */
function pgRun(bin: string, args: string[], options: { check?: boolean } = {}): RunResult {
  const exe = path.join(binDir(), bin)
  const [cmd, argv] = isRoot ? ['runuser', ['-u', SUPERUSER, '--', exe, ...args]] : [exe, args]
  // cwd '/': the postgres user may not be allowed into the current folder.
  const r = spawnSync(cmd, argv, { cwd: '/', encoding: 'utf8' })
  const output = `${r.stdout ?? ''}${r.stderr ?? ''}`
  const status = r.status ?? 1
  if (options.check !== false && status !== 0) {
    throw new Error(`${bin} ${args.join(' ')} failed (exit ${status}):\n${output}`)
  }
  return { status, output }
}

function canPostgresReach(dir: string): boolean {
  if (!isRoot) return true
  return spawnSync('runuser', ['-u', SUPERUSER, '--', 'test', '-x', dir], { cwd: '/' }).status === 0
}

/** Where the cluster folder is; decided once and recorded in the data folder. */
export function clusterDir(spec: ClusterSpec): string {
  fs.mkdirSync(dataDir, { recursive: true, mode: 0o755 })
  const record = path.join(dataDir, `${spec.name}.location`)
  if (fs.existsSync(record)) return fs.readFileSync(record, 'utf8').trim()
  if (canPostgresReach(dataDir)) return path.join(dataDir, spec.name)
  const hash = createHash('sha256').update(projectRoot).digest('hex').slice(0, 16)
  const outside = path.join('/var/lib/chimeline', hash, spec.name)
  fs.writeFileSync(record, `${outside}\n`)
  return outside
}

function ensureOwnedFolder(dir: string): void {
  // Parents stay traversable (0755) for the postgres user; the cluster itself is 0700.
  fs.mkdirSync(path.dirname(dir), { recursive: true, mode: 0o755 })
  fs.mkdirSync(dir, { recursive: true, mode: 0o700 })
  if (isRoot) execFileSync('chown', [`${SUPERUSER}:`, dir])
  fs.chmodSync(dir, 0o700)
}

function initCluster(spec: ClusterSpec, dir: string): void {
  ensureOwnedFolder(dir)
  pgRun('initdb', ['-D', dir, '-U', SUPERUSER, '--auth-local=trust', '--auth-host=trust', '--encoding=UTF8', '--locale=C.UTF-8'])
  const settings = [
    `listen_addresses = '127.0.0.1'`,
    `unix_socket_directories = '${dir}'`,
    ...(spec.fast ? ['fsync = off', 'synchronous_commit = off', 'full_page_writes = off'] : []),
  ]
  const conf = path.join(dir, 'postgresql.conf')
  fs.appendFileSync(conf, `\n# Chimeline: private cluster, loopback only\n${settings.join('\n')}\n`)
}

function isRunning(dir: string): boolean {
  return pgRun('pg_ctl', ['status', '-D', dir], { check: false }).status === 0
}

function isReady(spec: ClusterSpec, dir: string): boolean {
  return pgRun('pg_isready', ['-q', '-h', dir, '-p', String(spec.port)], { check: false }).status === 0
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms))

/** Processes whose working folder is the cluster: backends outliving a killed postmaster. */
function lingeringProcesses(dir: string): number[] {
  const pids: number[] = []
  for (const entry of fs.readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue
    try {
      if (fs.readlinkSync(`/proc/${entry}/cwd`) === dir) pids.push(Number(entry))
    } catch {
      // gone already, or not ours to read
    }
  }
  return pids
}

async function waitFor(what: string, test: () => boolean, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs
  while (!test()) {
    if (Date.now() > deadline) throw new Error(`Timed out after ${timeoutMs / 1000} s waiting for ${what}`)
    await sleep(100)
  }
}

/** Starts the cluster (creating it on first use); never wipes data. Idempotent. */
export async function startCluster(spec: ClusterSpec): Promise<void> {
  const dir = clusterDir(spec)
  if (!fs.existsSync(path.join(dir, 'PG_VERSION'))) initCluster(spec, dir)
  if (!isRunning(dir)) {
    // After a hard kill, backends can linger for a moment and hold shared memory.
    await waitFor('old PostgreSQL processes to exit', () => lingeringProcesses(dir).length === 0, 15_000)
    const log = path.join(dir, 'server.log')
    const r = pgRun('pg_ctl', ['start', '-D', dir, '-l', log, '-w', '-t', '60', '-o', `-p ${spec.port}`], { check: false })
    if (r.status !== 0) {
      const tail = fs.existsSync(log) ? fs.readFileSync(log, 'utf8').split('\n').slice(-15).join('\n') : ''
      throw new Error(`PostgreSQL (${spec.name}) did not start on 127.0.0.1:${spec.port}:\n${r.output}\n${tail}`)
    }
  }
  await waitFor(`PostgreSQL (${spec.name}) to accept connections`, () => isReady(spec, dir), 30_000)
}

export function stopCluster(spec: ClusterSpec): boolean {
  const dir = clusterDir(spec)
  if (!fs.existsSync(path.join(dir, 'PG_VERSION')) || !isRunning(dir)) return false
  pgRun('pg_ctl', ['stop', '-D', dir, '-m', 'fast', '-w'])
  return true
}

async function withAdmin<T>(spec: ClusterSpec, fn: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: databaseUrl(spec, 'postgres') })
  await client.connect()
  try {
    return await fn(client)
  } finally {
    await client.end()
  }
}

/** Creates the cluster's database when it does not exist yet. */
export async function ensureDatabase(spec: ClusterSpec): Promise<void> {
  await withAdmin(spec, async (client) => {
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [spec.database])
    if (found.rowCount === 0) await client.query(`CREATE DATABASE "${spec.database}"`)
  })
}

/** Drops and recreates the cluster's database (test cluster only). */
export async function recreateDatabase(spec: ClusterSpec): Promise<void> {
  if (!spec.fast) throw new Error('refusing to recreate a database that holds user data')
  await withAdmin(spec, async (client) => {
    await client.query(`DROP DATABASE IF EXISTS "${spec.database}" WITH (FORCE)`)
    await client.query(`CREATE DATABASE "${spec.database}"`)
  })
}
