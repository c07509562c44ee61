import { expect, test } from '@playwright/test'
import { DEMO, signIn, watchConsole } from './helpers/auth'
import { accessToken, mailTo } from './helpers/api'
import { screenshot } from './helpers/screenshots'

test.describe('share links', () => {
  test('the owner saves and shares by e-mail; a signed-out reader opens the link at the same cycle; revoking stops it', async ({ browser, request }) => {
    const run = `e2e${Date.now().toString(36)}`
    const reader = `reader-${run}@example.org`

    // Context 1: the owner.
    const ownerContext = await browser.newContext()
    const owner = await ownerContext.newPage()
    const ownerProblems = watchConsole(owner)
    await signIn(owner, DEMO.owner)
    // The Bench takes its view from the URL: cursor at cycle 12, instruction 1 selected.
    await owner.goto('/bench?cycle=12&sel=1')
    await expect(owner.getByTestId('lane-chart')).toBeVisible()
    await expect(owner.getByTestId('cursor-cycle')).toContainText('cycle 12 /')

    await owner.getByTestId('scenario-toolbar').getByRole('button', { name: 'Save as…' }).click()
    await owner.getByLabel('Title').fill(`${run} saxpy shared`)
    await owner.getByRole('button', { name: 'Save', exact: true }).last().click()
    await expect(owner.getByTestId('scenario-title')).toHaveText(`${run} saxpy shared`)
    await expect(owner).toHaveURL(/scenario=/)

    await owner.getByRole('button', { name: 'Share…' }).click()
    const dialog = owner.getByTestId('share-dialog')
    await expect(dialog).toContainText('cycle 12')
    await dialog.getByRole('button', { name: 'Create link' }).click()
    await expect(dialog.getByTestId('share-created')).toBeVisible()
    await dialog.getByLabel('Send by e-mail to').fill(reader)
    await dialog.getByLabel('Note').fill('Look at the ragged tail at cycle 12.')
    await dialog.getByRole('button', { name: 'Send' }).click()
    await expect(owner.getByText(`Sent to ${reader}.`)).toBeVisible()
    await screenshot(owner, 'share-dialog')

    // The e-mail, as the admin Outbox API shows what the SMTP sink received.
    const adminToken = await accessToken(request, DEMO.admin)
    let link = ''
    await expect
      .poll(async () => {
        const [mail] = await mailTo(request, adminToken, reader)
        link = mail?.text.match(/https?:\/\/\S+\/s\/[A-Za-z0-9_-]+/)?.[0] ?? ''
        return link
      })
      .not.toBe('')

    // Context 2: nobody signed in.
    const readerContext = await browser.newContext()
    const page = await readerContext.newPage()
    const readerProblems = watchConsole(page)
    await page.goto(new URL(link).pathname)
    await expect(page.getByTestId('share-title')).toHaveText(`${run} saxpy shared`)
    await expect(page.getByTestId('share-version')).toHaveText('version 1')
    await expect(page.getByTestId('share-author')).toHaveText('Olive Owner')
    await expect(page.getByTestId('share-view-text')).toContainText('cycle 12')
    await expect(page.getByTestId('lane-chart')).toBeVisible()
    await expect(page.getByTestId('cursor-cycle')).toContainText('cycle 12 /')
    // A vertical SVG line has no width, so Playwright never calls it visible: count it instead.
    await expect(page.getByTestId('lane-chart-cursor')).toHaveCount(1)
    await expect(page.getByTestId('lane-chart')).toHaveAttribute('data-selected', '1')
    await expect(page.getByRole('link', { name: 'Sign in to make my copy' })).toBeVisible()
    await screenshot(page, 'share-reader')

    // The owner revokes it; the reader's next visit gets a clear page.
    await owner.getByRole('button', { name: 'Revoke' }).first().click()
    await owner.getByRole('button', { name: 'Confirm' }).click()
    await expect(owner.getByText('Link revoked')).toBeVisible()
    await page.reload()
    await expect(page.getByTestId('share-problem')).toContainText('This share link was revoked')
    await screenshot(page, 'share-revoked')

    expect(ownerProblems).toEqual([])
    // The one failure the reader's console shows is the 410 of the revoked link.
    expect(readerProblems.filter((p) => !p.includes('status of 410'))).toEqual([])
    await ownerContext.close()
    await readerContext.close()
  })
})
