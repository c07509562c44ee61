import { expect, test } from '@playwright/test'
import { DEMO, DEMO_PASSWORD, fillSignIn, signIn, userMenu, watchConsole } from './helpers/auth'
import { screenshot } from './helpers/screenshots'

test.describe('signing in', () => {
  test('the demo editor signs in, sees Vector Lab in the workspace switcher and signs out', async ({ page }) => {
    const problems = watchConsole(page)
    await page.goto('/bench')
    // Signed out: sent to sign in, with the way back to the Bench.
    await expect(page).toHaveURL(/\/signin\?redirect=(%2F|\/)bench$/)
    await fillSignIn(page, DEMO.editor, DEMO_PASSWORD)

    await expect(page).toHaveURL(/\/bench$/)
    await expect(page.getByTestId('workspace-switcher')).toContainText('Vector Lab')
    await expect(page.getByText('Results are model estimates, not sign-off for silicon.')).toBeVisible()
    for (const section of ['Bench', 'Scenarios', 'Sweeps', 'Learn']) {
      await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: section })).toBeVisible()
    }
    // The Outbox is for site admins only.
    await expect(page.getByRole('link', { name: 'Outbox' })).toHaveCount(0)

    // The access token lives in memory: a reload brings the session back through the refresh cookie.
    await page.reload()
    await expect(page.getByTestId('workspace-switcher')).toContainText('Vector Lab')

    await screenshot(page, 'shell-light')
    await userMenu(page, 'Switch to dark theme')
    await expect(page.locator('html')).toHaveAttribute('data-theme', 'dark')
    // Naive UI fades the colours over 0.3 s; wait for the menu to close and the dark page background to settle.
    await expect(page.locator('.n-dropdown-menu')).toHaveCount(0)
    await expect.poll(() => page.evaluate(() => getComputedStyle(document.body).backgroundColor)).toBe('rgb(16, 16, 20)')
    await screenshot(page, 'shell-dark')
    // The choice is kept across a reload.
    await page.reload()
    await expect(page.locator('html')).toHaveAttribute('data-theme', 'dark')
    await userMenu(page, 'Switch to light theme')

    await userMenu(page, 'Sign out')
    await expect(page).toHaveURL(/\/signin$/)
    await page.goto('/scenarios')
    await expect(page).toHaveURL(/\/signin\?redirect=(%2F|\/)scenarios$/)
    expect(problems).toEqual([])
  })

  test('a wrong password shows the error message and keeps the user on the sign-in page', async ({ page }) => {
    await page.goto('/signin')
    await fillSignIn(page, DEMO.editor, 'not-the-demo-password')
    await expect(page.getByRole('alert')).toContainText('The e-mail address or password is not correct')
    await expect(page).toHaveURL(/\/signin$/)
    await screenshot(page, 'signin-wrong-password')
  })

  test('the sign-in form works from the keyboard alone', async ({ page }) => {
    await page.goto('/signin')
    await page.getByLabel('E-mail').focus()
    await page.keyboard.type(DEMO.viewer)
    await page.keyboard.press('Tab')
    await page.keyboard.type(DEMO_PASSWORD)
    await page.keyboard.press('Enter')
    await expect(page).toHaveURL(/\/bench$/)
    await expect(page.getByTestId('workspace-switcher')).toContainText('Vector Lab')

    // The first Tab reaches the skip link, the next ones the header: each shows a focus ring.
    await page.keyboard.press('Tab')
    await expect(page.getByRole('link', { name: 'Skip to content' })).toBeFocused()
    await page.keyboard.press('Tab')
    await page.keyboard.press('Tab')
    const focused = page.locator(':focus')
    await expect(focused).toHaveText('Bench')
    expect(await focused.evaluate((el) => getComputedStyle(el).outlineStyle)).toBe('solid')
    await screenshot(page, 'focus-ring')
  })
})

test.describe('password reset by e-mail', () => {
  test('a new user resets a forgotten password through the link the admin Outbox shows', async ({ browser }) => {
    const email = `reset-${Date.now()}@vector-lab.test`
    const user = await browser.newPage()
    await user.goto('/signup')
    await user.getByLabel('Name').fill('Rita Reset')
    await user.getByLabel('E-mail').fill(email)
    await user.getByLabel('Password', { exact: true }).fill('first-password-2026')
    await user.getByLabel('Password again').fill('first-password-2026')
    await user.getByRole('button', { name: 'Create account' }).click()
    await expect(user).toHaveURL(/\/bench$/)
    // Sign-up makes a personal workspace, so Save works from the first minute.
    await expect(user.getByTestId('workspace-switcher')).toContainText("Rita Reset's workspace")
    await expect(user.getByRole('button', { name: 'Save', exact: true })).toBeEnabled()
    await userMenu(user, 'Sign out')

    await user.getByRole('link', { name: 'Forgot your password?' }).click()
    // Both forms have an "E-mail" field: wait for the new page before typing.
    await expect(user.getByRole('heading', { name: 'Forgotten password' })).toBeVisible()
    await user.getByLabel('E-mail').fill(email)
    await user.getByRole('button', { name: 'Send the link' }).click()
    await expect(user.getByText('Check your e-mail')).toBeVisible()

    // The admin reads the sink in another context (no shared cookies) and passes the link on.
    const adminContext = await browser.newContext()
    const admin = await adminContext.newPage()
    await signIn(admin, DEMO.admin)
    await admin.getByRole('link', { name: 'Outbox' }).click()
    const message = admin.getByTestId('outbox-message').filter({ hasText: email }).first()
    await expect(message).toBeVisible()
    await screenshot(admin, 'outbox')
    const link = message.getByRole('link', { name: /\/reset\?token=/ })
    const href = await link.getAttribute('href')
    expect(href).toMatch(/\/reset\?token=[\w-]+/)
    await adminContext.close()

    await user.goto(new URL(href!).pathname + new URL(href!).search)
    await user.getByLabel('New password', { exact: true }).fill('second-password-2026')
    await user.getByLabel('New password again').fill('second-password-2026')
    await user.getByRole('button', { name: 'Change password' }).click()
    await expect(user).toHaveURL(/\/bench$/)
    await userMenu(user, 'Sign out')
    await expect(user.getByRole('heading', { name: 'Sign in' })).toBeVisible()

    await fillSignIn(user, email, 'second-password-2026')
    await expect(user).toHaveURL(/\/bench$/)
    await user.close()
  })
})
