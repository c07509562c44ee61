/**
 * Learn (issue 14): a student opens the Learn page, sees the five lessons with
 * what each teaches and its question count, plays one on the Bench with the
 * walkthrough player, answers its question (checked against the run), and
 * takes the lesson to their own Bench to experiment. The expected answer and
 * cycles are the lesson's own run in Node (shared/sim/run.ts), whose claims
 * tests/learn checks against closed forms of the model (lane 7 has one beat
 * fewer per add under staggered issue: 2 cycles ahead on the third).
 * Screenshots: .screenshots/learn-*.png.
 */
import { expect, test } from '@playwright/test'
import { LESSONS, lessonById } from '../shared/learn'
import { experimentMachine } from '../shared/learn/lesson'
import { runPipeline } from '../shared/sim/run'
import { factValue } from '../shared/walkthroughs/facts'
import { DEMO, signIn, watchConsole } from './helpers/auth'
import { SCREENSHOT_DIR, screenshot } from './helpers/screenshots'

test('the Learn page lists the five lessons; one plays on the Bench step by step, its question is checked against the run, and it can be taken to my Bench', async ({ page }) => {
  test.setTimeout(150_000)
  const problems = watchConsole(page)
  await signIn(page, DEMO.viewer)
  await page.getByRole('link', { name: 'Learn', exact: true }).first().click()
  await expect(page).toHaveURL(/\/learn$/)
  const list = page.getByTestId('lesson-list')
  for (const lesson of LESSONS) {
    const card = list.getByTestId(`lesson-${lesson.id}`)
    await expect(card).toContainText(lesson.title)
    await expect(card).toContainText(lesson.teaches)
    await expect(card.getByTestId('question-count')).toHaveText('1 question')
  }
  await screenshot(page, 'learn-list')

  const lesson = lessonById('uneven-lanes')!
  const run = runPipeline({ program: lesson.program, machine: lesson.machine })
  if (!run.ok) throw new Error(run.error.message)
  await page.getByTestId('open-uneven-lanes').click()
  await expect(page).toHaveURL(/\/learn\/uneven-lanes$/)
  await expect(page.getByTestId('lesson-title')).toHaveText(lesson.title)
  const player = page.getByTestId('walkthrough-player')
  await expect(player).toBeVisible({ timeout: 60_000 })
  await expect(page.getByTestId('metric-cycles')).toHaveText(String(run.trace.cycles))
  const steps = lesson.walkthrough.steps.length
  await expect(page.getByTestId('walkthrough-step')).toHaveText(`step 1 of ${steps}`)
  await expect(page.getByTestId('walkthrough-note')).toContainText('An uneven split')
  await screenshot(page, 'learn-step-1')
  for (let i = 2; i <= steps; i++) {
    await page.getByTestId('walkthrough-next').click()
    await expect(page.getByTestId('walkthrough-step')).toHaveText(`step ${i} of ${steps}`)
  }
  const q = lesson.walkthrough.steps[steps - 1]!.question!
  if (q.kind !== 'number') throw new Error('the lesson ends with a number question')
  const fact = factValue(run.trace, q.fact)
  if (!fact.ok) throw new Error(fact.why)
  await expect(page.getByTestId('walkthrough-next')).toBeDisabled()
  await page.getByLabel('Your answer').fill(String(fact.value))
  await page.getByTestId('walkthrough-check').click()
  await expect(page.getByTestId('walkthrough-verdict')).toContainText('Right.')
  await expect(page.getByTestId('walkthrough-verdict')).toContainText(`The run says: ${fact.value}`)
  await screenshot(page, 'learn-answered')
  // The player beside the chart, as the student sees it without scrolling.
  await page.screenshot({ path: `${SCREENSHOT_DIR}/learn-answered-view.png`, animations: 'disabled' })

  await page.getByTestId('lesson-experiment').click()
  await expect(page).toHaveURL(/\/bench/)
  await expect(page.getByTestId('lane-chart')).toBeVisible()
  await expect(page.getByTestId('metric-cycles')).toHaveText(String(run.trace.cycles))
  await expect(page.getByTestId('walkthrough-player')).toHaveCount(0)
  expect(problems).toEqual([])
})

test('leaving a lesson any other way puts my own Bench back', async ({ page }) => {
  test.setTimeout(120_000)
  await signIn(page, DEMO.viewer)
  await expect(page.getByTestId('lane-chart')).toBeVisible({ timeout: 60_000 })
  const mine = await page.getByTestId('metric-cycles').innerText()
  await page.goto('/learn/reduction')
  await expect(page.getByTestId('walkthrough-player')).toBeVisible({ timeout: 60_000 })
  await page.getByRole('link', { name: 'Bench', exact: true }).first().click()
  await expect(page).toHaveURL(/\/bench/)
  await expect(page.getByTestId('metric-cycles')).toHaveText(mine, { timeout: 60_000 })
})

test('a teacher presents a lesson full screen at 1920x1080 and leaves back to the lesson', async ({ page }) => {
  test.setTimeout(120_000)
  await page.setViewportSize({ width: 1920, height: 1080 })
  await signIn(page, DEMO.owner)
  await page.goto('/learn/reduction')
  await expect(page.getByTestId('walkthrough-player')).toBeVisible({ timeout: 60_000 })
  await page.getByTestId('walkthrough-present-0').click()
  const stage = page.getByTestId('present-stage')
  await expect(stage).toBeVisible()
  await page.keyboard.press('ArrowRight')
  await page.keyboard.press('ArrowRight')
  await expect(stage).toContainText('Combining the partials')
  // Let the cursor's glide (GLIDE_MS, 450 ms) end before the picture.
  await page.waitForTimeout(600)
  await page.screenshot({ path: `${SCREENSHOT_DIR}/learn-present-1920.png`, animations: 'disabled' })
  await page.keyboard.press('Escape')
  await expect(stage).toHaveCount(0)
  await expect(page.getByTestId('lesson-title')).toHaveText(lessonById('reduction')!.title)
})

test('a "try" button takes the lesson to my Bench with the machine change its note talks about', async ({ page }) => {
  test.setTimeout(120_000)
  const lesson = lessonById('uneven-lanes')!
  const serial = lesson.experiments.findIndex((x) => x.label === 'issue: serial')
  const run = runPipeline({ program: lesson.program, machine: experimentMachine(lesson, lesson.experiments[serial]!) })
  if (!run.ok) throw new Error(run.error.message)
  await signIn(page, DEMO.viewer)
  await page.goto('/learn/uneven-lanes')
  await expect(page.getByTestId('walkthrough-player')).toBeVisible({ timeout: 60_000 })
  await page.getByTestId(`try-${serial}`).click()
  await expect(page).toHaveURL(/\/bench/)
  await expect(page.getByTestId('metric-cycles')).toHaveText(String(run.trace.cycles), { timeout: 60_000 })
  await expect(page.getByTestId('walkthrough-player')).toHaveCount(0)
})
