/**
 * Issue 16: the same point gives the same figures in the browser's Worker
 * pool, on the server's sweep workers, from the CLI and in a single Bench
 * run. One grid (AVL 1..40 x issue serial, staggered: 80 points, chunks of
 * three programs) runs in all four: the pool in Chromium (saved, so its points are
 * read back as the page computed them), two `npm run worker` processes on the
 * test database (each must take chunks: a large grid on two worker
 * processes), the `sweep` command line, and points opened on the Bench.
 */
import { spawnSync, type ChildProcess } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { expect, test, type APIRequestContext } from '@playwright/test'
import { databaseUrl, testCluster } from '../server/db/cluster'
import { startWorkerProcess } from '../scripts/worker-process'
import type { SweepPointResult } from '../shared/schemas/sweep'
import { FMA_CURVE } from '../tests/sweep/programs'
import { accessToken, workspaceId } from './helpers/api'
import { DEMO, signIn, watchConsole } from './helpers/auth'

const definition = { program: FMA_CURVE, machine: {}, parameters: [{ path: 'AVL', spec: '1..40' }, { path: 'issue', spec: 'serial,staggered' }] }
const PLANNED = 80

async function api<T>(request: APIRequestContext, token: string, method: 'get' | 'post', path: string, data?: object): Promise<T> {
  const res = await request[method](path, { headers: { Authorization: `Bearer ${token}` }, data })
  if (!res.ok()) throw new Error(`${method} ${path}: ${res.status()} ${await res.text()}`)
  return (await res.json()) as T
}

const workers: ChildProcess[] = []
test.afterAll(() => {
  for (const w of workers) w.kill('SIGTERM')
})

test('one grid, four runners, the same figures: Worker pool, two server worker processes, CLI, Bench', async ({ page, request }) => {
  test.setTimeout(300_000)
  const problems = watchConsole(page)
  const token = await accessToken(request, DEMO.editor)
  const ws = await workspaceId(request, token)
  const base = `/api/workspaces/${ws}/sweeps`
  // Server sweeps of earlier runs on this database (no workers then) would hold the workspace's two slots.
  const { sweeps } = await api<{ sweeps: { id: string; status: string; runner: string }[] }>(request, token, 'get', base)
  for (const s of sweeps.filter((x) => x.runner === 'server' && (x.status === 'queued' || x.status === 'running'))) await api(request, token, 'post', `${base}/${s.id}/cancel`, {})

  // 1. The browser's Worker pool, from the Sweeps page; saved, then read back.
  await signIn(page, DEMO.editor)
  await page.goto('/sweeps')
  await page.getByTestId('sweep-program').locator('textarea').fill(FMA_CURVE)
  await page.getByLabel('Parameter 1: machine field or symbol').fill('AVL')
  await page.getByLabel('Values of parameter 1').fill('1..40')
  if ((await page.getByLabel('Parameter 2: machine field or symbol').count()) === 0) await page.getByRole('button', { name: 'Add a parameter' }).click()
  await page.getByLabel('Parameter 2: machine field or symbol').fill('issue')
  await page.getByLabel('Values of parameter 2').fill('serial,staggered')
  await page.getByTestId('sweep-run').click()
  await expect(page.getByTestId('sweep-progress-text')).toContainText(`${PLANNED} of ${PLANNED} points`, { timeout: 120_000 })
  await page.getByLabel('Title', { exact: true }).fill('four runners')
  await page.getByTestId('sweep-save').click()
  await expect(page).toHaveURL(/\/sweeps\/[0-9a-f-]{36}$/)
  const browserId = page.url().split('/').pop()!
  const browser = (await api<{ sweep: { points: SweepPointResult[] } }>(request, token, 'get', `${base}/${browserId}`)).sweep.points
  expect(browser).toHaveLength(PLANNED)

  // 2. Two sweep worker processes on the same database take the chunks of a server sweep.
  const lines: string[] = []
  workers.push(...(await Promise.all([startWorkerProcess(databaseUrl(testCluster), lines), startWorkerProcess(databaseUrl(testCluster), lines)])))
  const queued = await api<{ sweep: { id: string } }>(request, token, 'post', base, { title: 'four runners (server)', runner: 'server', definition })
  let server: { status: string; points: SweepPointResult[] } = { status: 'queued', points: [] }
  for (let i = 0; i < 240 && server.status !== 'done'; i++) {
    await new Promise((resolve) => setTimeout(resolve, 500))
    server = (await api<{ sweep: typeof server }>(request, token, 'get', `${base}/${queued.sweep.id}`)).sweep
  }
  expect(server.status).toBe('done')
  const pids = new Set(lines.filter((l) => l.includes('chunk done') && l.includes(queued.sweep.id)).map((l) => (JSON.parse(l) as { pid: number }).pid))
  expect(pids.size, 'both worker processes ran chunks').toBe(2)

  // 3. The command line.
  const dir = mkdtempSync(join(tmpdir(), 'chimeline-four-'))
  writeFileSync(join(dir, 'fma.s'), FMA_CURVE)
  const cli = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/sweep.ts', join(dir, 'fma.s'), '--vary', 'AVL=1..40', '--vary', 'issue=serial,staggered', '--format', 'json', '--workers', '2'], { encoding: 'utf8', timeout: 120_000 })
  expect(cli.status, cli.stderr).toBe(0)
  const fromCli = (JSON.parse(cli.stdout) as { points: SweepPointResult[] }).points

  expect(server.points).toEqual(browser)
  expect(fromCli).toEqual(browser)

  // 4. Single Bench runs of points opened from the table (AVL 1 serial, 2 staggered, 4 staggered: first rows).
  for (const [avl, issue] of [[1, 'serial'], [2, 'staggered'], [4, 'staggered']] as const) {
    const p = browser.find((q) => q.values[0] === avl && q.values[1] === issue)!
    const row = page.locator('[data-testid="sweep-table"] tbody tr').filter({ has: page.locator('td', { hasText: new RegExp(`^${avl}$`) }) }).filter({ has: page.locator('td', { hasText: new RegExp(`^${issue}$`) }) })
    await row.first().getByRole('button', { name: 'Open' }).click()
    await expect(page).toHaveURL(/\/bench/)
    await expect(page.getByTestId('metric-cycles')).toHaveText(p.figures!.cycles.toLocaleString('en-US'), { timeout: 60_000 })
    await expect(page.getByTestId('metrics')).toContainText(`${p.figures!.flopsPerCycle.toFixed(2)}`)
    await page.goBack()
    await expect(page.getByTestId('sweep-progress-text')).toContainText(`${PLANNED} of ${PLANNED} points`, { timeout: 30_000 })
  }
  expect(problems).toEqual([])
})
