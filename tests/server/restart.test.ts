/**
 * Issue 6, "Done when": a saved scenario survives a restart of app and
 * database unchanged. The app runs as its own process (server/index.ts, as in
 * production); between its two lives the test cluster is stopped and started
 * again with the same code scripts/db.ts uses (server/db/cluster.ts through
 * prepareCluster), and everything is read back byte for byte.
 */
import { spawn, type ChildProcess } from 'node:child_process'
import { createRequire } from 'node:module'
import { pathToFileURL } from 'node:url'
import pg from 'pg'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { databaseUrl, projectRoot, stopCluster, testCluster } from '../../server/db/cluster'
import type { Runtime } from '../../server/runtime'
import { prepareCluster } from '../../scripts/db'
import { startTestServer } from './helpers'
import { buildTeam, content, type Team } from './scenario-helpers'

const tsxLoader = pathToFileURL(createRequire(import.meta.url).resolve('tsx')).href

interface App {
  url: string
  child: ChildProcess
}

/** Starts `server/index.ts` in a new process on a free port; resolves once it listens. */
function startApp(jwtSecret: string): Promise<App> {
  const child = spawn(process.execPath, ['--import', tsxLoader, 'server/index.ts'], {
    cwd: projectRoot,
    env: { ...process.env, NODE_ENV: 'test', LOG_LEVEL: 'info', PORT: '0', DATABASE_URL: databaseUrl(testCluster), JWT_SECRET: jwtSecret, SMTP_URL: '', SMTP_SINK_PORT: '0', CLIENT_DIR: '' },
    stdio: ['ignore', 'pipe', 'pipe'],
  })
  return new Promise((resolve, reject) => {
    let out = ''
    const fail = (why: string) => {
      child.kill('SIGKILL')
      reject(new Error(`${why}\n${out}`))
    }
    const timer = setTimeout(() => fail('the app did not listen within 30 s'), 30_000)
    child.stderr?.on('data', (d: Buffer) => (out += d.toString()))
    child.stdout?.on('data', (d: Buffer) => {
      out += d.toString()
      // pino writes one JSON object a line; server/index.ts logs its URL once listening.
      const line = out.split('\n').find((l) => l.includes('Chimeline API listening'))
      if (!line) return
      clearTimeout(timer)
      resolve({ url: (JSON.parse(line) as { url: string }).url, child })
    })
    child.once('exit', (code) => {
      clearTimeout(timer)
      reject(new Error(`the app exited (${code}) before listening\n${out}`))
    })
  })
}

/** SIGTERM, as Ctrl-C or a service manager would; resolves with the exit code. */
function stopApp(app: App): Promise<number | null> {
  return new Promise((resolve) => {
    if (app.child.exitCode !== null) return resolve(app.child.exitCode)
    app.child.once('exit', (code) => resolve(code))
    app.child.kill('SIGTERM')
  })
}

async function databaseAnswers(): Promise<boolean> {
  const client = new pg.Client({ connectionString: databaseUrl(testCluster), connectionTimeoutMillis: 2000 })
  try {
    await client.connect()
    await client.query('SELECT 1')
    return true
  } catch {
    return false
  } finally {
    await client.end().catch(() => undefined)
  }
}

/** The stored rows themselves, as PostgreSQL prints them. */
async function storedRows(scenarioId: string): Promise<string[]> {
  const client = new pg.Client({ connectionString: databaseUrl(testCluster) })
  await client.connect()
  try {
    const scenario = await client.query<{ row: string }>('SELECT s::text AS row FROM scenarios s WHERE id = $1', [scenarioId])
    const versions = await client.query<{ row: string }>('SELECT v::text AS row FROM scenario_versions v WHERE scenario_id = $1 ORDER BY number', [scenarioId])
    return [...scenario.rows, ...versions.rows].map((r) => r.row)
  } finally {
    await client.end()
  }
}

let harness: Runtime | null = null
let team: Team
const apps: App[] = []
beforeAll(async () => {
  harness = await startTestServer()
  team = await buildTeam(harness, 'Restart lab')
})
afterAll(async () => {
  for (const app of apps) await stopApp(app)
  await harness?.close()
  // Whatever happened above, the rest of the suite gets its database back.
  await prepareCluster(testCluster)
})

describe('a restart of app and database', () => {
  it('keeps a saved scenario and every version byte-identical (API answers and stored rows)', async () => {
    const jwtSecret = harness!.ctx.config.jwtSecret
    const auth = { Authorization: team.editor.auth.Authorization, 'Content-Type': 'application/json' }
    const first = await startApp(jwtSecret)
    apps.push(first)
    const base = `${first.url}/api/workspaces/${team.workspace.id}/scenarios`
    const post = async (url: string, body: unknown, status: number) => {
      const res = await fetch(url, { method: 'POST', headers: auth, body: JSON.stringify(body) })
      expect(res.status, await res.clone().text()).toBe(status)
      return (await res.json()) as { scenario: { id: string } }
    }
    // Text with characters that a careless encoding would change: UTF-8 beyond ASCII, tabs, CRLF.
    const created = await post(base, { content: content({ title: 'Survives a restart: µ-ops, “quotes”', description: 'Line 1\r\n\tLine 2 — ☃' }), message: 'First' }, 201)
    const id = created.scenario.id
    await post(`${base}/${id}/versions`, { baseVersion: 1, content: content({ title: 'Second', machine: { lanes: 8, vlen: 1024 }, view: { cursor: 17, window: { start: 3, end: 90 }, selected: 2 } }), message: 'Eight lanes' }, 201)
    await post(`${base}/${id}/versions`, { baseVersion: 2, content: content({ title: 'Third', initialData: [{ label: 'a', type: 'f64', values: ['3.5'] }] }), message: 'a = 3.5' }, 201)

    const paths = [`/${id}`, `/${id}/versions`, `/${id}/versions/1`, `/${id}/versions/2`, `/${id}/versions/3`, `?page=1&pageSize=50`]
    const read = async (app: App) => {
      const texts: string[] = []
      for (const p of paths) {
        const res = await fetch(`${app.url}/api/workspaces/${team.workspace.id}/scenarios${p}`, { headers: auth })
        expect(res.status).toBe(200)
        texts.push(await res.text())
      }
      return texts
    }
    const before = await read(first)
    const rowsBefore = await storedRows(id)
    expect(rowsBefore).toHaveLength(4)

    expect(await stopApp(first)).toBe(0)
    await harness!.close()
    harness = null
    expect(stopCluster(testCluster)).toBe(true)
    expect(await databaseAnswers()).toBe(false)
    await prepareCluster(testCluster)
    expect(await databaseAnswers()).toBe(true)

    const second = await startApp(jwtSecret)
    apps.push(second)
    expect(second.child.pid).not.toBe(first.child.pid)
    const after = await read(second)
    expect(after).toEqual(before)
    expect(await storedRows(id)).toEqual(rowsBefore)
    expect(JSON.parse(after[1] as string).versions.map((v: { number: number }) => v.number)).toEqual([3, 2, 1])
  }, 120_000)
})
