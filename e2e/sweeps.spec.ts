/**
 * Sweeps in the browser: "Sweep this" on the Bench opens the form, a sweep
 * runs on the Worker pool with progress, the plot and the table fill in, and
 * a point opens on the Bench. Figures are checked against the same point run
 * through the simulator pipeline in Node (the same point gives the same
 * figures in the browser pool and in a single run).
 */
import { expect, test } from '@playwright/test'
import { runPipeline } from '../shared/sim/run'
import { withSymbols } from '../shared/sweep/symbols'
import { FMA_CURVE } from '../tests/sweep/programs'
import { DEMO, signIn, watchConsole } from './helpers/auth'
import { screenshot } from './helpers/screenshots'

test('a vl curve from the Bench: Sweep this, run on the Worker pool, plot, table, open a point', async ({ page }) => {
  const problems = watchConsole(page)
  await signIn(page, DEMO.editor)
  await page.goto('/bench')
  // Wait for the Bench's first run (it writes cycle=0 into the URL once settled), so Sweep this carries a finished scenario.
  await expect(page).toHaveURL(/cycle=0/, { timeout: 30_000 })
  await page.getByTestId('sweep-this').click()
  await expect(page).toHaveURL(/\/sweeps$/)
  await expect(page.getByTestId('sweep-program')).toBeVisible()

  await page.getByTestId('sweep-program').locator('textarea').fill(FMA_CURVE)
  await page.getByLabel('Parameter 1: machine field or symbol').fill('issue')
  await page.getByLabel('Values of parameter 1').fill('serial,staggered')
  if ((await page.getByLabel('Parameter 2: machine field or symbol').count()) === 0) await page.getByRole('button', { name: 'Add a parameter' }).click()
  await page.getByLabel('Parameter 2: machine field or symbol').fill('AVL')
  await page.getByLabel('Values of parameter 2').fill('1..64')
  await page.getByTestId('sweep-run').click()

  await expect(page.getByTestId('sweep-progress-text')).toContainText('128 of 128 points', { timeout: 60_000 })
  await expect(page.locator('[data-testid="sweep-plot"] svg').first()).toBeVisible()
  // The table sorts: issue descending puts the staggered rows first.
  const staggeredFirst = () =>
    expect(async () => {
      await page.locator('[data-testid="sweep-table"] th', { hasText: /^issue$/ }).click()
      await expect(page.locator('[data-testid="sweep-table"] tbody tr').first()).toContainText('staggered', { timeout: 1000 })
    }).toPass({ timeout: 10_000 })
  await staggeredFirst()
  await screenshot(page, 'sweeps-vl-curve')

  // The Bench's machine is the default one (preset Default 8-lane): one point against a Node run of it.
  const single = runPipeline({ program: withSymbols(FMA_CURVE, new Map([['AVL', 8]])), machine: { issue: 'staggered' } })
  if (!single.ok) throw new Error(single.error.message)
  const row = page.locator('[data-testid="sweep-table"] tr', { has: page.locator('td', { hasText: /^staggered$/ }) }).filter({ has: page.locator('td', { hasText: /^8$/ }) })
  await expect(row.first()).toContainText(String(single.trace.cycles))

  // Saved with its points in the workspace: listed, and the same points come back from the server.
  await page.getByLabel('Title', { exact: true }).fill('FP64 vl curve, serial vs staggered')
  await page.getByTestId('sweep-save').click()
  await expect(page).toHaveURL(/\/sweeps\/[0-9a-f-]{36}$/)
  await expect(page.getByTestId('sweep-list')).toContainText('FP64 vl curve, serial vs staggered')
  await page.reload()
  await expect(page.getByTestId('sweep-progress-text')).toContainText('128 of 128 points', { timeout: 30_000 })
  await expect(page.getByTestId('sweep-list')).toContainText('browser · done · 128/128 points')
  await screenshot(page, 'sweeps-saved')

  // Bad values are named with the field, the value and the range.
  await page.getByLabel('Values of parameter 1').fill('serial,eager')
  await page.getByTestId('sweep-run').click()
  await expect(page.getByRole('alert').filter({ hasText: 'issue=eager' })).toBeVisible()
  await page.getByLabel('Values of parameter 1').fill('serial,staggered')

  await staggeredFirst()
  await row.first().getByRole('button', { name: 'Open' }).click()
  await expect(page).toHaveURL(/\/bench/)
  await expect(page.getByTestId('run-status')).toContainText(`${single.trace.cycles} cycles`, { timeout: 30_000 })
  expect(problems).toEqual([])
})
