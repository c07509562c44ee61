/**
 * `npm run bench:ui-run`: milliseconds from clicking Run on the Bench to the
 * Lane chart drawn, for a 100-instruction program at vl = 256 on 8 lanes
 * (issue 5, "Benchmark"). Not a timed test: it prints the figures.
 *
 * It builds the client (vite build), starts the test server
 * (scripts/serve-test.ts, the built app on its own port), signs in as the demo
 * editor in Debian's Chromium, puts the program into the editor with auto-run
 * off, and clicks Run several times. The page measures each run with the
 * Performance API: a mark when Run is asked for ('chimeline:run', set by the
 * bench store) and one in the first animation frame after the chart has the
 * new trace ('chimeline:chart-drawn', set by BenchView); the measure
 * 'chimeline:run-to-chart' between them is what this prints.
 *
 * Options: --runs N (default 7), --port N (default 3190).
 */
import { spawn } from 'node:child_process'
import { launchChromium } from './browser'
import { build } from 'vite'
import { DEMO, DEMO_PASSWORD } from '../../e2e/helpers/auth'
import { median } from './median'

const arg = (name: string, fallback: number) => {
  const i = process.argv.indexOf(`--${name}`)
  return i > 0 ? Number(process.argv[i + 1]) : fallback
}
const runs = arg('runs', 7)
const port = arg('port', 3190)
const base = `http://127.0.0.1:${port}`

/**
 * 100 dynamic vector instructions: one vsetvli (vl = 256 FP64 elements, which
 * VLEN 16384 holds in one register), two loads, then 97 FP adds and multiplies
 * in a dependent chain over a few registers, so lanes chain and stall.
 */
export function hundredInstructions(): string {
  const ops: string[] = []
  for (let i = 0; i < 97; i++) {
    const d = 3 + (i % 5)
    const a = i === 0 ? 1 : 3 + ((i - 1) % 5)
    ops.push(i % 2 === 0 ? `    vfadd.vv v${d}, v${a}, v2` : `    vfmul.vv v${d}, v${a}, v1`)
  }
  return [
    '# 100 vector instructions at vl = 256 (scripts/bench/ui-run.ts).',
    '    .data',
    '    .balign 8',
    'x:  .zero 2048',
    '    .text',
    '    li      a0, 256',
    '    vsetvli t0, a0, e64, m1, ta, ma',
    '    la      a1, x',
    '    vle64.v v1, (a1)',
    '    vle64.v v2, (a1)',
    ...ops,
    '',
  ].join('\n')
}

async function waitForHealth(ms: number) {
  const end = Date.now() + ms
  while (Date.now() < end) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 300))
  }
  throw new Error(`the test server did not answer on ${base} within ${ms} ms`)
}

await build({ logLevel: 'warn' })
// A process group of its own: tsx runs the server in a child process, and both must stop at the end.
const server = spawn('node_modules/.bin/tsx', ['scripts/serve-test.ts'], {
  env: { ...process.env, CHIMELINE_E2E_PORT: String(port) },
  stdio: ['ignore', 'ignore', 'inherit'],
  detached: true,
})
try {
  await waitForHealth(60_000)
  const browser = await launchChromium()
  const page = await browser.newPage({ viewport: { width: 1440, height: 1000 } })
  await page.goto(`${base}/signin`)
  await page.getByLabel('E-mail').fill(DEMO.editor)
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD)
  await page.getByRole('button', { name: 'Sign in' }).click()
  await page.getByTestId('lane-chart').waitFor({ timeout: 60_000 })
  await page.getByTestId('preset-select').click()
  await page.locator('.n-base-select-option', { hasText: 'Long-vector 8-lane' }).click()
  await page.getByTestId('auto-run').click()
  await page.locator('.cm-content').click()
  await page.keyboard.press('ControlOrMeta+a')
  await page.keyboard.insertText(hundredInstructions())
  const figures: number[] = []
  for (let i = 0; i < runs + 1; i++) {
    const before = await page.evaluate(() => performance.getEntriesByName('chimeline:run-to-chart').length)
    await page.getByTestId('run').click()
    await page.waitForFunction((n) => performance.getEntriesByName('chimeline:run-to-chart').length > n, before, { timeout: 60_000 })
    const d = await page.evaluate(() => performance.getEntriesByName('chimeline:run-to-chart').at(-1)?.duration ?? NaN)
    if (i > 0) figures.push(d) // the first run also starts the Worker and warms its code
  }
  const lanes = await page.getByTestId('lane-chart').getAttribute('data-lanes')
  const instructions = await page.getByTestId('lane-chart').getAttribute('data-instructions')
  const renderer = await page.getByTestId('lane-chart').getAttribute('data-renderer')
  const cycles = await page.getByTestId('metric-cycles').innerText()
  await browser.close()
  console.log(JSON.stringify({
    program: '100 vector instructions, vl 256, e64',
    lanes: Number(lanes), instructions: Number(instructions), cycles: Number(cycles), renderer,
    runs: figures.length,
    runToChartMs: { median: Math.round(median(figures)), min: Math.round(Math.min(...figures)), max: Math.round(Math.max(...figures)) },
  }, null, 2))
} finally {
  if (server.pid) process.kill(-server.pid, 'SIGTERM')
}
