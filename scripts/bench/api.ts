/**
 * Heavy API requests against a real server on the test database
 * (npm run bench:api): the version diff of two 6,000-line programs (the case
 * of issue 9) and of two programs at the 200,000-character limit that differ
 * on every line, while a prober asks GET /api/health every 10 ms. Prints one
 * JSON line: each diff's time, the worst health latency while they ran, and
 * both as ratios to the idle health latency measured first in the same run
 * (the baseline; absolute times depend on the machine and its load).
 *
 *   npm run bench:api [-- --rounds 3]
 */
import type { Server } from 'node:http'
import { loadConfig } from '../../server/config'
import { databaseUrl, testCluster } from '../../server/db/cluster'
import { Membership, User, UserSession, Workspace } from '../../server/models'
import { createRuntime, listen } from '../../server/runtime'
import { signAccessToken } from '../../server/auth/tokens'
import { createScenario, saveScenario } from '../../server/services/scenarios'
import { defaultMachine } from '../../shared/schemas/machine'
import { SCENARIO_PROGRAM_MAX_LENGTH } from '../../shared/schemas/scenario'
import { prepareCluster } from '../db'
import { median } from './median'

const roundsArg = process.argv.indexOf('--rounds')
const rounds = roundsArg >= 0 ? Number(process.argv[roundsArg + 1]) : 3
if (!Number.isInteger(rounds) || rounds <= 0) {
  console.error('--rounds takes a positive integer')
  process.exit(2)
}

/** Our own filler: numbered addi lines, at most `lines` of them and `chars` characters. */
function program(register: string, lines: number, chars: number): string {
  let text = ''
  for (let i = 0; i < lines; i++) {
    const line = `  addi ${register}, ${register}, ${i % 2000}\n`
    if (text.length + line.length > chars) break
    text += line
  }
  return text
}

const round1 = (x: number) => Math.round(x * 10) / 10

await prepareCluster(testCluster)
const runtime = await createRuntime({
  ...loadConfig({ NODE_ENV: 'test', DATABASE_URL: databaseUrl(testCluster), JWT_SECRET: 'api-bench-only-secret-0123456789abcdef', SMTP_SINK_PORT: '0', CLIENT_DIR: '', PORT: '0' }),
})
let server: Server | null = null
const user = await User.create({ email: `api-bench-${Date.now()}@example.test`, name: 'Bench Reader', passwordHash: 'not-a-login' })
const workspace = await Workspace.create({ name: 'API bench' })
try {
  const listening = await listen(runtime)
  server = listening.server
  await Membership.create({ workspaceId: workspace.id, userId: user.id, role: 'owner' })
  const auth = { Authorization: `Bearer ${signAccessToken(user.id, (await UserSession.create({ userId: user.id })).id, runtime.ctx.config.jwtSecret)}` }
  const base = { title: 'Bench', description: '', tags: [], machine: defaultMachine, initialData: [], view: { cursor: null, window: null, selected: null }, expectations: [], walkthroughs: [] }

  async function pair(a: string, b: string): Promise<string> {
    const s = await createScenario(runtime.ctx, user, workspace.id, { content: { ...base, program: a }, message: '' })
    await saveScenario(runtime.ctx, user, workspace.id, s.id, { baseVersion: 1, content: { ...base, program: b }, message: '' })
    return `${listening.url}/api/workspaces/${workspace.id}/scenarios/${s.id}/versions/diff?from=1&to=2`
  }
  const cases = {
    lines6000: await pair(program('a0', 6000, Infinity), program('t1', 6000, Infinity)),
    chars200k: await pair(program('a0', Infinity, SCENARIO_PROGRAM_MAX_LENGTH), program('t1', Infinity, SCENARIO_PROGRAM_MAX_LENGTH)),
  }

  const health = async () => {
    const t = performance.now()
    const res = await fetch(`${listening.url}/api/health`)
    await res.arrayBuffer()
    return performance.now() - t
  }
  const idle: number[] = []
  for (let i = 0; i < 50; i++) idle.push(await health())
  const baseline = median(idle)

  let probing = true
  const during: number[] = []
  const prober = (async () => {
    while (probing) {
      during.push(await health())
      await new Promise((resolve) => setTimeout(resolve, 10))
    }
  })()
  const diffMs: Record<string, number> = {}
  for (const [name, url] of Object.entries(cases)) {
    const times: number[] = []
    for (let i = 0; i < rounds; i++) {
      const t = performance.now()
      const res = await fetch(url, { headers: auth })
      if (res.status !== 200) throw new Error(`${name}: ${res.status} ${await res.text()}`)
      await res.arrayBuffer()
      times.push(performance.now() - t)
    }
    diffMs[name] = median(times)
  }
  probing = false
  await prober
  const worst = Math.max(...during)
  console.log(
    JSON.stringify({
      rounds,
      idleHealthMs: round1(baseline),
      diffMs: Object.fromEntries(Object.entries(diffMs).map(([k, v]) => [k, round1(v)])),
      diffToIdleHealth: Object.fromEntries(Object.entries(diffMs).map(([k, v]) => [k, Math.round(v / baseline)])),
      healthDuringDiffs: { probes: during.length, worstMs: round1(worst), worstToIdle: round1(worst / baseline) },
    }),
  )
} finally {
  await Workspace.destroy({ where: { id: workspace.id }, force: true })
  await user.destroy()
  server?.close()
  server?.closeAllConnections()
  await runtime.close()
}
