/**
 * Classroom (issue 14): the owner pastes a class list into Workspace settings;
 * a mistyped address is placed by line and column before anything is sent;
 * once fixed, the students are invited as viewers, a repeated address once,
 * and they appear among the pending invitations. Screenshots:
 * .screenshots/classroom-*.png.
 */
import { expect, test } from '@playwright/test'
import { DEMO, signIn, watchConsole } from './helpers/auth'
import { screenshot } from './helpers/screenshots'

test('an owner invites a class from a pasted list: problems placed by line, then invited as viewers, repeats once', async ({ page }) => {
  test.setTimeout(120_000)
  const problems = watchConsole(page)
  await signIn(page, DEMO.owner)
  await page.goto('/workspace/settings')
  const form = page.getByTestId('bulk-invite')
  await expect(form).toBeVisible()
  const tag = Math.random().toString(36).slice(2, 8)
  const [a, b] = [`ada-${tag}@school.test`, `bea-${tag}@school.test`]
  const box = page.getByLabel("Students' e-mail addresses")
  const line2 = `Bea Student <${b}>, bob@`
  await box.fill(`${a}\n${line2}\n${a}`)
  await expect(page.getByTestId('bulk-problems')).toContainText(`Line 2, column ${line2.indexOf('bob@') + 1}: "bob@" is not an e-mail address`)
  await expect(page.getByTestId('bulk-send')).toBeDisabled()
  await screenshot(page, 'classroom-problems')

  await box.fill(`${a}\nBea Student <${b}>\n${a}`)
  await expect(page.getByTestId('bulk-preview')).toHaveText('2 addresses, 1 listed more than once')
  await page.getByTestId('bulk-send').click()
  const result = page.getByTestId('bulk-result')
  await expect(result).toContainText('Invited 2')
  await expect(result).toContainText(`Listed more than once (invited once): ${a} (lines 1, 3)`)
  const pending = page.getByTestId('pending-invitations')
  await expect(pending.getByRole('row', { name: new RegExp(a) })).toContainText('viewer')
  await expect(pending.getByRole('row', { name: new RegExp(b) })).toContainText('viewer')
  await screenshot(page, 'classroom-invited')
  expect(problems).toEqual([])
})
