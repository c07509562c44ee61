/**
 * Issue 10, hard to read: the Bench has a legend like the exported picture,
 * and a long run zoomed out keeps its instruction colours (the dominant
 * instruction per pixel column) in both themes instead of a grey smear.
 */
import { readFileSync } from 'node:fs'
import { expect, test, type Page } from '@playwright/test'
import { parseMachine } from '../shared/schemas/machine'
import { DEFAULT_PRESET_ID, PRESETS } from '../shared/sim/presets'
import { runPipeline } from '../shared/sim/run'
import { DEMO, signIn, userMenu } from './helpers/auth'
import { accessToken, workspaceId } from './helpers/api'
import { screenshot } from './helpers/screenshots'

const chart = (page: Page) => page.getByTestId('lane-chart')

async function pickExample(page: Page, id: string) {
  const title = (readFileSync(`examples/${id}.s`, 'utf8').match(/^#\s*(.+)$/m)?.[1] ?? id).split(/[:.](\s|$)/)[0]!.trim()
  const before = Number(await page.getByTestId('chart-box').getAttribute('data-runs'))
  await page.getByTestId('example-select').click()
  await page.locator('.n-base-select-option', { hasText: title }).first().click()
  await expect.poll(async () => Number(await page.getByTestId('chart-box').getAttribute('data-runs')), { timeout: 60_000 }).toBeGreaterThan(before)
}

/** Share of the painted canvas pixels that are coloured (not grey): the spread of R, G and B is over 40 of 255. */
async function colouredShare(page: Page): Promise<number> {
  return chart(page).locator('.lc-bars canvas').evaluate((c: HTMLCanvasElement) => {
    const d = c.getContext('2d')!.getImageData(0, 0, c.width, c.height).data
    let painted = 0
    let coloured = 0
    for (let i = 0; i < d.length; i += 4) {
      if (d[i + 3]! < 200) continue
      painted++
      if (Math.max(d[i]!, d[i + 1]!, d[i + 2]!) - Math.min(d[i]!, d[i + 1]!, d[i + 2]!) > 40) coloured++
    }
    return painted ? coloured / painted : 0
  })
}

test.describe('reading the Lane chart', () => {
  test('the Bench shows a legend: phases, stall hatching, cursor, selection, and arrows and R/E/W rows when on', async ({ page }) => {
    await page.setViewportSize({ width: 1440, height: 900 })
    await signIn(page, DEMO.editor)
    await expect(chart(page)).toBeVisible({ timeout: 60_000 })
    const legend = page.getByTestId('chart-legend')
    for (const item of ['read', 'execute', 'write', 'stall', 'cursor', 'selection']) await expect(legend.locator(`[data-legend="${item}"]`)).toBeVisible()
    await expect(legend.locator('[data-legend="rows"]')).toHaveCount(0)
    await page.getByText('R/E/W rows', { exact: true }).click()
    await page.getByText('Dependencies', { exact: true }).click()
    await expect(legend.locator('[data-legend="rows"]')).toContainText('R read, E execute, W write')
    await expect(legend.locator('[data-legend="dependencies"]')).toBeVisible()
    await screenshot(page, 'bench-legend')
  })

  test('a long run zoomed out keeps its instruction colours, in light and dark', async ({ page }) => {
    test.setTimeout(120_000)
    await page.setViewportSize({ width: 1440, height: 900 })
    await signIn(page, DEMO.editor)
    await expect(chart(page)).toBeVisible({ timeout: 60_000 })
    await pickExample(page, 'long-stream')
    await expect(chart(page)).toHaveAttribute('data-renderer', 'canvas')
    await chart(page).getByRole('button', { name: 'Fit' }).click()
    for (const theme of ['light', 'dark'] as const) {
      if ((await page.evaluate(() => document.documentElement.dataset.theme)) !== theme) {
        await userMenu(page, `Switch to ${theme} theme`)
        await expect.poll(() => page.evaluate(() => document.documentElement.dataset.theme)).toBe(theme)
        await page.waitForTimeout(300)
      }
      // Most painted pixels keep an instruction's colour; the grey merge painted them all grey.
      await expect.poll(() => colouredShare(page), { timeout: 10_000 }).toBeGreaterThan(0.5)
      await chart(page).screenshot({ path: `.screenshots/bench-long-run-${theme}.png`, animations: 'disabled' })
    }
  })

  test('the wheel scrolls the page unless Ctrl is held or the chart was clicked; Esc clears the selection; plain words in forms', async ({ page }) => {
    await page.setViewportSize({ width: 1280, height: 800 })
    await signIn(page, DEMO.editor)
    await expect(chart(page)).toBeVisible({ timeout: 60_000 })
    const end = () => chart(page).getAttribute('data-window-end')
    const fitted = await end()
    const box = (await chart(page).locator('.lc-bars').boundingBox())!
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2)
    await page.mouse.wheel(0, 300)
    await expect.poll(() => page.evaluate(() => window.scrollY)).toBeGreaterThan(0)
    expect(await end()).toBe(fitted)
    // Ctrl + wheel zooms.
    const box2 = (await chart(page).locator('.lc-bars').boundingBox())!
    await page.mouse.move(box2.x + box2.width / 2, box2.y + box2.height / 2)
    await page.keyboard.down('Control')
    await page.mouse.wheel(0, -300)
    await page.keyboard.up('Control')
    await expect.poll(end).not.toBe(fitted)
    // Selecting from the table, then Esc with the chart focused clears it.
    await page.getByTestId('instruction-table').locator('tbody tr').nth(3).click()
    await expect(chart(page)).toHaveAttribute('data-selected', /\d+/)
    await chart(page).focus()
    await page.keyboard.press('Escape')
    await expect(chart(page)).toHaveAttribute('data-selected', '')
    // The Save as description says what to write, not the component library's "Please Input".
    await page.getByTestId('scenario-toolbar').getByRole('button', { name: 'Save as…' }).click()
    await expect(page.locator('#save-description')).toHaveAttribute('placeholder', /Markdown/)
    await expect(page.getByText('Please Input')).toHaveCount(0)
  })

  test('a ragged tail is explained in numbers, from runs of the even neighbours', async ({ page, request }) => {
    test.setTimeout(120_000)
    // The long stream at vl 250 instead of 256 on the Long-vector 8-lane preset (VLEN 16384), saved with it.
    const program = readFileSync('examples/long-stream.s', 'utf8').replace(/\.equ\s+AVL, 256/, '.equ    AVL, 250')
    const machine = PRESETS.find((p) => p.id === 'long-vector-8')!.machine
    const cycles = (text: string) => {
      const r = runPipeline({ program: text, machine: parseMachine(machine) })
      if (!r.ok) throw new Error(r.error.message)
      return r.trace.cycles
    }
    const at250 = cycles(program)
    const saved = at250 - cycles(program.replace('.equ    AVL, 250', '.equ    AVL, 248'))
    const token = await accessToken(request, DEMO.editor)
    const ws = await workspaceId(request, token)
    const res = await request.post(`/api/workspaces/${ws}/scenarios`, {
      headers: { Authorization: `Bearer ${token}` },
      data: { content: { title: `Ragged vl=250 ${Date.now().toString(36)}`, program, machine } },
    })
    expect(res.status()).toBe(201)
    const { scenario } = (await res.json()) as { scenario: { id: string } }
    await page.setViewportSize({ width: 1440, height: 900 })
    await signIn(page, DEMO.editor)
    await page.goto(`/bench?scenario=${scenario.id}`)
    const ragged = page.getByTestId('ragged-tail')
    await expect(ragged).toContainText('lanes 0–1 have 32 elements, lanes 2–7 have 31', { timeout: 60_000 })
    await expect(ragged).toContainText(`vl 248 would be ${saved.toLocaleString('en-US')} cycles shorter`, { timeout: 60_000 })
    await expect(page.getByTestId('metric-cycles')).toHaveText(at250.toLocaleString('en-US'))
    await ragged.scrollIntoViewIfNeeded()
    await page.getByTestId('chart-box').locator('..').screenshot({ path: '.screenshots/bench-ragged-tail.png' })
  })

  test('the bank view maps words to banks, shows port use and denials, and what the selected instruction collided with', async ({ page }) => {
    test.setTimeout(120_000)
    await page.setViewportSize({ width: 1440, height: 900 })
    await signIn(page, DEMO.editor)
    await expect(chart(page)).toBeVisible({ timeout: 60_000 })
    await pickExample(page, 'bank-conflicts')
    const view = page.getByTestId('bank-view')
    await expect(view).toBeVisible()
    await expect(view.getByTestId('bank-heat')).toContainText('denied')
    // Select the instruction that waited longest on banks (the table's bank column, when there is one).
    // The Bench's machine: the default preset.
    const trace = runPipeline({ program: readFileSync('examples/bank-conflicts.s', 'utf8'), machine: parseMachine(PRESETS.find((p) => p.id === DEFAULT_PRESET_ID)!.machine) })
    if (!trace.ok) throw new Error(trace.error.message)
    const worst = [...trace.trace.instructions].sort((a, b) => b.stalls.bank - a.stalls.bank)[0]!
    await page.getByTestId('instruction-table').locator(`tbody tr[data-index="${worst.index}"]`).click()
    await expect(chart(page)).toHaveAttribute('data-selected', String(worst.index))
    await expect(view).toContainText(`Instruction #${worst.index}`)
    if (worst.stalls.bank > 0) await expect(view.getByTestId('bank-collisions')).toContainText('lane')
    await view.screenshot({ path: '.screenshots/bench-bank-view.png' })
  })
})
