/**
 * Issue 10: the Bench keeps what you see. A zoomed view is saved and shared
 * in whole cycles (a fractional window was refused with a 400), the Bench URL
 * wins over the saved view, and a share link carries the switches and the
 * register shown.
 */
import { expect, test, type Page } from '@playwright/test'
import fs from 'node:fs'
import { DEMO, signIn, watchConsole } from './helpers/auth'
import { accessToken, workspaceId } from './helpers/api'
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
  test('a page change is not undone by the Bench writing its view to the URL while the next page loads', async ({ page }) => {
    await signIn(page, DEMO.editor)
    await page.goto('/bench')
    await expect(chart(page)).toBeVisible({ timeout: 60_000 })
    // The Learn page's code arrives 1.5 s late, as on a slow machine; meanwhile the view changes.
    await page.route(/\/assets\/LearnView-[^/]*\.js$/, async (route) => {
      await new Promise((resolve) => setTimeout(resolve, 1500))
      await route.continue()
    })
    await page.getByRole('link', { name: 'Learn', exact: true }).first().click()
    await chart(page).getByRole('button', { name: 'Zoom in' }).click()
    await expect(page).toHaveURL(/\/learn$/, { timeout: 10_000 })
    await expect(page.getByTestId('lesson-list')).toBeVisible()
  })

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

  test('the Bench URL wins over the saved view, on opening and on reload', async ({ page, request }) => {
    const run = `e2e${Date.now().toString(36)}`
    const token = await accessToken(request, DEMO.owner)
    const ws = await workspaceId(request, token)
    const program = fs.readFileSync('examples/saxpy.s', 'utf8')
    const res = await request.post(`/api/workspaces/${ws}/scenarios`, {
      headers: { Authorization: `Bearer ${token}` },
      data: { content: { title: `${run} url view`, program, view: { cursor: 20, window: null, selected: 2 } } },
    })
    expect(res.status()).toBe(201)
    const { scenario } = (await res.json()) as { scenario: { id: string } }

    await signIn(page, DEMO.owner)
    await page.goto(`/bench?scenario=${scenario.id}&cycle=11&sel=3`)
    await expect(page.getByTestId('scenario-title')).toHaveText(`${run} url view`, { timeout: 30_000 })
    await expect(page.getByTestId('cursor-cycle')).toContainText('cycle 11 /', { timeout: 60_000 })
    await expect(chart(page)).toHaveAttribute('data-selected', '3')
    await page.reload()
    await expect(page.getByTestId('scenario-title')).toHaveText(`${run} url view`, { timeout: 30_000 })
    await expect(page.getByTestId('cursor-cycle')).toContainText('cycle 11 /', { timeout: 60_000 })
    await expect(chart(page)).toHaveAttribute('data-selected', '3')
    // Without a view in the URL the saved one is used.
    await page.goto(`/bench?scenario=${scenario.id}`)
    await expect(page.getByTestId('cursor-cycle')).toContainText('cycle 20 /', { timeout: 60_000 })
    await expect(chart(page)).toHaveAttribute('data-selected', '2')
  })

  test('a share link carries the R/E/W and Dependencies switches and the register shown, with its values', async ({ page, browser }) => {
    const problems = watchConsole(page)
    const run = `e2e${Date.now().toString(36)}`
    await signIn(page, DEMO.owner)
    await page.goto('/bench')
    await expect(chart(page)).toBeVisible({ timeout: 60_000 })
    await page.getByTestId('instruction-table').locator('tbody tr').nth(3).click()
    await expect(chart(page)).toHaveAttribute('data-selected', /\d+/)
    const selected = await chart(page).getAttribute('data-selected')
    // Clicking the switch's label toggles it.
    await page.getByText('R/E/W rows', { exact: true }).click()
    await page.getByText('Dependencies', { exact: true }).click()
    const register = (await page.getByLabel('Register to show').locator('..').innerText()).split('\n')[0]!.trim()
    expect(register).toMatch(/^v\d+$/)
    const values = await page.getByTestId('register-values').innerText()
    await saveAs(page, `${run} switches`)

    await page.getByRole('button', { name: 'Share…' }).click()
    await expect(page.getByTestId('share-dialog').locator('.lead')).toContainText(`R/E/W rows, dependency arrows, register ${register}`)
    const link = await createLink(page)

    const reader = await (await browser.newContext()).newPage()
    await reader.goto(link)
    await expect(reader.getByTestId('share-view-text')).toContainText(`register ${register}`)
    await expect(reader.getByTestId('lane-chart')).toHaveAttribute('data-selected', selected!, { timeout: 60_000 })
    await expect(reader.getByRole('switch', { name: 'Sub-rows for read, execute and write' })).toHaveAttribute('aria-checked', 'true')
    await expect(reader.getByRole('switch', { name: 'Dependency arrows for the selected instruction' })).toHaveAttribute('aria-checked', 'true')
    await expect(reader.getByTestId('register-values')).toHaveText(values, { useInnerText: true })
    await screenshot(reader, 'share-reader-register')
    expect(problems).toEqual([])
  })

  test('an edited example is a custom program; exports are named after the scenario, the note said once', async ({ page }) => {
    const run = `e2e${Date.now().toString(36)}`
    await signIn(page, DEMO.editor)
    await page.goto('/bench')
    await expect(chart(page)).toBeVisible({ timeout: 60_000 })
    await expect(page.getByTestId('example-select')).not.toContainText('Custom program')
    await page.getByTestId('program-editor').locator('.cm-content').click()
    await page.keyboard.press('ControlOrMeta+End')
    await page.keyboard.type('\n# edited')
    await expect(page.getByTestId('example-select')).toContainText('Custom program')

    const download = async (label: string) => {
      await page.getByTestId('export').click()
      const downloading = page.waitForEvent('download')
      await page.locator('.n-dropdown-option', { hasText: label }).click()
      return downloading
    }
    expect((await download('Chart as PNG')).suggestedFilename()).toBe('untitled.png')
    await saveAs(page, `Ragged vl=20 ${run}`)
    expect((await download('Chart as PNG')).suggestedFilename()).toBe(`ragged-vl-20-${run}.png`)
    const svg = await download('Chart as SVG')
    expect(svg.suggestedFilename()).toBe(`ragged-vl-20-${run}.svg`)
    const text = fs.readFileSync(await svg.path(), 'utf8')
    expect(text).toContain(`Chimeline: Ragged vl=20 ${run}`)
    expect(text.split('not sign-off for silicon').length - 1).toBe(1)
  })

  test('a program with errors keeps the last run dimmed as stale, with the count and a link to the first error', async ({ page }) => {
    await signIn(page, DEMO.editor)
    await page.goto('/bench')
    await expect(chart(page)).toBeVisible({ timeout: 60_000 })
    await expect(page.getByTestId('stale-note')).toHaveCount(0)
    await page.getByTestId('program-editor').locator('.cm-content').click()
    await page.keyboard.press('ControlOrMeta+End')
    await page.keyboard.type('\n    vbogus.vv v1, v2, v3')
    const note = page.getByTestId('stale-note')
    await expect(note).toContainText('The program has 1 error')
    await expect(page.getByTestId('results')).toHaveAttribute('data-stale', 'true')
    await screenshot(page, 'bench-stale')
    // The link puts the editor's cursor on the bad line.
    await page.getByTestId('cursor-cycle').click()
    await page.getByTestId('first-error').click()
    await expect(page.getByTestId('program-editor').locator('.cm-activeLine')).toContainText('vbogus.vv')
    // Fixing it runs again and the mark goes.
    await page.keyboard.press('End')
    await page.keyboard.press('Shift+Home')
    await page.keyboard.press('Backspace')
    await expect(note).toHaveCount(0, { timeout: 30_000 })
    await expect(page.getByTestId('results')).not.toHaveAttribute('data-stale', 'true')
  })

  test('descriptions are rendered Markdown on the Bench and the share page, and editors change title, description and tags later', async ({ page }) => {
    const problems = watchConsole(page)
    const run = `e2e${Date.now().toString(36)}`
    await signIn(page, DEMO.editor)
    await page.goto('/bench')
    await expect(chart(page)).toBeVisible({ timeout: 60_000 })
    await page.getByTestId('scenario-toolbar').getByRole('button', { name: 'Save as…' }).click()
    await page.getByLabel('Title').fill(`${run} described`)
    await page.locator('#save-description').fill('**Expected**: the tail costs a beat.\n\n<b onclick="alert(1)">raw</b>')
    await page.getByRole('button', { name: 'Save', exact: true }).last().click()
    await expect(page.getByTestId('scenario-title')).toHaveText(`${run} described`)
    const desc = page.getByTestId('scenario-description')
    await expect(desc.locator('strong')).toHaveText('Expected')
    await expect(desc.locator('b')).toHaveCount(0)
    await expect(desc).toContainText('<b onclick="alert(1)">raw</b>')

    await page.getByTestId('edit-details').click()
    await page.getByLabel('Title').fill(`${run} renamed`)
    await page.locator('#save-description').fill('Now *slower*.')
    await page.getByRole('button', { name: 'Save', exact: true }).last().click()
    await expect(page.getByText('Saved version 2.')).toBeVisible()
    // One Detach button, with a tooltip that says what it does.
    await expect(page.getByTestId('detach')).toHaveCount(1)
    await expect(page.getByTestId('detach')).toHaveAttribute('title', /next Save makes a new scenario/)
    await expect(page.getByTestId('scenario-title')).toHaveText(`${run} renamed`)
    await expect(desc.locator('em')).toHaveText('slower')
    await screenshot(page, 'bench-description')

    const link = await createLink(page)
    await page.goto(link)
    await expect(page.getByTestId('share-title')).toHaveText(`${run} renamed`)
    await expect(page.getByTestId('share-description').locator('em')).toHaveText('slower')
    expect(problems).toEqual([])
  })
})
