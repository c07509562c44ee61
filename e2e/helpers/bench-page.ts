import { readFileSync } from 'node:fs'
import { expect, type Page } from '@playwright/test'

/**
 * The program editor's rendered lines as the user sees them. CodeMirror draws
 * only the lines near its viewport: use this for short programs, and
 * programText for a whole long one.
 */
export async function programLines(page: Page): Promise<string[]> {
  return (await page.getByTestId('program-editor').locator('.cm-line').allInnerTexts()).map((l) => l.replace(/\n$/, ''))
}

/** The whole program, as the Bench's Export > Program as .s saves it. */
export async function programText(page: Page): Promise<string> {
  await page.getByTestId('export').click()
  const downloading = page.waitForEvent('download')
  await page.locator('.n-dropdown-option', { hasText: 'Program as .s' }).click()
  return readFileSync(await (await downloading).path(), 'utf8')
}

/** Types a line at the end of the program, as a user would. */
export async function appendProgramLine(page: Page, line: string) {
  await page.getByTestId('program-editor').locator('.cm-content').click()
  await page.keyboard.press('ControlOrMeta+End')
  await page.keyboard.type(`\n${line}`)
  await expect(page.getByTestId('program-editor')).toContainText(line)
}

/** How many runs the Bench has finished (the chart box counts them). */
export async function runCount(page: Page): Promise<number> {
  return Number(await page.getByTestId('chart-box').getAttribute('data-runs'))
}

/** Opens a scenario on the Bench and waits until it is loaded and drawn. */
export async function openScenarioOnBench(page: Page, id: string, title: string) {
  await page.goto(`/bench?scenario=${id}`)
  await expect(page.getByTestId('scenario-title')).toHaveText(title, { timeout: 30_000 })
  await expect(page.getByTestId('lane-chart')).toBeVisible({ timeout: 60_000 })
}
