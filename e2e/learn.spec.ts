/**
 * Learn (issue 14): a student opens the Learn page, sees the five lessons with
 * what each teaches and its question count, opens one and plays it on the
 * Bench. The cycles shown are the lesson's own run in Node (shared/sim/run.ts),
 * whose claims tests/learn checks against closed forms of the model.
 * Screenshots: .screenshots/learn-*.png.
 */
import { expect, test } from '@playwright/test'
import { LESSONS, lessonById } from '../shared/learn'
import { runPipeline } from '../shared/sim/run'
import { DEMO, signIn, watchConsole } from './helpers/auth'
import { screenshot } from './helpers/screenshots'

test('the Learn page lists the five lessons, opens one and plays it on the Bench', async ({ page }) => {
  test.setTimeout(120_000)
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
  await page.getByTestId('open-uneven-lanes').click()
  await expect(page).toHaveURL(/\/learn\/uneven-lanes$/)
  await expect(page.getByRole('heading', { name: lesson.title })).toBeVisible()
  await expect(page.getByTestId('lesson-steps').locator(':scope > li')).toHaveCount(lesson.walkthrough.steps.length)
  await expect(page.getByTestId('lesson-program')).toContainText('li a0, 60')
  await screenshot(page, 'learn-lesson')

  const run = runPipeline({ program: lesson.program, machine: lesson.machine })
  if (!run.ok) throw new Error(run.error.message)
  await page.getByTestId('play-lesson').click()
  await expect(page).toHaveURL(/\/bench/)
  await expect(page.getByTestId('lane-chart')).toBeVisible({ timeout: 60_000 })
  await expect(page.getByTestId('metric-cycles')).toHaveText(String(run.trace.cycles))
  await screenshot(page, 'learn-played')
  expect(problems).toEqual([])
})
