/**
 * Expectations on the Bench (issue 13): a verification engineer adds three
 * claims to saxpy, sees them pass, changes the machine and sees the cycles
 * claim fail with the cycle that decides it; the button moves the cursor
 * there. Saved, the scenario comes back with its claims, and its export
 * checked by `chimeline check` in a shell gives the same verdicts; put in a
 * suite and run on the server's worker, the suite shows them again, its
 * failing claim opens the Bench at the deciding cycle, and the suite's own
 * export gives the same lines in a shell. Expected values: cycles from the same pipeline in Node
 * (shared/sim/run.ts), flops and the memory values by hand from the example
 * (y = 2.5 x + y on 19 floats: one vfmacc strip, 2 x 19 = 38 flops;
 * y[0..2] = 2.5 + 0.5, 5 + 0.5, 7.5 + 0.5 = 3, 5.5, 8, exact in binary32).
 */
import { spawnSync } from 'node:child_process'
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { expect, test, type Page } from '@playwright/test'
import { evaluateExpectations } from '../shared/expectations/evaluate'
import { parseMachine } from '../shared/schemas/machine'
import { DEFAULT_PRESET_ID, PRESETS } from '../shared/sim/presets'
import { runPipeline } from '../shared/sim/run'
import { accessToken, workspaceId } from './helpers/api'
import { DEMO, signIn, watchConsole } from './helpers/auth'
import { scenarioApi } from './helpers/scenario-api'
import { screenshot } from './helpers/screenshots'

// The Bench starts on the default preset (the handbook defaults).
const PRESET = PRESETS.find((p) => p.id === DEFAULT_PRESET_ID)!
const SAXPY = readFileSync('examples/saxpy.s', 'utf8')

function model(machine: Record<string, unknown>) {
  const r = runPipeline({ program: SAXPY, machine: parseMachine({ ...PRESET.machine, ...machine }) })
  if (!r.ok) throw new Error(r.error.message)
  return r
}

const runs = async (page: Page) => Number(await page.getByTestId('chart-box').getAttribute('data-runs'))

async function choose(page: Page, testId: string, option: string) {
  await page.getByTestId(testId).click()
  await page.locator('.n-base-select-option', { hasText: new RegExp(`^${option.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}$`) }).first().click()
}

test('add three expectations, see them pass, change the machine, follow the failing one to its cycle, and get the same verdicts from chimeline check on the export', async ({ page, request }) => {
  test.setTimeout(240_000)
  const problems = watchConsole(page)
  await signIn(page, DEMO.editor)
  await expect(page.getByTestId('lane-chart')).toBeVisible({ timeout: 60_000 })
  let before = await runs(page)
  // saxpy is the Bench's first example; pick it only when another one is on.
  if (!(await page.getByTestId('example-select').innerText()).includes('saxpy')) {
    await page.getByTestId('example-select').click()
    await page.locator('.n-base-select-option', { hasText: 'saxpy' }).first().click()
    await expect.poll(() => runs(page), { timeout: 60_000 }).toBeGreaterThan(before)
  }
  await expect(page.getByTestId('metric-cycles')).toHaveText(String(model({}).trace.cycles))

  const eight = model({})
  const panel = page.getByTestId('expectations')
  // 1. cycles <= the model's cycles on 8 lanes.
  await choose(page, 'expectation-op', '<=')
  await page.getByTestId('expectation-value').locator('input').fill(String(eight.trace.cycles))
  await page.getByTestId('add-expectation').click()
  // 2. flops == 38.
  await choose(page, 'expectation-metric', 'flops')
  await choose(page, 'expectation-op', '==')
  await page.getByTestId('expectation-value').locator('input').fill('38')
  await page.getByTestId('add-expectation').click()
  // 3. memory at label y (f32 x 3) equals [3, 5.5, 8].
  await choose(page, 'expectation-kind', 'Memory values at a label')
  await panel.getByPlaceholder('label').fill('y')
  await choose(page, 'expectation-type', 'f32')
  await panel.getByPlaceholder('1.5, 2, -0, NaN').fill('3, 5.5, 8')
  await page.getByTestId('add-expectation').click()

  const rows = panel.getByTestId('expectation')
  await expect(rows).toHaveCount(3)
  await expect(rows.nth(0)).toContainText(`cycles <= ${eight.trace.cycles}`)
  await expect(rows.nth(2)).toContainText('memory at label y (f32 x 3) equals [3, 5.5, 8]')
  for (let i = 0; i < 3; i++) await expect(rows.nth(i)).toHaveAttribute('data-status', 'pass')
  await expect(page.getByTestId('expectations-tally')).toHaveText('3 of 3 pass')
  await screenshot(page, 'expectations-pass')

  // Four lanes: more beats a lane, more cycles; flops and values do not change.
  const four = model({ lanes: 4 })
  expect(four.trace.cycles).toBeGreaterThan(eight.trace.cycles)
  const [cyclesVerdict] = evaluateExpectations([{ kind: 'metric', metric: 'cycles', op: '<=', value: eight.trace.cycles }], four)
  const at = cyclesVerdict!.at!
  before = await runs(page)
  await page.locator('#machine-lanes').fill('4')
  await page.locator('#machine-lanes').press('Enter')
  await expect.poll(() => runs(page), { timeout: 60_000 }).toBeGreaterThan(before)

  await expect(rows.nth(0)).toHaveAttribute('data-status', 'fail')
  await expect(rows.nth(0).getByTestId('measured')).toHaveText(String(four.trace.cycles))
  await expect(rows.nth(1)).toHaveAttribute('data-status', 'pass')
  await expect(rows.nth(2)).toHaveAttribute('data-status', 'pass')
  await expect(page.getByTestId('expectations-tally')).toHaveText('2 of 3 pass')
  const go = rows.nth(0).getByTestId('go-to-deciding')
  await expect(go).toHaveText(`Cycle ${at.cycle}, lane ${at.lane}`)
  await go.click()
  await expect(page.getByTestId('cursor-cycle')).toContainText(`cycle ${at.cycle} /`)
  await screenshot(page, 'expectations-fail')

  // Saved as a scenario, the claims come back with it.
  const title = `Saxpy expectations ${Date.now()}`
  await page.getByTestId('scenario-toolbar').getByRole('button', { name: 'Save as…' }).click()
  await page.getByLabel('Title').fill(title)
  await page.getByRole('button', { name: 'Save', exact: true }).last().click()
  await expect(page.getByTestId('scenario-title')).toHaveText(title)
  const id = new URL(page.url()).searchParams.get('scenario')!
  await page.goto(`/bench?scenario=${id}`)
  await expect(rows).toHaveCount(3)
  await expect(rows.nth(0)).toHaveAttribute('data-status', 'fail', { timeout: 60_000 })
  await expect(rows.nth(0).getByTestId('measured')).toHaveText(String(four.trace.cycles))

  // Exported, the command line a team's CI runs gives the same verdicts.
  const token = await accessToken(request, DEMO.editor)
  const bundle = await scenarioApi(request, token, await workspaceId(request, token)).exportBundle([id])
  const file = join(mkdtempSync(join(tmpdir(), 'chimeline-e2e-')), 'saxpy.chimeline.json')
  writeFileSync(file, JSON.stringify(bundle, null, 2))
  const cli = spawnSync(process.execPath, ['bin/chimeline.js', 'check', file], { encoding: 'utf8', timeout: 120_000 })
  expect(cli.stderr).toBe('')
  expect(cli.status).toBe(1)
  expect(cli.stdout.trimEnd().split('\n').slice(0, 3)).toEqual([
    `FAIL  ${title} › cycles <= ${eight.trace.cycles} (measured ${four.trace.cycles}; cycle ${at.cycle}, lane ${at.lane}, instruction ${at.instruction})`,
    `PASS  ${title} › flops == 38 (measured 38)`,
    `PASS  ${title} › memory at label y (f32 x 3) equals [3, 5.5, 8] (measured [3, 5.5, 8])`,
  ])

  // The scenario in a suite: Run suite on the server's worker shows the same verdicts, the failing
  // one linked to its cycle on the Bench; the suite's export gives them again in a shell.
  await page.getByRole('link', { name: 'Suites' }).first().click()
  await page.getByTestId('suite-new').click()
  const suiteTitle = `Saxpy suite ${Date.now()}`
  await page.getByTestId('suite-title').locator('input').fill(suiteTitle)
  await page.getByTestId('suite-scenarios').click()
  await page.keyboard.type(title.slice(0, 20))
  await page.locator('.n-base-select-option', { hasText: title }).first().click()
  await page.keyboard.press('Escape')
  await page.getByTestId('suite-submit').click()
  await expect(page.getByTestId('suite-heading')).toHaveText(suiteTitle)
  await page.getByTestId('suite-run-button').click()
  const suiteRun = page.getByTestId('suite-run')
  await expect(suiteRun).toHaveAttribute('data-status', 'failed', { timeout: 120_000 })
  const claims = suiteRun.getByTestId('suite-claim')
  await expect(claims).toHaveCount(3)
  await expect(claims.nth(0)).toContainText(new RegExp(`^FAIL\\s*cycles <= ${eight.trace.cycles}\\s*measured ${four.trace.cycles}`))
  await expect(claims.nth(1)).toContainText(/^PASS\s*flops == 38/)
  await expect(claims.nth(2)).toContainText(/^PASS\s*memory at label y/)
  await expect(claims.nth(0).getByTestId('suite-claim-at')).toHaveText(`cycle ${at.cycle}, lane ${at.lane}, instruction ${at.instruction}`)
  await expect(page.getByTestId('suite-run-model')).toHaveText(/^\d+$/)
  await screenshot(page, 'suite-run')

  const download = page.waitForEvent('download')
  await page.getByTestId('suite-export').click()
  const exported = join(mkdtempSync(join(tmpdir(), 'chimeline-e2e-')), (await download).suggestedFilename())
  await (await download).saveAs(exported)
  const fromSuite = spawnSync(process.execPath, ['bin/chimeline.js', 'check', exported], { encoding: 'utf8', timeout: 120_000 })
  expect(fromSuite.status).toBe(1)
  expect(fromSuite.stdout.split('\n').filter((l) => /^(PASS|FAIL) /.test(l))).toEqual(cli.stdout.split('\n').filter((l) => /^(PASS|FAIL) /.test(l)))

  // The deciding point opens the version that ran on the Bench, at that cycle.
  await claims.nth(0).getByTestId('suite-claim-at').click()
  await expect(page.getByTestId('cursor-cycle')).toContainText(`cycle ${at.cycle} /`, { timeout: 60_000 })
  await expect(page.getByTestId('scenario-title')).toHaveText(title)
  expect(problems).toEqual([])
})
