/**
 * The Bench end to end (issue 5): examples run and draw, the scrubber moves the
 * inspector, a machine change re-runs, parser errors show inline, every export
 * downloads a well-formed file, the URL restores the view, and both themes are
 * captured in .screenshots/ to be looked at.
 *
 * Expected counts come from running the same program and machine through the
 * simulator pipeline in Node (shared/sim/run.ts): the page must draw what the
 * model computed, one bar group per (instruction, lane) with any activity.
 */
import { readFileSync, readdirSync } from 'node:fs'
import { expect, test, type Download, type Page } from '@playwright/test'
import { parseMachine } from '../shared/schemas/machine'
import { DEFAULT_PRESET_ID, PRESETS } from '../shared/sim/presets'
import { runPipeline } from '../shared/sim/run'
import { LANE_FIELD_COUNT, NO_CYCLE, type TimingTrace } from '../shared/sim/trace/types'
import { percent, utilizationScale } from '../src/lib/bench/utilization'
import { DEMO, signIn, userMenu, watchConsole } from './helpers/auth'
import { screenshot } from './helpers/screenshots'

// The Bench starts on the one default machine (issue 9): the preset equal to the schema's defaults.
const PRESET = PRESETS.find((p) => p.id === DEFAULT_PRESET_ID)!
const examples = readdirSync('examples').filter((f) => f.endsWith('.s')).map((f) => f.replace(/\.s$/, '')).sort()

/** Bar groups the chart must draw: every (instruction, lane) with a phase or a stall. */
function expectedGroups(trace: TimingTrace): number {
  const stalled = new Set<number>()
  for (let i = 0; i < trace.stalls.count; i++) {
    const pos = trace.instructions.findIndex((x) => x.index === trace.stalls.instruction[i])
    stalled.add(pos * trace.laneCount + (trace.stalls.lane[i] ?? 0))
  }
  let n = 0
  for (let pos = 0; pos < trace.instructions.length; pos++) {
    for (let lane = 0; lane < trace.laneCount; lane++) {
      const base = (pos * trace.laneCount + lane) * LANE_FIELD_COUNT
      const active = [2, 4, 6].some((k) => (trace.laneTimes[base + k] ?? NO_CYCLE) !== NO_CYCLE)
      if (active || stalled.has(pos * trace.laneCount + lane)) n++
    }
  }
  return n
}

function modelRun(example: string, machine = PRESET.machine) {
  const r = runPipeline({ program: readFileSync(`examples/${example}.s`, 'utf8'), machine: parseMachine(machine) })
  if (!r.ok) throw new Error(`${example} does not run in Node: ${r.error.message}`)
  return r.trace
}

const chart = (page: Page) => page.getByTestId('lane-chart')
const runs = async (page: Page) => Number(await page.getByTestId('chart-box').getAttribute('data-runs'))

async function waitForRunAfter(page: Page, before: number) {
  await expect.poll(() => runs(page), { timeout: 60_000 }).toBeGreaterThan(before)
}

async function pickExample(page: Page, id: string) {
  const title = (readFileSync(`examples/${id}.s`, 'utf8').match(/^#\s*(.+)$/m)?.[1] ?? id).split(/[:.](\s|$)/)[0]!.trim()
  await page.getByTestId('example-select').click()
  await page.locator('.n-base-select-option', { hasText: title }).first().click()
}

async function openBench(page: Page) {
  await signIn(page, DEMO.editor)
  await expect(page).toHaveURL(/\/bench/)
  await expect(chart(page)).toBeVisible({ timeout: 60_000 })
}

test.describe('the Bench', () => {
  test('runs each example and draws one bar group per lane and instruction', async ({ page }) => {
    test.setTimeout(240_000)
    const problems = watchConsole(page)
    await openBench(page)
    for (const id of examples) {
      const trace = modelRun(id)
      const before = await runs(page)
      await pickExample(page, id)
      await waitForRunAfter(page, before)
      const c = chart(page)
      await expect(c).toHaveAttribute('data-lanes', String(trace.laneCount))
      await expect(c).toHaveAttribute('data-instructions', String(trace.instructions.length))
      await expect(c).toHaveAttribute('data-bar-groups', String(expectedGroups(trace)))
      if ((await c.getAttribute('data-renderer')) === 'svg') {
        await expect(c.locator('g[data-lane][data-instruction]')).toHaveCount(expectedGroups(trace))
      }
      await expect(page.getByTestId('metric-cycles')).toHaveText(trace.cycles.toLocaleString('en-US'))
      await expect(page.getByTestId('estimate-note')).toContainText('not sign-off for silicon')
    }
    expect(problems).toEqual([])
  })

  test('the scrubber moves the cursor and the inspector follows it', async ({ page }) => {
    await openBench(page)
    await pickExample(page, 'saxpy')
    const inspector = page.getByTestId('inspector')
    await page.getByTestId('cursor-cycle').click() // focus away from the editor so keys reach the Bench
    await page.keyboard.press('Home')
    await expect(page.getByTestId('cursor-cycle')).toContainText('cycle 0 /')
    const atStart = await inspector.locator('tbody').innerText()
    // Step through events until a lane is reading (saxpy's loads and FMA keep lanes busy).
    for (let i = 0; i < 12; i++) await page.getByTestId('next-event').click()
    const later = await inspector.locator('tbody').innerText()
    expect(later).not.toBe(atStart)
    const shown = Number((await page.getByTestId('cursor-cycle').innerText()).match(/cycle (\d+)/)?.[1])
    expect(shown).toBeGreaterThan(0)
    await page.getByTestId('step-forward').click()
    await expect(page.getByTestId('cursor-cycle')).toContainText(`cycle ${shown + 1} /`)
    await page.keyboard.press('ArrowLeft')
    await expect(page.getByTestId('cursor-cycle')).toContainText(`cycle ${shown} /`)
    // The URL holds the view: a reload comes back to the same cycle.
    await expect(page).toHaveURL(new RegExp(`cycle=${shown}`))
    await page.reload()
    await expect(page.getByTestId('cursor-cycle')).toContainText(`cycle ${shown} /`, { timeout: 60_000 })
  })

  test('changing lanes re-runs the model and redraws the chart', async ({ page }) => {
    await openBench(page)
    await pickExample(page, 'saxpy')
    await expect(chart(page)).toHaveAttribute('data-lanes', '8')
    await expect(page.getByTestId('preset-select')).toContainText(PRESET.name)
    const before = await runs(page)
    const lanes = page.locator('#machine-lanes')
    await lanes.fill('4')
    await lanes.press('Enter') // Enter applies the value, as leaving the field does
    await waitForRunAfter(page, before)
    await expect(chart(page)).toHaveAttribute('data-lanes', '4')
    await expect(page.getByTestId('machine-summary')).toContainText('4 lanes')
    // No preset has this machine any more: the preset box says so instead of showing a stale name.
    await expect(page.getByTestId('preset-select')).toContainText('Custom machine')
    await screenshot(page, 'bench-custom-machine')
    const trace = modelRun('saxpy', { ...PRESET.machine, lanes: 4 })
    await expect(page.getByTestId('metric-cycles')).toHaveText(trace.cycles.toLocaleString('en-US'))
    // Out of range: the schema's message under the field, and no run.
    await lanes.fill('99')
    await lanes.press('Enter')
    await expect(page.getByText('99 is outside the range 1..64')).toBeVisible()
    await expect(page.getByTestId('run')).toBeDisabled()
  })

  test("the vfredusum order switch gives the machine's rounding of the unordered sum, the same cycles", async ({ page }) => {
    // Expected bits from the same pipeline in Node, in each order (IEEE 754 binary32 results of examples/reduction.s).
    const sumBits = (order: 'element' | 'machine') => {
      const r = runPipeline({ program: readFileSync('examples/reduction.s', 'utf8'), machine: parseMachine(PRESET.machine) }, { fpReductionOrder: order })
      if (!r.ok) throw new Error(r.error.message)
      const pos = r.trace.instructions.findIndex((i) => i.op === 'vfredusum.vs')
      const bits = new DataView(r.functional.v[16]!.buffer, r.functional.v[16]!.byteOffset).getUint32(0, true)
      return { pos, hex: `0x${bits.toString(16).padStart(8, '0')}`, cycles: r.trace.cycles }
    }
    const element = sumBits('element')
    const machine = sumBits('machine')
    expect(machine.hex).not.toBe(element.hex)
    await openBench(page)
    await pickExample(page, 'reduction')
    await expect(page.getByTestId('metric-cycles')).toHaveText(element.cycles.toLocaleString('en-US'))
    await page.locator(`tr[data-index="${element.pos}"]`).first().click() // selects v16, the vfredusum destination
    const first = page.getByTestId('inspector').locator('ol.elements li').first()
    await expect(first).toHaveAttribute('title', new RegExp(`^element 0: ${element.hex}`))
    const before = await runs(page)
    await page.getByTestId('fp-order').getByText("this machine's order").click()
    await waitForRunAfter(page, before)
    await expect(first).toHaveAttribute('title', new RegExp(`^element 0: ${machine.hex}`))
    await expect(page.getByTestId('metric-cycles')).toHaveText(machine.cycles.toLocaleString('en-US'))
    // The dependency overlay of the selected vfredusum, from the run's register use: its loads' and v0's producers, its store.
    await page.getByLabel('Dependency arrows for the selected instruction').click()
    await expect.poll(() => chart(page).getByTestId('lane-chart-arrow').count()).toBeGreaterThan(0)
    await screenshot(page, 'bench-fp-order')
  })

  test('a parser error shows inline at its line and column while typing', async ({ page }) => {
    await openBench(page)
    await pickExample(page, 'saxpy')
    const editor = page.locator('.cm-content')
    await editor.click()
    await page.keyboard.press('ControlOrMeta+End')
    await page.keyboard.type('\n    vfadd.vv v1, v2, q3')
    await expect(page.locator('.cm-lintRange-error')).toHaveText('q3', { timeout: 5000 })
    const lines = (await page.locator('.cm-line').count())
    await expect(page.getByTestId('program-problems')).toContainText(`line ${lines}, column 22`)
    await page.keyboard.press('ControlOrMeta+z')
    await expect(page.locator('.cm-lintRange-error')).toHaveCount(0, { timeout: 5000 })
  })

  test('exports the chart, the trace and the program as well-formed files', async ({ page }) => {
    await openBench(page)
    await pickExample(page, 'dot')
    await expect(page.getByTestId('metric-cycles')).toHaveText(modelRun('dot').cycles.toLocaleString('en-US'))
    const grab = async (label: string): Promise<{ name: string; bytes: Buffer }> => {
      await page.getByTestId('export').click()
      const wait = page.waitForEvent('download')
      await page.locator('.n-dropdown-option', { hasText: label }).click()
      const d: Download = await wait
      const path = await d.path()
      return { name: d.suggestedFilename(), bytes: readFileSync(path) }
    }
    const png = await grab('Chart as PNG')
    expect(png.name).toBe('dot.png')
    // PNG signature (ISO/IEC 15948, 5.2): 89 50 4E 47 0D 0A 1A 0A.
    expect([...png.bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])
    const svg = await grab('Chart as SVG')
    expect(svg.bytes.toString('utf8')).toMatch(/<svg[^>]*xmlns="http:\/\/www\.w3\.org\/2000\/svg"/)
    const csv = await grab('Trace as CSV')
    const trace = modelRun('dot')
    const rows = csv.bytes.toString('utf8').trimEnd().split('\r\n')
    expect(rows[0]).toBe('index,text,vl,sew,lmul,lane,elements,beats,readStart,readEnd,execStart,execEnd,writeStart,writeEnd')
    expect(rows.length).toBe(1 + trace.instructions.length * trace.laneCount)
    const json = JSON.parse((await grab('Trace as JSON')).bytes.toString('utf8'))
    expect(json.cycles).toBe(trace.cycles)
    expect(json.machine.lanes).toBe(8)
    const vcd = (await grab('Trace as VCD')).bytes.toString('utf8')
    expect(vcd).toMatch(/^\$date/)
    expect(vcd).toContain('$enddefinitions $end')
    const s = await grab('Program as .s')
    expect(s.name).toBe('dot.s')
    expect(s.bytes.toString('utf8')).toBe(readFileSync('examples/dot.s', 'utf8'))
  })

  test('the instruction table fits a 1280 px laptop: titles clear of their sort icons, long text cut with its whole text on hover', async ({ page }) => {
    await page.setViewportSize({ width: 1280, height: 800 })
    await openBench(page)
    const table = page.getByTestId('instruction-table')
    /** Header titles whose text runs into their sort icon or out of their cell (common practice: a header is read whole). */
    const clashes = () =>
      table.evaluate((t) =>
        [...t.querySelectorAll('thead th')].flatMap((th) => {
          const title = th.querySelector('.n-data-table-th__title')
          if (!title) return []
          const range = document.createRange()
          range.selectNodeContents(title)
          const text = range.getBoundingClientRect()
          const cell = th.getBoundingClientRect()
          const sorter = th.querySelector('.n-data-table-sorter')?.getBoundingClientRect()
          const limit = sorter ? sorter.left : cell.right
          return text.right > limit + 0.5 || text.left < cell.left ? [`${th.textContent}: text to ${Math.round(text.right)}, room to ${Math.round(limit)}`] : []
        }),
      )
    const scrolls = () => table.evaluate((t) => [...t.querySelectorAll('.n-scrollbar-container')].some((c) => c.scrollWidth > c.clientWidth + 1))

    await pickExample(page, 'saxpy')
    await expect(table.locator('thead th', { hasText: 'frontend' })).toBeVisible()
    expect(await clashes()).toEqual([])
    // saxpy stalls on raw and frontend only: every column fits in the card without scrolling.
    expect(await scrolls()).toBe(false)
    const card = (await table.boundingBox())!
    const last = (await table.locator('thead th').last().boundingBox())!
    expect(last.x + last.width).toBeLessThanOrEqual(card.x + card.width + 1)
    const vset = table.locator('code.instruction-text').first()
    await expect(vset).toHaveAttribute('title', 'vsetvli t0,a0,e32,m1,ta,ma')
    expect(await vset.evaluate((el) => getComputedStyle(el).textOverflow)).toBe('ellipsis')
    await screenshot(page, 'bench-table-1280')

    // The stencil stalls for six reasons: the extra columns scroll inside the table, not the page.
    const before = await runs(page)
    await pickExample(page, 'stencil')
    await waitForRunAfter(page, before)
    await expect(table.locator('thead th')).toHaveCount(8 + 6) // 8 fixed columns (Ideal beside Latency, issue 10) and 6 stall reasons
    expect(await clashes()).toEqual([])
    expect(await scrolls()).toBe(true)
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(1280)
  })

  test('the units and banks card shows one labelled bar per register-file bank with the run\'s figure', async ({ page }) => {
    await openBench(page)
    await pickExample(page, 'saxpy')
    const { metrics } = modelRun('saxpy')
    await expect(page.getByTestId('metric-cycles')).toHaveText(metrics.cycles.toLocaleString('en-US'))
    const banks = page.getByTestId('bank-utilization').getByRole('listitem')
    await expect(banks).toHaveCount(metrics.bankUtilization.length)
    for (const [b, v] of metrics.bankUtilization.entries()) {
      await expect(banks.nth(b)).toHaveAttribute('aria-label', `bank ${b}: ${percent(v)}`)
      await expect(banks.nth(b).locator('.tick')).toHaveText(String(b))
    }
    // The bars are drawn against a round top at or above the busiest bank, printed beside them.
    await expect(page.getByTestId('bank-utilization').locator('.axis')).toContainText(percent(utilizationScale(metrics.bankUtilization)))
    await expect(page.getByTestId('lane-utilization').getByRole('listitem')).toHaveCount(metrics.laneBusy.length)
    await page.getByTestId('metrics').screenshot({ path: '.screenshots/bench-metrics.png' })
  })

  test('shows the shortcut help and takes screenshots of both themes', async ({ page }) => {
    await page.setViewportSize({ width: 1440, height: 1000 })
    await openBench(page)
    await pickExample(page, 'reduction')
    await expect(page.getByTestId('metric-cycles')).toHaveText(modelRun('reduction').cycles.toLocaleString('en-US'))
    await page.getByTestId('cursor-cycle').click()
    for (let i = 0; i < 20; i++) await page.keyboard.press('Shift+ArrowRight')
    await page.keyboard.press('?')
    await expect(page.getByTestId('shortcut-help')).toBeVisible()
    await screenshot(page, 'bench-help')
    await page.keyboard.press('Escape')
    await expect(page.getByTestId('shortcut-help')).toHaveCount(0)
    const dark = await page.evaluate(() => document.documentElement.dataset.theme === 'dark')
    await screenshot(page, dark ? 'bench-dark' : 'bench-light')
    await userMenu(page, dark ? 'Switch to light theme' : 'Switch to dark theme')
    await expect.poll(() => page.evaluate(() => document.documentElement.dataset.theme)).toBe(dark ? 'light' : 'dark')
    await page.waitForTimeout(300)
    await screenshot(page, dark ? 'bench-light' : 'bench-dark')
    await page.setViewportSize({ width: 1280, height: 900 })
    await screenshot(page, 'bench-1280')
  })
})
