/**
 * `npm run bench:sweep:browser`: the sweeps of `npm run bench:sweep` on the
 * browser's Worker pool, in Debian's Chromium (headless): wall time from Run
 * sweep to the last point, time to the first point, points a second, and the
 * Workers the pool started (one per core the browser reports). It builds the
 * client, starts the test server (scripts/serve-test.ts) on CHIMELINE_E2E_PORT
 * (default 3190), signs in as the demo editor and runs each sweep from the
 * Sweeps page, 1.5 s after filling its form (the Workers the page starts
 * when it opens are then warm, as when a user fills the form by hand). Each
 * sweep also runs, just after, on a page whose navigator reports one core
 * (one Worker): the single-thread rate of the same run in the same browser,
 * for the pool's parallel efficiency. Each sweep runs ROUNDS times on each
 * page, in alternation; the medians close the output. Not a timed test: it
 * prints the figures.
 */
import { spawn } from 'node:child_process'
import { loadavg } from 'node:os'
import type { Page } from '@playwright/test'
import { launchChromium } from './browser'
import { build } from 'vite'
import { DEMO, DEMO_PASSWORD } from '../../e2e/helpers/auth'
import { FMA_CURVE, REDUCTION_CURVE } from '../../tests/sweep/programs'
import { longStream } from './programs'
import { median } from './median'

const port = Number(process.env.CHIMELINE_E2E_PORT ?? 3190)
/** Runs of each sweep on each page: the machine's load moves within seconds, so one run says little. */
const ROUNDS = 3
const base = `http://127.0.0.1:${port}`
/** The long stream; its vector length is the symbol AVL (`.equ AVL, 256` in examples/long-stream.s). */
const LONG_STREAM_AVL = longStream()
const SWEEPS = [
  { name: 'vl curve (512 points)', program: FMA_CURVE, params: [['AVL', '1..256'], ['issue', 'serial,staggered']], points: 512 },
  { name: 'accumulator curve (128 points)', program: REDUCTION_CURVE, params: [['AVL', '8..256:8'], ['reductionAccumulators', '1,2,4,8']], points: 128 },
  { name: 'heavy grid (96 points)', program: LONG_STREAM_AVL, params: [['AVL', '8..256:8'], ['issue', 'serial,lockstep,staggered']], points: 96 },
]

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
const server = spawn('node_modules/.bin/tsx', ['scripts/serve-test.ts'], { env: { ...process.env, CHIMELINE_E2E_PORT: String(port) }, stdio: ['ignore', 'ignore', 'inherit'], detached: true })
try {
  await waitForHealth(60_000)
  const browser = await launchChromium()
  /** A signed-in page; `cores` set: the page's navigator reports that many cores, so the pool starts that many Workers. */
  async function signedInPage(cores?: number): Promise<Page> {
    const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } })
    const page = await context.newPage()
    // An init script redefining navigator.hardwareConcurrency did not take in the app's pages; the DevTools protocol's override does.
    if (cores !== undefined) await (await context.newCDPSession(page)).send('Emulation.setHardwareConcurrencyOverride', { hardwareConcurrency: cores })
    await page.goto(`${base}/signin`)
    await page.getByLabel('E-mail').fill(DEMO.editor)
    await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD)
    await page.getByRole('button', { name: 'Sign in' }).click()
    await page.getByTestId('user-menu').waitFor({ timeout: 60_000 })
    return page
  }
  /** Runs one sweep from the Sweeps page; its wall and first-point milliseconds as the page measured them. */
  async function runSweep(page: Page, s: (typeof SWEEPS)[number]): Promise<{ total: number; first: number }> {
    await page.goto(`${base}/sweeps`)
    await page.getByTestId('sweep-program').locator('textarea').fill(s.program)
    for (const [k, [path, spec]] of s.params.entries()) {
      if ((await page.getByLabel(`Parameter ${k + 1}: machine field or symbol`).count()) === 0) await page.getByRole('button', { name: 'Add a parameter' }).click()
      await page.getByLabel(`Parameter ${k + 1}: machine field or symbol`).fill(path as string)
      await page.getByLabel(`Values of parameter ${k + 1}`).fill(spec as string)
    }
    // A user takes a few seconds over the form: by then the page's Workers have started and run their warm-up.
    await page.waitForTimeout(1500)
    await page.getByTestId('sweep-run').click()
    const results = page.getByTestId('sweep-results')
    // Polled every 250 ms, not every animation frame (Playwright's default): a frame a poll made the page paint ~45 times a second
    // during the sweep, on the cores the Workers need. The figures are the page's own timings, not this wait's.
    await page.waitForFunction(() => document.querySelector('[data-testid="sweep-results"]')?.getAttribute('data-total-ms'), null, { timeout: 600_000, polling: 250 })
    return { total: Number(await results.getAttribute('data-total-ms')), first: Number(await results.getAttribute('data-first-ms')) }
  }
  const pool = await signedInPage()
  const single = await signedInPage(1)
  const cores = await pool.evaluate(() => navigator.hardwareConcurrency)
  if ((await single.evaluate(() => navigator.hardwareConcurrency)) !== 1) throw new Error('the one-Worker page reports more than one core')
  const loadBefore = loadavg()[0] ?? 0
  console.log(`| sweep | round | Workers | wall s | first point ms | points/s | wall s on 1 Worker | efficiency |`)
  console.log(`| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: |`)
  const summary: string[] = []
  for (const s of SWEEPS) {
    const workers = Math.min(cores, s.points)
    const walls: number[] = []
    const firsts: number[] = []
    const efficiencies: number[] = []
    for (let round = 1; round <= ROUNDS; round++) {
      const all = await runSweep(pool, s)
      const one = await runSweep(single, s)
      // The same grid, the same lane-cycles: per-Worker rate over the one Worker's rate is its wall time over theirs, per Worker.
      const efficiency = one.total / (workers * all.total)
      walls.push(all.total)
      firsts.push(all.first)
      efficiencies.push(efficiency)
      console.log(`| ${s.name} | ${round} | ${workers} | ${(all.total / 1000).toFixed(2)} | ${all.first.toFixed(0)} | ${((s.points * 1000) / all.total).toFixed(1)} | ${(one.total / 1000).toFixed(2)} | ${efficiency.toFixed(2)} |`)
    }
    summary.push(`| ${s.name} | ${(median(walls) / 1000).toFixed(2)} | ${median(firsts).toFixed(0)} | ${median(efficiencies).toFixed(2)} (${Math.min(...efficiencies).toFixed(2)} to ${Math.max(...efficiencies).toFixed(2)}) |`)
  }
  console.log(`\nMedians of the ${ROUNDS} rounds:\n\n| sweep | wall s | first point ms | efficiency (range) |\n| --- | ---: | ---: | --- |\n${summary.join('\n')}`)
  console.log(`\nload average (1 min): ${loadBefore.toFixed(2)} before, ${(loadavg()[0] ?? 0).toFixed(2)} after`)
  await browser.close()
} finally {
  if (server.pid) process.kill(-server.pid, 'SIGTERM')
}
