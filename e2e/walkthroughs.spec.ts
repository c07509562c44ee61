/**
 * Issue 14, "Done when": a teacher records a walkthrough of six steps on the
 * ragged-tail example (saxpy: 19 elements on 8 lanes, lanes 0-2 get 3 and
 * lanes 3-7 get 2), presents it full screen at 1920x1080 (screenshots
 * `.screenshots/walkthrough-present-*.png`, looked at), shares it, and a
 * signed-out student plays it, answers its question (checked against the
 * run: the expected number comes from the same pipeline run in Node,
 * shared/sim/run.ts), signs in and makes a copy in a workspace of their own.
 */
import { readFileSync } from 'node:fs'
import { expect, test, type Page } from '@playwright/test'
import { parseMachine } from '../shared/schemas/machine'
import { DEFAULT_PRESET_ID, PRESETS } from '../shared/sim/presets'
import { runPipeline } from '../shared/sim/run'
import { accessToken, createScenario, workspaceId } from './helpers/api'
import { DEMO, fillSignIn, signIn, userMenu, watchConsole } from './helpers/auth'
import { screenshot } from './helpers/screenshots'

const SAXPY = readFileSync('examples/saxpy.s', 'utf8')
const PRESET = PRESETS.find((p) => p.id === DEFAULT_PRESET_ID)!

function cyclesOfSaxpy(): number {
  const r = runPipeline({ program: SAXPY, machine: parseMachine(PRESET.machine) })
  if (!r.ok) throw new Error(r.error.message)
  return r.trace.cycles
}

const cursorText = async (page: Page) => (await page.getByTestId('cursor-cycle').innerText()).replace(/\s+/g, ' ')

test('a teacher records six steps on the ragged tail, presents them, shares them; a signed-out student plays, answers and makes a copy', async ({ page, browser, request }) => {
  test.setTimeout(180_000)
  const run = Date.now().toString(36)
  const problems = watchConsole(page)
  const token = await accessToken(request, DEMO.editor)
  const ws = await workspaceId(request, token)
  const scenario = await createScenario(request, token, ws, { title: `${run} ragged tail lecture`, tags: ['lecture'], program: SAXPY })

  await signIn(page, DEMO.editor)
  await page.goto(`/bench?scenario=${scenario.id}`)
  await expect(page.getByTestId('scenario-title')).toHaveText(`${run} ragged tail lecture`)
  await expect(page.getByTestId('lane-chart')).toBeVisible({ timeout: 60_000 })

  // Record: scrub, (select), name a lane, write the note, Add step; six times.
  const panel = page.getByTestId('walkthrough-panel')
  await panel.getByTestId('walkthrough-record').click()
  await page.locator('#walkthrough-title-input').fill(`${run} Why lanes 3 to 7 finish early`)
  const recorded: number[] = []
  const notes = [
    'The **vector unit** starts: 19 elements go to 8 lanes.',
    'Lanes 0 to 2 get **three** elements, lanes 3 to 7 get two.',
    'Watch lane 7: it has one element fewer.',
    'The load feeds every lane; the FMA follows it (chaining).',
    'Lane 7 is done while lane 0 still works: the *ragged tail*.',
    'How long does the whole run take?',
  ]
  for (let i = 0; i < 6; i++) {
    await page.getByTestId('next-event').click()
    if (i === 2) await page.getByTestId('instruction-table').locator('tbody tr').nth(2).click()
    if (i >= 2) await page.locator('#walkthrough-lane').fill('7')
    await page.locator('#walkthrough-note-input').fill(notes[i]!)
    if (i === 5) {
      await page.getByTestId('walkthrough-question-kind').click()
      await page.locator('.n-base-select-option', { hasText: 'A number read from the run' }).click()
      await page.locator('#walkthrough-question-text').fill('How many cycles does the run take?')
      await page.getByTestId('walkthrough-fact-kind').click()
      await page.locator('.n-base-select-option', { hasText: 'a run metric' }).click()
      await page.locator('#walkthrough-question-explanation').fill('The ruler ends at the **last busy cycle**; lane 0 sets it, with its extra element.')
    }
    recorded.push(Number((await page.getByTestId('walkthrough-capture').innerText()).match(/^cycle ([\d,]+)/)![1]!.replace(/,/g, '')))
    await page.getByTestId('walkthrough-add-step').click()
    await expect(page.getByTestId(`walkthrough-step-${i}`)).toBeVisible()
  }
  // Reorder and edit: move step 3 down and back, and rewrite step 1's note.
  await page.getByRole('button', { name: 'Move step 3 down' }).click()
  await expect(page.getByTestId('walkthrough-step-3')).toContainText('Watch lane 7')
  await page.getByRole('button', { name: 'Move step 4 up' }).click()
  await expect(page.getByTestId('walkthrough-step-2')).toContainText('Watch lane 7')
  await page.getByTestId('walkthrough-step-edit-0').click()
  await page.locator('#walkthrough-note-input').fill(notes[0]!.replace('starts', 'begins'))
  await page.getByTestId('walkthrough-add-step').click()
  await expect(page.getByTestId('walkthrough-step-0')).toContainText('begins')
  await panel.screenshot({ path: '.screenshots/walkthrough-recorder.png', animations: 'disabled' })
  await page.getByTestId('walkthrough-save').click()
  await expect(page.getByText(/Saved the walkthrough with version 2/)).toBeVisible()
  await expect(panel.getByTestId('walkthrough-list')).toContainText('6 steps')

  // The history lists it with its version.
  await page.getByTestId('scenario-toolbar').getByRole('button', { name: 'History' }).click()
  await expect(page.getByTestId('version-walkthroughs').first()).toContainText(`${run} Why lanes 3 to 7 finish early” (6 steps)`)
  await page.keyboard.press('Escape')

  // Present at 1920x1080: only the chart and the caption; keys step; b blanks; Esc leaves and the Bench is as it was.
  await page.setViewportSize({ width: 1920, height: 1080 })
  await page.getByTestId('step-forward').click()
  const beforePresent = await cursorText(page)
  await panel.getByTestId('walkthrough-present-0').click()
  const stage = page.getByTestId('present-stage')
  await expect(stage).toBeVisible()
  await expect(stage.getByTestId('walkthrough-step')).toHaveText('step 1 of 6')
  await page.mouse.move(900, 400)
  await expect.poll(() => cursorText(page)).toContain(`cycle ${recorded[0]} /`)
  await page.waitForTimeout(600) // the cursor's glide (450 ms) settles before the picture
  await page.screenshot({ path: '.screenshots/walkthrough-present-1.png', animations: 'disabled' })
  await page.keyboard.press('ArrowRight')
  await page.keyboard.press('ArrowRight')
  await expect(stage.getByTestId('walkthrough-step')).toHaveText('step 3 of 6')
  await expect(stage.getByTestId('lane-chart-lane-highlight')).toHaveAttribute('data-lane', '7')
  await page.mouse.move(1200, 300)
  await page.waitForTimeout(600)
  await page.screenshot({ path: '.screenshots/walkthrough-present-3.png', animations: 'disabled' })
  await page.keyboard.press('b')
  await expect(page.getByTestId('present-blank')).toBeVisible()
  await page.keyboard.press('b')
  await expect(page.getByTestId('present-blank')).toHaveCount(0)
  for (let i = 0; i < 3; i++) await page.keyboard.press('ArrowRight')
  await expect(stage.getByTestId('walkthrough-step')).toHaveText('step 6 of 6')
  await expect(stage.getByTestId('walkthrough-question')).toContainText('How many cycles does the run take?')
  await page.waitForTimeout(600)
  await page.screenshot({ path: '.screenshots/walkthrough-present-6.png', animations: 'disabled' })
  await page.keyboard.press('Home')
  await expect(stage.getByTestId('walkthrough-step')).toHaveText('step 1 of 6')
  await page.keyboard.press('Escape')
  await expect(stage).toHaveCount(0)
  await expect(page.getByTestId('walkthrough-player')).toHaveCount(0)
  await expect.poll(() => cursorText(page)).toBe(beforePresent)
  await expect(page.getByTestId('program-panel').or(page.locator('.left')).first()).toBeVisible()
  // The same stage in the dark theme (a dim lecture room).
  await userMenu(page, 'Switch to dark theme')
  await expect.poll(() => page.evaluate(() => document.documentElement.dataset.theme)).toBe('dark')
  await panel.getByTestId('walkthrough-present-0').click()
  await page.keyboard.press('ArrowRight')
  await page.keyboard.press('ArrowRight')
  await expect(stage.getByTestId('walkthrough-step')).toHaveText('step 3 of 6')
  await page.waitForTimeout(600)
  await page.screenshot({ path: '.screenshots/walkthrough-present-dark.png', animations: 'disabled' })
  await page.keyboard.press('Escape')
  await expect(stage).toHaveCount(0)
  await userMenu(page, 'Switch to light theme')
  await page.setViewportSize({ width: 1280, height: 900 })

  // Share it.
  await page.getByRole('button', { name: 'Share…' }).click()
  const dialog = page.getByTestId('share-dialog')
  await dialog.getByRole('button', { name: 'Create link' }).click()
  await expect(dialog.getByTestId('share-created')).toBeVisible()
  const url = await dialog.getByTestId('share-url').locator('input').inputValue()
  await expect(dialog.getByTestId('share-walkthrough-links')).toContainText(`${url}?walkthrough=1`)
  await dialog.getByRole('button', { name: 'Close', exact: true }).click()
  await expect(dialog).toHaveCount(0)
  expect(url).toMatch(/\/s\/[A-Za-z0-9_-]+$/)

  // A signed-out student plays it.
  const studentContext = await browser.newContext()
  const student = await studentContext.newPage()
  const studentProblems = watchConsole(student)
  await student.goto(`${new URL(url).pathname}?walkthrough=1`)
  const player = student.getByTestId('walkthrough-player')
  await expect(player).toBeVisible({ timeout: 60_000 })
  await expect(player.getByTestId('walkthrough-step')).toHaveText('step 1 of 6')
  await expect(player.getByTestId('walkthrough-note')).toContainText('begins')
  await expect.poll(() => cursorText(student)).toContain(`cycle ${recorded[0]} /`)
  for (let i = 1; i < 6; i++) {
    await student.keyboard.press(i % 2 ? 'ArrowRight' : 'Space')
    await expect(player.getByTestId('walkthrough-step')).toHaveText(`step ${i + 1} of 6`)
  }
  await expect.poll(() => cursorText(student)).toContain(`cycle ${recorded[5]} /`)
  // The question holds the student until answered; the answer is checked against the run.
  await expect(player.getByTestId('walkthrough-next')).toBeDisabled()
  const cycles = cyclesOfSaxpy()
  await student.locator('#walkthrough-number').fill(String(cycles))
  await player.getByTestId('walkthrough-check').click()
  await expect(player.getByTestId('walkthrough-verdict')).toContainText('Right.')
  await expect(player.getByTestId('walkthrough-verdict')).toContainText(`The run says: ${cycles}`)
  await expect(player.getByTestId('walkthrough-verdict')).toContainText('last busy cycle')
  await expect(student.getByTestId('estimate-note')).toBeVisible()
  await screenshot(student, 'walkthrough-student')
  await student.locator('.results').first().screenshot({ path: '.screenshots/walkthrough-student-chart.png', animations: 'disabled' })
  await student.keyboard.press('ArrowLeft')
  await expect(player.getByTestId('walkthrough-step')).toHaveText('step 5 of 6')
  await student.keyboard.press('Escape')
  await expect(player).toHaveCount(0)

  // Make my copy: signing in is needed; a new student has a workspace of their own from sign-up.
  const email = `student-${run}@class.test`
  const password = `copy-${run}-Walkthrough!`
  expect((await request.post('/api/auth/signup', { data: { email, name: `Student ${run}`, password } })).status()).toBe(201)
  await student.getByTestId('sign-in-to-copy').click()
  await fillSignIn(student, email, password)
  await expect(student.getByTestId('make-my-copy')).toBeVisible({ timeout: 30_000 })
  await expect(student.getByTestId('make-my-copy')).toContainText(`Student ${run}'s workspace`)
  await student.getByTestId('make-my-copy').click()
  await expect(student.getByTestId('scenario-title')).toHaveText(`${run} ragged tail lecture`, { timeout: 30_000 })
  await expect(student.getByTestId('walkthrough-list')).toContainText(`${run} Why lanes 3 to 7 finish early`)
  await screenshot(student, 'walkthrough-copy')

  // The teacher deletes it: a new version without it; the version the link shares keeps it.
  await panel.getByRole('button', { name: 'Delete' }).click()
  await page.getByRole('button', { name: 'Confirm' }).click()
  await expect(page.getByText(/Removed; saved version 3/)).toBeVisible()
  await expect(panel.getByTestId('walkthrough-list')).toHaveCount(0)

  expect(problems).toEqual([])
  expect(studentProblems).toEqual([])
  await studentContext.close()
})
