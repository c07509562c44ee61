/**
 * Issue 16, done when: from a scenario on the Bench, a sweep is built and
 * plotted, two points are compared side by side (their cycles checked against
 * Node runs of the same points), the sweep is saved with the scenario's
 * version, listed in its history, and shared by a link whose page shows the
 * plot and table read-only to a reader who is not signed in. The Bench's
 * "Compare with" opens the program on another preset side by side.
 * Screenshots: .screenshots/sweeps-compare-*.png.
 */
import { expect, test, type Page } from '@playwright/test'
import { parseMachine } from '../shared/schemas/machine'
import { PRESETS } from '../shared/sim/presets'
import { runPipeline } from '../shared/sim/run'
import { withSymbols } from '../shared/sweep/symbols'
import { FMA_CURVE, REDUCTION_CURVE } from '../tests/sweep/programs'
import { accessToken, workspaceId } from './helpers/api'
import { DEMO, signIn, watchConsole } from './helpers/auth'
import { openScenarioOnBench } from './helpers/bench-page'
import { scenarioApi } from './helpers/scenario-api'
import { screenshot } from './helpers/screenshots'

const cycles = (program: string, machine: object) => {
  const r = runPipeline({ program, machine: parseMachine(machine) })
  if (!r.ok) throw new Error(r.error.message)
  return r.trace.cycles
}
const fmt = (n: number) => n.toLocaleString('en-US')

async function setParameters(page: Page, params: [string, string][]) {
  for (let k = 0; k < params.length; k++) {
    if ((await page.getByLabel(`Parameter ${k + 1}: machine field or symbol`).count()) === 0) await page.getByRole('button', { name: 'Add a parameter' }).click()
    await page.getByLabel(`Parameter ${k + 1}: machine field or symbol`).fill(params[k]![0])
    await page.getByLabel(`Values of parameter ${k + 1}`).fill(params[k]![1])
  }
}

/** The table row of the point with these cell texts. */
const rowOf = (page: Page, ...cells: string[]) =>
  cells.reduce((loc, text) => loc.filter({ has: page.locator('td', { hasText: new RegExp(`^${text}$`) }) }), page.locator('[data-testid="sweep-table"] tbody tr')).first()

test('sweep from a scenario, compare two points side by side, save with the version, share by link; Compare with on the Bench', async ({ page, browser, request }) => {
  test.setTimeout(240_000)
  const problems = watchConsole(page)
  const token = await accessToken(request, DEMO.editor)
  const ws = await workspaceId(request, token)
  const title = `FP64 FMA curve ${Date.now()}`
  const id = await scenarioApi(request, token, ws).create({ title, program: FMA_CURVE, tags: ['sweep'] })

  await signIn(page, DEMO.editor)
  await openScenarioOnBench(page, id, title)
  await expect(page).toHaveURL(/cycle=/, { timeout: 30_000 })
  await page.getByTestId('sweep-this').click()
  await expect(page).toHaveURL(/\/sweeps$/)
  // A short curve, so that every row is in the table's first screen (it scrolls virtually).
  await setParameters(page, [['issue', 'serial,staggered'], ['AVL', '14..18']])
  await page.getByTestId('sweep-run').click()
  // The plot is drawn while points arrive, then holds all 10.
  await expect(page.locator('[data-testid="sweep-plot"] svg').first()).toBeVisible({ timeout: 60_000 })
  await expect(page.getByTestId('sweep-progress-text')).toContainText('10 of 10 points', { timeout: 120_000 })

  // Saved with the scenario's version (listed in its history below); its points are then named by the sweep in links.
  await page.getByLabel('Title', { exact: true }).fill('FMA vl curve 14..18')
  await page.getByTestId('sweep-save').click()
  await expect(page).toHaveURL(/\/sweeps\/[0-9a-f-]{36}$/)
  await expect(page.getByTestId('sweep-progress-text')).toContainText('10 of 10 points', { timeout: 30_000 })

  // Two points side by side: staggered at AVL 16 (2 elements a lane) and AVL 17 (a ragged tail).
  await rowOf(page, 'staggered', '16').getByTestId('sweep-pick').click()
  await rowOf(page, 'staggered', '17').getByTestId('sweep-pick').click()
  await expect(page.getByTestId('sweep-compare-bar')).toContainText('A: issue=staggered, AVL=16 · B: issue=staggered, AVL=17')
  await page.getByTestId('sweep-side-by-side').click()
  await expect(page).toHaveURL(/\/compare\?a=/)
  const a16 = cycles(withSymbols(FMA_CURVE, new Map([['AVL', 16]])), { issue: 'staggered' })
  const b17 = cycles(withSymbols(FMA_CURVE, new Map([['AVL', 17]])), { issue: 'staggered' })
  await expect(page.getByTestId('compare-cycles-a')).toHaveText(fmt(a16), { timeout: 60_000 })
  await expect(page.getByTestId('compare-cycles-b')).toHaveText(fmt(b17), { timeout: 60_000 })
  await expect(page.getByTestId('compare-chart-a')).toBeVisible()
  await expect(page.getByTestId('compare-chart-b')).toBeVisible()
  // The ragged tail makes the lanes' phases differ; the first divergence moves the shared cursor, and the URL keeps it.
  await expect(page.getByTestId('difference-strip')).not.toHaveAttribute('data-first', '')
  const first = Number(await page.getByTestId('difference-strip').getAttribute('data-first'))
  await page.getByTestId('compare-first').click()
  await expect(page).toHaveURL(new RegExp(`[?&]c=${first}(&|$)`))
  await expect(page.getByTestId('compare-metrics')).toContainText('cycles')
  await screenshot(page, 'sweeps-compare-points')
  await page.reload()
  await expect(page.getByTestId('compare-cycles-b')).toHaveText(fmt(b17), { timeout: 60_000 })
  await expect(page.getByText(`cursor: cycle ${fmt(first)}`)).toBeVisible()
  await page.goBack()

  await expect(page.getByTestId('sweep-progress-text')).toContainText('10 of 10 points', { timeout: 30_000 })
  await page.getByRole('radio', { name: 'Anyone with the link' }).check()
  await page.getByTestId('sweep-share').click()
  const shareUrl = await page.getByTestId('sweep-share-url').locator('input').inputValue()
  expect(shareUrl).toMatch(/\/s\/[A-Za-z0-9_-]{43}$/)
  await screenshot(page, 'sweeps-compare-saved')

  // A reader who is not signed in sees the sweep's plot and table, read-only, beside the shared version.
  const reader = await browser.newContext()
  const readerPage = await reader.newPage()
  await readerPage.goto(new URL(shareUrl).pathname)
  await expect(readerPage.getByTestId('shared-sweep')).toContainText('FMA vl curve 14..18')
  await expect(readerPage.locator('[data-testid="shared-sweep"] [data-testid="sweep-plot"] svg').first()).toBeVisible({ timeout: 30_000 })
  await expect(readerPage.getByTestId('shared-sweep')).toContainText('10 of 10 points')
  await expect(readerPage.getByTestId('shared-sweep').getByTestId('sweep-pick')).toHaveCount(0)
  await expect(readerPage.getByTestId('share-title')).toHaveText(title)
  await screenshot(readerPage, 'sweeps-compare-share')
  await reader.close()

  await openScenarioOnBench(page, id, title)
  await page.getByRole('button', { name: 'History' }).click()
  await expect(page.getByTestId('version-sweeps')).toContainText('FMA vl curve 14..18 (10/10)')
  await page.keyboard.press('Escape')

  // Compare with another preset: the Bench's program on Starter 4-lane.
  await page.getByTestId('compare-with').click()
  // The first preset that is not the Bench's is offered first.
  await expect(page.getByTestId('compare-preset')).toContainText('Starter 4-lane')
  await page.getByTestId('compare-open').click()
  await expect(page).toHaveURL(/\/compare\?a=/)
  const starter = PRESETS.find((p) => p.id === 'starter-4')!.machine
  await expect(page.getByTestId('compare-run-b')).toContainText('Starter 4-lane')
  await expect(page.getByTestId('compare-cycles-a')).toHaveText(fmt(cycles(FMA_CURVE, {})), { timeout: 60_000 })
  await expect(page.getByTestId('compare-cycles-b')).toHaveText(fmt(cycles(FMA_CURVE, starter)), { timeout: 60_000 })
  await screenshot(page, 'sweeps-compare-presets')

  // The second curve of the issue: accumulators against the vector length.
  await page.goto('/sweeps')
  await page.getByTestId('sweep-program').locator('textarea').fill(REDUCTION_CURVE)
  await setParameters(page, [['reductionAccumulators', '1,2,4,8'], ['AVL', '8..256:8']])
  await page.getByTestId('sweep-run').click()
  await expect(page.getByTestId('sweep-progress-text')).toContainText('128 of 128 points', { timeout: 120_000 })
  await screenshot(page, 'sweeps-compare-accumulators')
  expect(problems).toEqual([])
})

test('brushing a range of the line chart runs it again finer; the plot exports as PNG and SVG with a legend and the machine summary', async ({ page }) => {
  test.setTimeout(120_000)
  const problems = watchConsole(page)
  await signIn(page, DEMO.editor)
  await page.goto('/sweeps')
  await page.getByTestId('sweep-program').locator('textarea').fill(FMA_CURVE)
  await setParameters(page, [['issue', 'serial,staggered'], ['AVL', '8..64:8']])
  await page.getByTestId('sweep-run').click()
  await expect(page.getByTestId('sweep-progress-text')).toContainText('16 of 16 points', { timeout: 60_000 })

  // Drag over the middle of the plot area: AVL 8..64 every 8 becomes every integer of the brushed range.
  await page.getByTestId('sweep-refine').click()
  const brush = page.locator('[data-testid="sweep-brush"] .overlay')
  const box = (await brush.boundingBox())!
  await page.mouse.move(box.x + box.width * 0.3, box.y + box.height / 2)
  await page.mouse.down()
  await page.mouse.move(box.x + box.width * 0.6, box.y + box.height / 2, { steps: 5 })
  await page.mouse.up()
  const spec = await page.getByLabel('Values of parameter 2').inputValue()
  const m = /^(\d+)\.\.(\d+)$/.exec(spec)
  expect(m, `refined spec ${spec}`).not.toBeNull()
  const n = Number(m![2]) - Number(m![1]) + 1
  // 30 % to 60 % of 8..64 is about 25..42: more values than the two or three multiples of 8 run there.
  expect(n).toBeGreaterThan(3)
  await expect(page.getByTestId('sweep-progress-text')).toContainText(`${2 * n} of ${2 * n} points`, { timeout: 60_000 })

  const [png] = await Promise.all([page.waitForEvent('download'), page.getByTestId('sweep-png').click()])
  const pngPath = 'sweeps-plot-export.png'
  await png.saveAs(`.screenshots/${pngPath}`)
  const { readFileSync } = await import('node:fs')
  // PNG signature (ISO/IEC 15948, section 5.2).
  expect(readFileSync(`.screenshots/${pngPath}`).subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))
  const [svg] = await Promise.all([page.waitForEvent('download'), page.getByTestId('sweep-svg').click()])
  await svg.saveAs('.screenshots/sweeps-plot-export.svg')
  const text = readFileSync('.screenshots/sweeps-plot-export.svg', 'utf8')
  expect(text).toContain('Base machine (swept fields vary): 8 lanes, VLEN 8192')
  expect(text).toContain('Model estimates, not sign-off for silicon.')
  expect(text).toContain('>serial</text>')
  expect(text).toContain('>staggered</text>')
  expect(problems).toEqual([])
})
