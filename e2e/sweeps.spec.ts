/**
 * Sweeps in the browser: "Sweep this" on the Bench opens the form, a sweep
 * runs on the Worker pool with progress, the plot and the table fill in, and
 * a point opens on the Bench. Figures are checked against the same point run
 * through the simulator pipeline in Node (the same point gives the same
 * figures in the browser pool and in a single run).
 */
import { expect, test } from '@playwright/test'
import { runPipeline } from '../shared/sim/run'
import { inlineSymbols } from '../shared/sweep/inlineSymbols'
import { withSymbols } from '../shared/sweep/symbols'
import { FMA_CURVE } from '../tests/sweep/programs'
import { DEMO, signIn, watchConsole } from './helpers/auth'
import { screenshot } from './helpers/screenshots'

test('a vl curve from the Bench: Sweep this, run on the Worker pool, plot, table, open a point', async ({ page }) => {
  const problems = watchConsole(page)
  await signIn(page, DEMO.editor)
  await page.goto('/bench')
  // The Bench writes its view to the URL 250 ms after a run; a navigation started before that is cancelled by it.
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
  const issueHeader = page.locator('[data-testid="sweep-table"] th', { hasText: /^issue$/ })
  await expect(async () => {
    await issueHeader.click()
    await expect(page.locator('[data-testid="sweep-table"] tbody tr').first()).toContainText('staggered', { timeout: 1000 })
  }).toPass({ timeout: 10_000 })
  await screenshot(page, 'sweeps-vl-curve')

  // The Bench's machine was its first preset (Long-vector 8-lane): one point against a Node run of it.
  const single = runPipeline({ program: inlineSymbols(withSymbols(FMA_CURVE, new Map([['AVL', 8]]))), machine: { lanes: 8, vlen: 16384, rfBanks: 8, issue: 'staggered' } })
  if (!single.ok) throw new Error(single.error.message)
  const row = page.locator('[data-testid="sweep-table"] tr', { has: page.locator('td', { hasText: /^staggered$/ }) }).filter({ has: page.locator('td', { hasText: /^8$/ }) })
  await expect(row.first()).toContainText(String(single.trace.cycles))

  // Bad values are named with the field, the value and the range.
  await page.getByLabel('Values of parameter 1').fill('serial,eager')
  await page.getByTestId('sweep-run').click()
  await expect(page.getByRole('alert').filter({ hasText: 'issue=eager' })).toBeVisible()
  await page.getByLabel('Values of parameter 1').fill('serial,staggered')

  await row.first().getByRole('button', { name: 'Open' }).click()
  await expect(page).toHaveURL(/\/bench/)
  await expect(page.getByTestId('run-status')).toContainText(`${single.trace.cycles} cycles`, { timeout: 30_000 })
  expect(problems).toEqual([])
})
