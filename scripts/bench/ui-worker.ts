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
import { chromium } from '@playwright/test'
import { build, preview } from 'vite'

const outDir = path.resolve('.tmp/bench-ui-worker')

async function main() {
  mkdirSync(outDir, { recursive: true })
  await build({
    configFile: 'vite.config.ts',
    logLevel: 'error',
    build: { outDir, emptyOutDir: true, rollupOptions: { input: { probe: path.resolve('e2e/fixtures/worker-probe.html') } } },
  })
  const server = await preview({ configFile: 'vite.config.ts', logLevel: 'error', build: { outDir }, preview: { port: 0, host: '127.0.0.1' } })
  const address = server.httpServer.address()
  if (!address || typeof address === 'string') throw new Error('the preview server did not start')
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking'],
  })
  try {
    const page = await browser.newPage()
    await page.goto(`http://127.0.0.1:${address.port}/e2e/fixtures/worker-probe.html?lanes=1&repeat=3`)
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
    await new Promise<void>((resolve) => server.httpServer.close(() => resolve()))
  }
}

main().catch((e) => {
  console.error(e)
  process.exit(1)
})
