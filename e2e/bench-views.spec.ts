/**
 * Issue 10: the Bench keeps what you see. A zoomed view is saved and shared
 * in whole cycles (a fractional window was refused with a 400), the Bench URL
 * wins over the saved view, and a share link carries the switches and the
 * register shown.
 */
import { expect, test, type Page } from '@playwright/test'
import { DEMO, signIn, watchConsole } from './helpers/auth'
import { screenshot } from './helpers/screenshots'

const chart = (page: Page) => page.getByTestId('lane-chart')

async function saveAs(page: Page, title: string) {
  await page.getByTestId('scenario-toolbar').getByRole('button', { name: 'Save as…' }).click()
  await page.getByLabel('Title').fill(title)
  await page.getByRole('button', { name: 'Save', exact: true }).last().click()
  await expect(page.getByTestId('scenario-title')).toHaveText(title)
  await expect(page).toHaveURL(/scenario=/)
}

async function createLink(page: Page): Promise<string> {
  const dialog = page.getByTestId('share-dialog')
  if (!(await dialog.isVisible())) await page.getByRole('button', { name: 'Share…' }).click()
  await dialog.getByRole('button', { name: 'Create link' }).click()
  await expect(dialog.getByTestId('share-created')).toBeVisible()
  const url = await dialog.getByTestId('share-url').locator('input').inputValue()
  await dialog.getByRole('button', { name: 'Close', exact: true }).click()
  return new URL(url).pathname
}

test.describe('views on the Bench', () => {
  test('after a zoom the view saves, shares and reopens in whole cycles', async ({ page }) => {
    const problems = watchConsole(page)
    const run = `e2e${Date.now().toString(36)}`
    await signIn(page, DEMO.owner)
    await page.goto('/bench')
    await expect(chart(page)).toBeVisible({ timeout: 60_000 })
    // "+" twice: the chart's own window is fractional now.
    await chart(page).getByRole('button', { name: 'Zoom in' }).click()
    await chart(page).getByRole('button', { name: 'Zoom in' }).click()
    // The chart zooms through fractions; the view it hands on is whole cycles, rounded outward.
    const from = Math.floor(Number(await chart(page).getAttribute('data-window-start')))
    const to = Math.ceil(Number(await chart(page).getAttribute('data-window-end')))
    await expect(page).toHaveURL(new RegExp(`from=${from}&to=${to}`))

    await saveAs(page, `${run} zoomed`)
    await expect(page.getByText('Some fields are not valid')).toHaveCount(0)

    await page.getByRole('button', { name: 'Share…' }).click()
    const dialog = page.getByTestId('share-dialog')
    // Whole cycles, the end inclusive: the window [from, to) shows cycles from..to-1.
    await expect(dialog.locator('.lead')).toContainText(`cycles ${from}–${to - 1}`)
    await expect(dialog.locator('.lead')).not.toContainText(/\d\.\d/)
    const link = await createLink(page)

    // Reopen the saved scenario without a view in the URL: the saved window comes back.
    const scenario = new URL(page.url()).searchParams.get('scenario')
    await page.goto(`/bench?scenario=${scenario}`)
    await expect(page.getByTestId('scenario-title')).toHaveText(`${run} zoomed`, { timeout: 30_000 })
    await expect(chart(page)).toHaveAttribute('data-window-start', `${from}.00`)
    await expect(chart(page)).toHaveAttribute('data-window-end', `${to}.00`)

    // And the share link opens at the same window.
    await page.goto(link)
    await expect(page.getByTestId('share-view-text')).toContainText(`cycles ${from}–${to - 1}`)
    await expect(chart(page)).toHaveAttribute('data-window-start', `${from}.00`, { timeout: 60_000 })
    await screenshot(page, 'bench-zoom-shared')
    expect(problems).toEqual([])
  })
})
