/**
 * The characterisation report in Chromium: the demo workspace's kernel suite
 * run on two presets by the server's suite worker, the table with a row per
 * kernel, the ratio and the geometric means, its CSV read back by an RFC 4180
 * reader, and the printable page. The figures must equal the same check run
 * in Node (server/services/suite-runner.ts on the kernels' own files), so
 * the page shows what the workers computed, not a copy of its own.
 */
import { readFileSync } from 'node:fs'
import { parse } from 'csv-parse/sync'
import { expect, test } from '@playwright/test'
import { KERNEL_SUITE_TITLE, KERNELS, kernelContent } from '../server/services/demo-kernels'
import { changedVerdicts, runSuiteScenarios } from '../server/services/suite-runner'
import { DEMO, signIn, watchConsole } from './helpers/auth'
import { screenshot } from './helpers/screenshots'

const inNode = (preset: string) => runSuiteScenarios(KERNELS.map((k) => ({ id: k.title, found: { title: k.title, version: 1, content: kernelContent(k) } })), preset).entries

test('characterise the kernel suite on two presets: table, ratio, CSV and the printable page', async ({ page }) => {
  test.setTimeout(300_000)
  const problems = watchConsole(page)
  await signIn(page, DEMO.editor)
  await page.getByRole('link', { name: 'Suites' }).first().click()
  await page.getByTestId('suite-link').filter({ hasText: new RegExp(`^${KERNEL_SUITE_TITLE}$`) }).click()
  await expect(page.getByTestId('suite-heading')).toHaveText(KERNEL_SUITE_TITLE)
  await page.getByTestId('suite-characterise').click()
  // The presets offered first are the two of the README's figure: Default 8-lane and Wide 16-lane.
  await page.getByTestId('report-run').click()
  const rows = page.getByTestId('report-row')
  await expect(rows).toHaveCount(KERNELS.length, { timeout: 240_000 })

  const a = inNode('default-8')
  const b = inNode('wide-16')
  for (let i = 0; i < KERNELS.length; i++) {
    const cells = rows.nth(i).locator('td')
    await expect(rows.nth(i).locator('th')).toHaveText(KERNELS[i]!.title)
    await expect(cells.nth(0)).toHaveText(String(a[i]!.figures!.cycles))
    await expect(cells.nth(8)).toHaveText(String(b[i]!.figures!.cycles))
    await expect(cells.nth(16)).toHaveText((a[i]!.figures!.cycles / b[i]!.figures!.cycles).toFixed(2))
  }
  await expect(page.getByTestId('report-geomean')).toHaveCount(2)
  await expect(page.getByText('Results are model estimates, not sign-off for silicon.').first()).toBeVisible()
  await screenshot(page, 'report')

  const download = page.waitForEvent('download')
  await page.getByTestId('report-csv').click()
  const csv = parse(readFileSync(await (await download).path(), 'utf8'), { record_delimiter: '\r\n' }) as string[][]
  expect(csv[0]?.[0]).toBe('kernel')
  expect(csv.slice(1, -1).map((r) => r[0])).toEqual(KERNELS.map((k) => k.title))
  expect(csv[1]?.[1]).toBe(String(a[0]!.figures!.cycles))

  // The printed page: navigation and controls hidden, the table and the estimate note kept.
  await page.emulateMedia({ media: 'print' })
  await expect(page.getByTestId('report-run')).toBeHidden()
  await expect(page.getByTestId('report-table')).toBeVisible()
  await screenshot(page, 'report-print')
  await page.emulateMedia({ media: 'screen' })

  // The Wide 16-lane run on the suite's page: what changed since the Default 8-lane run before it,
  // the same list as comparing the two runs of the same check in Node.
  const [, wideRun] = (new URL(page.url()).searchParams.get('runs') ?? '').split(',')
  await page.goto(`${new URL(page.url()).pathname.replace(/\/report$/, '')}?run=${wideRun}`)
  const since = page.getByTestId('suite-run-since')
  await expect(since).toBeVisible({ timeout: 60_000 })
  const changed = changedVerdicts(a, b)
  await expect(since.locator('li')).toHaveText(changed)
  await screenshot(page, 'suite-kernels-wide')
  expect(problems).toEqual([])
})
