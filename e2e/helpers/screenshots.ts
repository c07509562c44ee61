import fs from 'node:fs'
import path from 'node:path'
import type { Page } from '@playwright/test'

/** Playwright empties test-results/ on every run; screenshots to look at go to the git-ignored .screenshots/. */
export const SCREENSHOT_DIR = path.resolve('.screenshots')

export async function screenshot(page: Page, name: string) {
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true })
  // animations: 'disabled' ends Naive UI's colour fades, so a theme switch is shown as it settles.
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true, animations: 'disabled' })
}
