import fs from 'node:fs'
import { expect, test } from '@playwright/test'
import { DEMO, signIn, watchConsole } from './helpers/auth'
import { accessToken, createScenario, workspaceId } from './helpers/api'
import { screenshot } from './helpers/screenshots'

// Our own demo program (examples/saxpy.s): it assembles and runs, so the list shows its cycles.
const SAXPY = fs.readFileSync('examples/saxpy.s', 'utf8')

test.describe('the Scenarios page', () => {
  test('lists, searches, duplicates, deletes with undo, and reports an assembly error with its line and column', async ({ page, request }) => {
    const problems = watchConsole(page)
    // A word of this run only, so that scenarios left by earlier runs do not count.
    const run = `e2e${Date.now().toString(36)}`
    const token = await accessToken(request, DEMO.owner)
    const ws = await workspaceId(request, token)
    await createScenario(request, token, ws, { title: `${run} saxpy tail`, tags: ['tail', run], program: SAXPY })
    await createScenario(request, token, ws, { title: `${run} dot product`, tags: [run], program: SAXPY })

    await signIn(page, DEMO.owner)
    await page.goto('/scenarios')
    const table = page.getByTestId('scenario-table')
    await page.getByLabel('Search scenarios').fill(run)
    await expect(table.locator('tbody tr')).toHaveCount(2)
    await expect(table).toContainText(`${run} saxpy tail`)
    await expect(table).toContainText(`${run} dot product`)

    // The search is done by the server: a narrower word leaves one row.
    await page.getByLabel('Search scenarios').fill(`${run} saxpy`)
    await expect(table.locator('tbody tr')).toHaveCount(1)
    await expect(table.locator('tbody tr').first()).not.toContainText('did not run')
    await screenshot(page, 'scenarios-list')

    await page.getByRole('button', { name: `Duplicate ${run} saxpy tail` }).click()
    await expect(page.getByText(`Made “${run} saxpy tail (copy)”.`)).toBeVisible()
    await expect(table.locator('tbody tr')).toHaveCount(2)

    await page.getByRole('button', { name: `Delete ${run} saxpy tail (copy)` }).click()
    await expect(table.locator('tbody tr')).toHaveCount(1)
    await expect(page.getByText('moved to the trash')).toBeVisible()
    await screenshot(page, 'scenarios-deleted-undo')
    await page.getByRole('button', { name: 'Undo' }).click()
    await expect(table.locator('tbody tr')).toHaveCount(2)
    await expect(table).toContainText(`${run} saxpy tail (copy)`)

    // An import with an error: the server's diagnostic names line 3 and its column.
    await page.getByTestId('import-upload').locator('input[type=file]').setInputFiles({
      name: `${run}-broken.s`,
      mimeType: 'text/plain',
      buffer: Buffer.from('  .text\n  li a0, 4\n  vfadd.vv v1, v2, v99\n  ecall\n'),
    })
    const error = page.getByTestId('import-error')
    await expect(error).toBeVisible()
    await expect(error).toContainText(/line 3, column \d+/)
    await screenshot(page, 'scenarios-import-error')

    // A good file becomes a scenario of the list.
    await page.getByTestId('import-upload').locator('input[type=file]').setInputFiles({ name: `${run}-good.s`, mimeType: 'text/plain', buffer: Buffer.from(SAXPY) })
    await expect(page.getByText(`Imported ${run}-good.s`)).toBeVisible()
    await page.getByLabel('Search scenarios').fill(`${run}-good`)
    await expect(table.locator('tbody tr')).toHaveCount(1)

    // The one 400 expected is the refused upload; Chromium logs every failed request.
    expect(problems.filter((p) => !(p.includes('status of 400') && p.endsWith('/uploads)')))).toEqual([])
  })
})

test.describe('versions and workspace settings', () => {
  test('the history panel shows what a version changed: program lines, machine fields, metrics', async ({ page, request }) => {
    const run = `e2e${Date.now().toString(36)}`
    const token = await accessToken(request, DEMO.owner)
    const ws = await workspaceId(request, token)
    const s = await createScenario(request, token, ws, { title: `${run} history`, program: SAXPY })
    const res = await request.post(`/api/workspaces/${ws}/scenarios/${s.id}/versions`, {
      headers: { Authorization: `Bearer ${token}` },
      data: { baseVersion: 1, message: 'four lanes', content: { title: `${run} history`, program: SAXPY.replace('# elements left', '# elements to go'), machine: { lanes: 4 } } },
    })
    expect(res.status()).toBe(201)

    await signIn(page, DEMO.owner)
    await page.goto(`/bench?scenario=${s.id}`)
    await expect(page.getByTestId('scenario-title')).toHaveText(`${run} history`)
    await page.getByRole('button', { name: 'History' }).click()
    const diff = page.getByTestId('version-diff')
    await expect(diff).toContainText('# elements to go')
    await expect(diff).toContainText('Lanes') // the machine form's label, not the field name (issue 10)
    await expect(diff).toContainText('cycles')
    await expect(page.getByTestId('version-list')).toContainText('four lanes')
    await expect(diff).not.toContainText('did not run')
    await screenshot(page, 'scenario-history')
  })

  test('the owner sees members with their roles and can invite by e-mail', async ({ page }) => {
    await signIn(page, DEMO.owner)
    await page.goto('/workspace/settings')
    const members = page.getByTestId('members-table')
    for (const who of [DEMO.owner, DEMO.editor, DEMO.viewer]) await expect(members).toContainText(who)
    const invitee = `new-${Date.now().toString(36)}@example.org`
    await page.getByLabel('E-mail', { exact: true }).fill(invitee)
    await page.getByRole('button', { name: 'Send invitation' }).click()
    await expect(page.getByText(`Invitation sent to ${invitee}.`)).toBeVisible()
    await expect(page.getByTestId('pending-invitations')).toContainText(invitee)
    await screenshot(page, 'workspace-settings')
  })

  test('a new account creates another workspace in settings and sets the default machine of its imports', async ({ page }) => {
    const email = `ws-${Date.now().toString(36)}@example.org`
    await page.goto('/signup')
    await page.getByLabel('Name').fill('Wanda Workspace')
    await page.getByLabel('E-mail').fill(email)
    await page.getByLabel('Password', { exact: true }).fill('workspace-pass-2026')
    await page.getByLabel('Password again').fill('workspace-pass-2026')
    await page.getByRole('button', { name: 'Create account' }).click()
    await expect(page.getByTestId('workspace-switcher')).toContainText("Wanda Workspace's workspace")
    await page.goto('/workspace/settings')
    await page.getByLabel('Name of the new workspace').fill('Ring experiments')
    await page.getByRole('button', { name: 'Create workspace' }).click()
    await expect(page.getByTestId('workspace-switcher')).toContainText('Ring experiments')
    await page.getByTestId('default-preset').click()
    await page.locator('.n-base-select-option', { hasText: 'Starter 4-lane' }).click()
    await expect(page.getByText('Imports into Ring experiments now start on Starter 4-lane.')).toBeVisible()
    await page.reload()
    await expect(page.getByTestId('default-preset')).toContainText('Starter 4-lane')
    await screenshot(page, 'workspace-create')
  })
})
