/**
 * The simulator Worker never blocks the page: while the Worker runs the
 * 1,000-instruction example, the test keeps typing and clicking, and every
 * interaction is answered while the run is still going, with the run's
 * progress moving on between them. No wall-clock bound: the page's own input
 * delay and timer lateness are measured by `npm run bench:ui` instead.
 *
 * The probe page is e2e/fixtures/worker-probe.html (mounting
 * src/views/WorkerProbeView.vue), served by a Vite dev server this spec starts
 * itself: no route in the app, nothing in the production build.
 */
import { expect, test, type Page } from '@playwright/test'
import { createServer, type ViteDevServer } from 'vite'

let server: ViteDevServer
let base: string

test.beforeAll(async () => {
  server = await createServer({
    configFile: 'vite.config.ts',
    logLevel: 'error',
    // A cache of its own, so that a developer's `npm run dev` is not disturbed.
    cacheDir: 'node_modules/.vite-e2e-worker',
    server: { port: 0, strictPort: false, hmr: false },
    optimizeDeps: { entries: ['e2e/fixtures/worker-probe.html'], include: ['vue', 'comlink'] },
  })
  await server.listen()
  const address = server.httpServer?.address()
  if (!address || typeof address === 'string') throw new Error('the probe server did not start')
  base = `http://127.0.0.1:${address.port}`
})

test.afterAll(async () => {
  await server?.close()
})

const probe = (page: Page, query: string) => page.goto(`${base}/e2e/fixtures/worker-probe.html?${query}`)

test('the page keeps answering while the Worker runs a 1,000-instruction program', async ({ page }) => {
  // One lane makes each instruction 256 beats long, so the runs take a while.
  await probe(page, 'lanes=1&repeat=3')
  await expect(page.locator('#status')).toHaveText('idle')
  await page.click('#run')
  await expect(page.locator('#status')).toHaveText('running')

  // Order and progress, not milliseconds (a loaded machine stretches every time):
  // each click and key press is handled while the run is still going, and the
  // Worker's progress moves on between them, so neither side waited for the other.
  const progressSeen: number[] = []
  let typed = ''
  for (let i = 0; (await page.locator('#status').textContent()) === 'running' && i < 200; i++) {
    await page.click('#count')
    await expect(page.locator('#count-out')).toHaveText(String(i + 1))
    typed += String.fromCharCode(97 + (i % 26))
    // Focusing the field again puts the caret first: go to the end before typing.
    await page.locator('#echo').press('End')
    await page.keyboard.press(typed[typed.length - 1]!)
    await expect(page.locator('#echo-out')).toHaveText(typed)
    if ((await page.locator('#status').textContent()) === 'running') progressSeen.push(Number(await page.locator('#progress').textContent()))
  }
  await expect(page.locator('#status')).toHaveText('done', { timeout: 120_000 })

  expect(progressSeen.length, 'interactions answered while the Worker was running').toBeGreaterThanOrEqual(5)
  expect(new Set(progressSeen).size, 'the Worker progressed between interactions').toBeGreaterThan(1)
  await expect(page.locator('#runs')).toHaveText('3')
  await expect(page.locator('#instructions')).toHaveText('1000')
  expect(Number(await page.locator('#cycles').textContent())).toBeGreaterThan(1000 * 256)
})

test('a run in the Worker can be cancelled', async ({ page }) => {
  await probe(page, 'lanes=1&repeat=50')
  await page.click('#run')
  await expect(page.locator('#status')).toHaveText('running')
  await page.waitForTimeout(300)
  await page.click('#cancel')
  await expect(page.locator('#status')).toHaveText('cancelled', { timeout: 2000 })
  await expect(page.locator('#message')).toContainText('cancelled')
})
