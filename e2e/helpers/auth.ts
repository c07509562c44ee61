import { expect, type Page } from '@playwright/test'

/** The demo seed of issue 2 (server/services/demo-seed.ts): one password for every demo user. */
export const DEMO_PASSWORD = 'chimeline-demo-2026'
export const DEMO = {
  owner: 'owner@vector-lab.test',
  editor: 'editor@vector-lab.test',
  viewer: 'viewer@vector-lab.test',
  admin: 'admin@vector-lab.test',
} as const

/** Fills and sends the sign-in form on the current page (which must be /signin). */
export async function fillSignIn(page: Page, email: string, password: string) {
  await page.getByLabel('E-mail').fill(email)
  await page.getByLabel('Password', { exact: true }).fill(password)
  await page.getByRole('button', { name: 'Sign in' }).click()
}

/**
 * Opens /signin, signs in and waits for the signed-in shell and for the
 * redirect away from /signin: the user menu shows as soon as the session is
 * set, before the router has loaded the next page, so a test that clicks at
 * once would race that redirect.
 */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/signin')
  await fillSignIn(page, email, password)
  await expect(page.getByTestId('user-menu')).toBeVisible()
  await expect(page).not.toHaveURL(/\/signin(\?|$)/)
}

/** Picks an entry of the user menu (a Naive UI dropdown) by its label. */
export async function userMenu(page: Page, item: string) {
  await page.getByTestId('user-menu').click()
  await page.getByRole('menuitem', { name: item }).or(page.locator('.n-dropdown-option', { hasText: item })).first().click()
}

/**
 * Collects console errors and uncaught exceptions, so a test can assert the page
 * stayed clean. A signed-out page load asks POST /api/auth/refresh for a
 * session; without a cookie the answer is 200 `{ user: null }`, so that needs
 * no exception here.
 */
export function watchConsole(page: Page): string[] {
  const problems: string[] = []
  page.on('console', (msg) => {
    if (msg.type() !== 'error') return
    problems.push(`console: ${msg.text()} (${msg.location().url})`)
  })
  page.on('pageerror', (err) => problems.push(`page error: ${err.message}`))
  return problems
}
