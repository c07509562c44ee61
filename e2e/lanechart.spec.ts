/**
 * The Lane chart in Chromium, fed real traces: the probe page runs a shipped
 * example in the simulator Worker and binds the chart's props as the Bench
 * does (issue 5, "The Lane chart"). The probe is e2e/fixtures/chart-probe.html
 * (mounting src/views/ChartProbeView.vue), served by a Vite dev server this
 * spec starts itself: no route in the app, nothing in the production build.
 */
import { expect, test, type Locator, type Page } from '@playwright/test'
import { createServer, type ViteDevServer } from 'vite'
import fs from 'node:fs'
import path from 'node:path'
import { screenshot, SCREENSHOT_DIR } from './helpers/screenshots'

let server: ViteDevServer
let base: string

test.beforeAll(async () => {
  server = await createServer({
    configFile: 'vite.config.ts',
    logLevel: 'error',
    cacheDir: 'node_modules/.vite-e2e-chart',
    server: { port: 0, strictPort: false, hmr: false },
    optimizeDeps: { entries: ['e2e/fixtures/chart-probe.html'], include: ['vue', 'comlink', 'naive-ui', 'd3', 'pinia'] },
  })
  await server.listen()
  const address = server.httpServer?.address()
  if (!address || typeof address === 'string') throw new Error('the probe server did not start')
  base = `http://127.0.0.1:${address.port}`
})

test.afterAll(async () => {
  await server?.close()
})

async function probe(page: Page, query: string): Promise<Locator> {
  await page.setViewportSize({ width: 1360, height: 900 })
  await page.goto(`${base}/e2e/fixtures/chart-probe.html?${query}`)
  await expect(page.locator('#status')).toHaveText('done', { timeout: 30_000 })
  const chart = page.getByTestId('lane-chart')
  await expect(chart).toBeVisible()
  return chart
}

/** Moves the mouse to the middle of an element: the chart hit-tests by position, whatever element lies on top. */
async function pointAt(page: Page, target: Locator) {
  const box = (await target.boundingBox())!
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2)
}

const num = async (l: Locator, attr: string) => Number(await l.getAttribute(attr))
const span = async (chart: Locator) => (await num(chart, 'data-window-end')) - (await num(chart, 'data-window-start'))

test('a saxpy run is drawn in SVG with one bar group per lane and instruction', async ({ page }) => {
  const chart = await probe(page, 'example=saxpy&lanes=8')
  const expected = Number(await page.locator('#expected-groups').textContent())
  // 8 lanes, 4 vector instructions with elements in every lane (19 elements: 3 or 2 a lane); the vsetvli draws nothing.
  expect(expected).toBeGreaterThanOrEqual(32)
  await expect(chart).toHaveAttribute('data-renderer', 'svg')
  await expect(chart).toHaveAttribute('data-lanes', '8')
  await expect(chart).toHaveAttribute('data-instructions', '5')
  await expect(chart).toHaveAttribute('data-bar-groups', String(expected))
  await expect(chart.locator('g[data-lane][data-instruction]')).toHaveCount(expected)
  for (let lane = 0; lane < 8; lane++) await expect(chart.locator(`g[data-lane="${lane}"]`)).toHaveCount(expected / 8)
  await expect(chart).toHaveAttribute('aria-label', /^Lane chart: 8 lanes, \d+ cycles, 5 instructions$/)
  await expect(chart.getByText('Model estimates')).toBeVisible()
})

test('a 1,000-instruction run on 8 lanes is drawn on canvas with the counts on the root', async ({ page }) => {
  const chart = await probe(page, 'example=long-stream&lanes=8')
  const expected = Number(await page.locator('#expected-groups').textContent())
  await expect(chart).toHaveAttribute('data-renderer', 'canvas')
  await expect(chart).toHaveAttribute('data-instructions', '1000')
  await expect(chart).toHaveAttribute('data-bar-groups', String(expected))
  // 996 instructions with elements in all 8 lanes at vl = 256 (the header of examples/long-stream.s); 4 more draw at most 8 each.
  expect(expected).toBeGreaterThanOrEqual(996 * 8)
  // The canvas is painted: some pixels are not the background.
  const painted = await chart.locator('canvas').first().evaluate((c: HTMLCanvasElement) => {
    const d = c.getContext('2d')!.getImageData(0, 0, c.width, c.height).data
    let n = 0
    for (let i = 3; i < d.length; i += 4) if (d[i]! > 0) n++
    return n
  })
  expect(painted).toBeGreaterThan(10_000)
  await screenshot(page, 'lanechart-canvas-light')
})

test('hovering a bar shows its instruction, lane, elements, beats and phases', async ({ page }) => {
  const chart = await probe(page, 'example=saxpy&lanes=8')
  await pointAt(page, chart.locator('g[data-lane="2"][data-instruction="3"] rect').first())
  const tip = page.getByTestId('lane-chart-tooltip')
  await expect(tip).toBeVisible()
  await expect(tip).toContainText('#3 vfmacc.vf v16,fa0,v8')
  await expect(tip).toContainText('lane2')
  await expect(tip).toContainText('elements3')
  await expect(tip).toContainText('read')
  await expect(page.locator('#hover')).toHaveText(/^3@2 /)
  await screenshot(page, 'lanechart-hover-light')
  await page.mouse.move(5, 5)
  await expect(tip).toBeHidden()
})

test('hovering a stall names its reason', async ({ page }) => {
  // The 3-point stencil waits on its slides and loads: it has stalls in every lane.
  const chart = await probe(page, 'example=stencil&lanes=8&renderer=svg')
  const stall = chart.locator('rect[fill^="url(#lc-hatch"]').first()
  await expect(stall).toBeAttached()
  await pointAt(page, stall)
  await expect(page.getByTestId('lane-chart-tooltip')).toContainText(/stalled: (raw|bank|queue|slot|barrier|rename|memory|ring|frontend)/)
})

test('clicking a bar selects its instruction in every lane and dims the others; Escape clears it', async ({ page }) => {
  const chart = await probe(page, 'example=saxpy&lanes=8')
  await chart.locator('g[data-lane="0"][data-instruction="3"] rect').first().click()
  await expect(page.locator('#selected')).toHaveText('3')
  await expect(chart).toHaveAttribute('data-selected', '3')
  await expect(chart.locator('g.lc-selected')).toHaveCount(8)
  await expect(chart.locator('g[data-instruction="1"]').first()).toHaveAttribute('opacity', '0.25')
  await expect(chart.locator('g[data-instruction="3"]').first()).toHaveAttribute('opacity', '1')
  await page.keyboard.press('Escape')
  await expect(page.locator('#selected')).toHaveText('')
})

test('the dependency overlay draws arrows from producers to consumers of the selected instruction', async ({ page }) => {
  const chart = await probe(page, 'example=saxpy&lanes=8&deps=1')
  await chart.locator('g[data-lane="0"][data-instruction="3"] rect').first().click()
  // vfmacc.vf v16, fa0, v8 reads v8 (load 1) and v16 (load 2); the store (4) reads its v16: 3 pairs, in each of 8 lanes.
  await expect(chart.getByTestId('lane-chart-arrow')).toHaveCount(24)
  await screenshot(page, 'lanechart-dependencies-light')
  await page.locator('#deps').uncheck()
  await expect(chart.getByTestId('lane-chart-arrow')).toHaveCount(0)
})

test('Ctrl + wheel zooms (a plain wheel scrolls the page), a drag pans and the keys zoom, pan and fit', async ({ page }) => {
  const chart = await probe(page, 'example=long-stream&lanes=8')
  const full = await span(chart)
  const bars = chart.locator('.lc-bars')
  const box = (await bars.boundingBox())!
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2)
  await page.keyboard.down('Control')
  await page.mouse.wheel(0, -300)
  await page.mouse.wheel(0, -300)
  await page.keyboard.up('Control')
  await expect.poll(() => span(chart)).toBeLessThan(full / 2)
  await expect(page.locator('#window')).not.toHaveText('')
  const start = await num(chart, 'data-window-start')
  await page.mouse.down()
  await page.mouse.move(box.x + box.width / 2 - 200, box.y + box.height / 2, { steps: 5 })
  await page.mouse.up()
  await expect.poll(() => num(chart, 'data-window-start')).toBeGreaterThan(start)

  await chart.focus()
  const before = await span(chart)
  await page.keyboard.press('+')
  await expect.poll(() => span(chart)).toBeLessThan(before)
  const s0 = await num(chart, 'data-window-start')
  await page.keyboard.press('ArrowRight')
  await expect.poll(() => num(chart, 'data-window-start')).toBeGreaterThan(s0)
  await page.keyboard.press('-')
  await page.keyboard.press('0')
  await expect.poll(() => span(chart)).toBeCloseTo(full, 1)
})

test('clicking the ruler moves the cursor and draws the cursor line', async ({ page }) => {
  const chart = await probe(page, 'example=saxpy&lanes=8')
  const ruler = chart.getByTestId('lane-chart-ruler')
  const box = (await ruler.boundingBox())!
  const cycles = Number((await chart.getAttribute('aria-label'))!.match(/(\d+) cycles/)![1])
  await ruler.click({ position: { x: box.width / 2, y: 10 } })
  const cursor = Number(await page.locator('#cursor').textContent())
  // The middle of the ruler is the middle of the run (the window is the whole run).
  expect(Math.abs(cursor - cycles / 2)).toBeLessThanOrEqual(1)
  const line = chart.getByTestId('lane-chart-cursor')
  await expect(line).toBeAttached()
  expect(Math.abs(Number(await line.getAttribute('x1')) - box.width / 2)).toBeLessThan(box.width / cycles + 1)
})

test('brushing the overview strip sets the window', async ({ page }) => {
  const chart = await probe(page, 'example=long-stream&lanes=8')
  const strip = chart.getByTestId('lane-chart-overview')
  const box = (await strip.boundingBox())!
  // Start a new brush over the left quarter of the strip.
  await page.mouse.move(box.x + 10, box.y + box.height / 2)
  await page.mouse.down()
  await page.mouse.move(box.x + box.width / 4, box.y + box.height / 2, { steps: 4 })
  await page.mouse.up()
  const cycles = Number((await chart.getAttribute('aria-label'))!.match(/([\d,]+) cycles/)![1]!.replace(/,/g, ''))
  await expect.poll(() => span(chart)).toBeLessThan(cycles / 3)
  expect(await num(chart, 'data-window-end')).toBeLessThan(cycles / 2)
  // Dragging the brush itself pans the window.
  const startBefore = await num(chart, 'data-window-start')
  const brushBox = (await strip.locator('.selection').boundingBox())!
  await page.mouse.move(brushBox.x + brushBox.width / 2, brushBox.y + brushBox.height / 2)
  await page.mouse.down()
  await page.mouse.move(brushBox.x + brushBox.width / 2 + 300, brushBox.y + brushBox.height / 2, { steps: 4 })
  await page.mouse.up()
  await expect.poll(() => num(chart, 'data-window-start')).toBeGreaterThan(startBefore + cycles / 10)
  await screenshot(page, 'lanechart-brushed-light')
})

test('sub-rows give every lane a read, an execute and a write row', async ({ page }) => {
  const chart = await probe(page, 'example=saxpy&lanes=4&subrows=1')
  await expect(chart.locator('.lc-sub-label')).toHaveCount(8)
  await expect(chart.locator('.lc-lane-label')).toHaveCount(4)
  await screenshot(page, 'lanechart-subrows-light')
})

test('the chart exports a standalone SVG with a legend and the machine summary, and a PNG', async ({ page }) => {
  await probe(page, 'example=saxpy&lanes=8')
  await page.locator('#export-svg').click()
  const svg = await page.locator('#exported').inputValue()
  expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true)
  expect(svg).toContain('8 lanes, VLEN 8192, staggered')
  expect(svg).toContain('Model estimates, not sign-off for silicon')
  expect(svg).toContain('vfmacc.vf v16,fa0,v8')
  expect(svg).toContain('IBM Plex Mono')
  const parsed = await page.evaluate((text) => new DOMParser().parseFromString(text, 'image/svg+xml').querySelector('parsererror') === null, svg)
  expect(parsed).toBe(true)
  await page.locator('#export-png').click()
  // A PNG starts with the 8-byte signature 137 80 78 71 13 10 26 10 (ISO/IEC 15948, section 5.2).
  // Encoding a 2x picture takes a moment on a busy machine.
  await expect(page.locator('#exported')).toHaveValue(/^image\/png \d+ 137,80,78,71,13,10,26,10$/, { timeout: 20_000 })
  // Saved with the screenshots, to be looked at.
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true })
  fs.writeFileSync(path.join(SCREENSHOT_DIR, 'lanechart-export.png'), Buffer.from(await page.locator('#png-base64').inputValue(), 'base64'))
  fs.writeFileSync(path.join(SCREENSHOT_DIR, 'lanechart-export.svg'), svg)
})

test('the chart takes focus with a visible ring and says what it shows', async ({ page }) => {
  const chart = await probe(page, 'example=saxpy&lanes=8')
  await page.locator('#export-png').focus()
  await page.keyboard.press('Tab')
  await expect(chart).toBeFocused()
  const outline = await chart.evaluate((el) => getComputedStyle(el).outlineStyle)
  expect(outline).toBe('solid')
  await screenshot(page, 'lanechart-focus-light')
})

test('light and dark themes (screenshots to look at)', async ({ page }) => {
  for (const theme of ['light', 'dark']) {
    const chart = await probe(page, `example=stencil&lanes=8&theme=${theme}`)
    await pointAt(page, chart.locator('g[data-lane="1"][data-instruction="3"] rect').first())
    await screenshot(page, `lanechart-stencil-${theme}`)
    const long = await probe(page, `example=long-stream&lanes=8&theme=${theme}`)
    // Zoomed in, with an instruction selected on the canvas.
    await long.focus()
    for (let i = 0; i < 8; i++) await page.keyboard.press('+')
    const box = (await long.locator('.lc-bars').boundingBox())!
    // Try a few places on lane 0's first track until one lands on a bar.
    for (let k = 0; k < 10 && !(await page.locator('#selected').textContent()); k++) await page.mouse.click(box.x + box.width * (0.4 + k * 0.02), box.y + 4)
    await expect(page.locator('#selected')).not.toHaveText('')
    await screenshot(page, `lanechart-long-${theme}`)
  }
})
