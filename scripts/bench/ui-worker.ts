/**
 * `npm run bench:ui-worker`: how responsive the page stays while the simulator
 * Worker runs the 1,000-instruction example on one lane three times (each
 * instruction 256 beats long). Not a timed test: it prints the figures the
 * probe page measures itself, the longest wait of an input event for the main
 * thread (event creation to handler) and the longest lateness of its own 10 ms
 * timer, while Playwright clicks and types as fast as it can. Target: both under
 * 100 ms. The e2e test (e2e/worker.spec.ts) checks only order and progress.
 *
 * The probe page (e2e/fixtures/worker-probe.html) is built with Vite in
 * production mode and served by `vite preview`, as `npm run bench:ui` does.
 */
import { mkdirSync } from 'node:fs'
import path from 'node:path'
import { launchChromium, serveProbePage } from './browser'

const outDir = path.resolve('.tmp/bench-ui-worker')

async function main() {
  mkdirSync(outDir, { recursive: true })
  const probe = await serveProbePage('worker-probe', outDir)
  const browser = await launchChromium()
  try {
    const page = await browser.newPage()
    await page.goto(`${probe.url}?lanes=1&repeat=3`)
    await page.locator('#status').filter({ hasText: 'idle' }).waitFor()
    await page.click('#run')
    let interactions = 0
    while ((await page.locator('#status').textContent()) === 'running') {
      await page.click('#count')
      await page.locator('#echo').press('End')
      await page.keyboard.press('x')
      interactions++
    }
    await page.locator('#status').filter({ hasText: 'done' }).waitFor({ timeout: 300_000 })
    const load = (await import('node:os')).loadavg()[0]?.toFixed(2)
    console.log(`Page responsiveness while the Worker runs examples/long-stream.s on 1 lane x 3 (${await page.locator('#cycles').textContent()} cycles), load average ${load}:`)
    console.log(`  ${interactions} click + key press pairs; longest input delay ${await page.locator('#max-input-delay').textContent()} ms, longest timer lateness ${await page.locator('#max-gap').textContent()} ms (target: under 100 ms each)`)
  } finally {
    await browser.close()
    await probe.close()
  }
}

main().catch((e) => {
  console.error(e)
  process.exit(1)
})
