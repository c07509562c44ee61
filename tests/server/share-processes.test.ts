/**
 * Two app processes on one database: this test's server and a second one
 * started as its own Node process (server/index.ts), as a deployment with
 * several processes behind one address would run them.
 */
import { spawn, type ChildProcess } from 'node:child_process'
import readline from 'node:readline'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { databaseUrl, testCluster } from '../../server/db/cluster'
import type { Runtime } from '../../server/runtime'
import { shareLinkListResponseSchema } from '../../shared/schemas/share-link'
import { startTestServer } from './helpers'
import { buildScenario, buildTeam, type Team } from './scenario-helpers'

const JWT_SECRET = 'integration-tests-only-secret-0123456789abcdef'

let here: Runtime
let team: Team
let other: { child: ChildProcess; url: string; exited: Promise<number | null> } | undefined

/** Starts server/index.ts and resolves with its address from its "listening" log line. */
function startOtherProcess(): Promise<NonNullable<typeof other>> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'test',
      LOG_LEVEL: 'info',
      DATABASE_URL: databaseUrl(testCluster),
      JWT_SECRET,
      PORT: '0',
      HOST: '127.0.0.1',
      SMTP_SINK_PORT: '0',
      CLIENT_DIR: '',
      // No timer: its counts are written when it stops.
      SHARE_COUNT_FLUSH_MS: '0',
    },
    stdio: ['ignore', 'pipe', 'inherit'],
  })
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)))
  return new Promise((resolve, reject) => {
    const lines = readline.createInterface({ input: child.stdout as NodeJS.ReadableStream })
    lines.on('line', (line) => {
      try {
        const entry = JSON.parse(line) as { msg?: string; url?: string }
        if (entry.msg === 'Chimeline API listening' && entry.url) resolve({ child, url: entry.url, exited })
      } catch {
        // not a log line
      }
    })
    void exited.then((code) => reject(new Error(`the second server exited (${code}) before listening`)))
  })
}

beforeAll(async () => {
  here = await startTestServer({ shareCountFlushMs: 0 })
  team = await buildTeam(here, 'Two processes')
  other = await startOtherProcess()
}, 120_000)
afterAll(async () => {
  if (other?.child.exitCode === null) other.child.kill('SIGTERM')
  await here.close()
})

function second(): NonNullable<typeof other> {
  if (!other) throw new Error('the second server did not start')
  return other
}

async function makeLink() {
  const s = await buildScenario(here, team)
  const res = await request(here.app).post(`/api/workspaces/${team.workspace.id}/scenarios/${s.id}/share-links`).set(team.editor.auth).send({}).expect(201)
  return { scenarioId: s.id, linkId: res.body.link.id as string, token: res.body.token as string }
}

describe('share links across two app processes on one database', () => {
  it('revoked through one process, a link the other has cached answers 410 once the revoke's notification has reached it', async () => {
    const { token, linkId } = await makeLink()
    // Warm the other process's cache, twice so the second open is served from it.
    await request(second().url).get(`/api/shares/${token}`).expect(200)
    await request(second().url).get(`/api/shares/${token}`).expect(200)
    await request(here.app).post(`/api/workspaces/${team.workspace.id}/share-links/${linkId}/revoke`).set(team.owner.auth).expect(200)
    // The revoke reaches the other process by PostgreSQL NOTIFY, which is delivered
    // asynchronously: on a loaded machine it can land after the next request.
    // Poll until it has (or 30 s pass); what is checked is that it does land.
    let res = await request(second().url).get(`/api/shares/${token}`)
    for (let i = 0; i < 300 && res.status === 200; i++) {
      await new Promise((r) => setTimeout(r, 100))
      res = await request(second().url).get(`/api/shares/${token}`)
    }
    expect(res.status).toBe(410)
    expect(res.body.error.code).toBe('share_revoked')
  })

  it('each process counts its own opens; the owner sees their sum once both have written them (the other at its shutdown)', async () => {
    const { token, linkId, scenarioId } = await makeLink()
    for (let i = 0; i < 3; i++) await request(second().url).get(`/api/shares/${token}`).expect(200)
    for (let i = 0; i < 2; i++) await request(here.app).get(`/api/shares/${token}`).expect(200)
    await here.ctx.shares.counts.flush()
    const count = async () => {
      const { links } = shareLinkListResponseSchema.parse((await request(here.app).get(`/api/workspaces/${team.workspace.id}/scenarios/${scenarioId}/share-links`).set(team.owner.auth).expect(200)).body)
      return links.find((l) => l.id === linkId)?.openCount
    }
    expect(await count()).toBe(2)
    second().child.kill('SIGTERM')
    expect(await second().exited).toBe(0)
    expect(await count()).toBe(5)
  })
})
