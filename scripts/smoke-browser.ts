/**
 * A first look as a new user would take it, in Debian's Chromium: the app at
 * BASE_URL (first argument) shows the sign-in page, the demo owner signs in,
 * the Bench draws its Lane chart, Scenarios lists the demo scenarios and the
 * printed share link (second argument, optional) opens signed out.
 * Used by `npm run check:fresh` against the first `npm start` of a fresh clone.
 * Exits 1 with what it saw when a step fails; leaves a screenshot in .tmp/.
 */
import fs from 'node:fs'
import path from 'node:path'
import type { Page } from '@playwright/test'
import { launchChromium } from './bench/browser'
import { DEMO_PASSWORD, DEMO_USERS } from '../server/services/demo-seed'

const [baseUrl, shareUrl] = process.argv.slice(2)
if (!baseUrl) {
  console.error('usage: tsx scripts/smoke-browser.ts BASE_URL [SHARE_URL]')
  process.exit(2)
}

const shots = path.resolve('.tmp/smoke')
fs.mkdirSync(shots, { recursive: true })

async function step(page: Page, what: string, work: () => Promise<void>): Promise<void> {
  try {
    await work()
    console.log(`smoke: ok: ${what}`)
  } catch (err) {
    await page.screenshot({ path: path.join(shots, 'failed.png') }).catch(() => undefined)
    throw new Error(`${what}: ${err instanceof Error ? err.message : String(err)} (screenshot in ${shots})`, { cause: err })
  }
}

const browser = await launchChromium()
try {
  const page = await browser.newPage({ viewport: { width: 1440, height: 900 } })
  const owner = DEMO_USERS.find((u) => u.workspace === 'owner')?.email ?? ''
  await step(page, 'GET / shows the sign-in page', async () => {
    await page.goto(baseUrl, { waitUntil: 'domcontentloaded' })
    await page.getByLabel('E-mail').waitFor({ timeout: 30_000 })
  })
  await step(page, `${owner} signs in and the Bench draws the Lane chart`, async () => {
    await page.getByLabel('E-mail').fill(owner)
    await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD)
    await page.getByRole('button', { name: 'Sign in' }).click()
    await page.getByTestId('user-menu').waitFor({ timeout: 30_000 })
    await page.goto(`${baseUrl}/bench`)
    await page.getByTestId('lane-chart').waitFor({ timeout: 60_000 })
    await page.screenshot({ path: path.join(shots, 'bench.png') })
  })
  await step(page, 'Scenarios lists the demo scenarios', async () => {
    await page.goto(`${baseUrl}/scenarios`)
    // The demo workspace holds the examples and the kernel suite: more than one
    // screen, so find the example the way a user would, by searching.
    await page.getByLabel('Search scenarios').fill('ragged tail')
    await page.getByText('saxpy with a ragged tail').first().waitFor({ timeout: 30_000 })
    await page.screenshot({ path: path.join(shots, 'scenarios.png') })
  })
  if (shareUrl) {
    const guest = await browser.newPage({ viewport: { width: 1440, height: 900 } })
    await step(guest, 'the printed share link opens signed out', async () => {
      await guest.goto(shareUrl)
      await guest.getByTestId('lane-chart').waitFor({ timeout: 60_000 })
    })
  }
} finally {
  await browser.close()
}
