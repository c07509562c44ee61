/**
 * `npm run bench:ui`: frames per second while panning the Lane chart of the
 * 1,000-instruction example (examples/long-stream.s) on 8 lanes, in Debian's
 * Chromium driven by Playwright (issue 5, "Benchmark"). Not a timed test: it
 * prints the figures.
 *
 * The probe page (e2e/fixtures/chart-probe.html) is built with Vite in
 * production mode and served by `vite preview`, so the figures are those of
 * shipped code. The page runs the example in the simulator Worker; then, for
 * each zoom level, a drag pans the plot back and forth for a few seconds, one
 * step every frame, while the page records requestAnimationFrame timestamps
 * (the Performance API clock). A frame the chart takes too long to draw shows
 * as a longer interval, and fewer frames a second.
 *
 * Options: --seconds N (per zoom level, default 4), --width N (viewport, default 1440).
 */
import { mkdirSync } from 'node:fs'
import path from 'node:path'
import type { Page } from '@playwright/test'
import { launchChromium, serveProbePage } from './browser'

const arg = (name: string, fallback: number) => {
  const i = process.argv.indexOf(`--${name}`)
  return i > 0 ? Number(process.argv[i + 1]) : fallback
}
const seconds = arg('seconds', 4)
const width = arg('width', 1440)
const outDir = path.resolve('.tmp/bench-ui-pan')

interface Sample {
  frames: number
  fps: number
  p95: number
  worst: number
  windows: number
}

/**
 * Drags the plot inside the page: a mousedown on the plot, then one mousemove
 * of 6 px on every animation frame (back and forth), as d3-zoom sees a real
 * drag. Driving it from the page makes every frame a pan; input sent from
 * Playwright arrives slower than frames and would leave most frames idle.
 * Returns the requestAnimationFrame timestamps' statistics.
 */
function recordWhilePanning(page: Page, ms: number): Promise<Sample> {
  // A string, not a function: the bundler's helpers for named functions do not exist in the page.
  return page.evaluate(`new Promise((resolve) => {
    const chart = document.querySelector('[data-testid="lane-chart"]')
    const plot = chart.querySelector('.lc-plot')
    const box = chart.querySelector('.lc-bars').getBoundingClientRect()
    const y = box.top + box.height / 2
    const x0 = box.left + box.width * 0.3
    const x1 = box.left + box.width * 0.7
    const frames = []
    const windows = new Set()
    let x = x0
    let dir = 1
    const opts = (cx) => ({ bubbles: true, cancelable: true, clientX: cx, clientY: y, button: 0, buttons: 1, view: window })
    plot.dispatchEvent(new MouseEvent('mousedown', opts(x)))
    const start = performance.now()
    const tick = (t) => {
      frames.push(t)
      windows.add(chart.getAttribute('data-window-start'))
      if (t - start > ${ms}) {
        window.dispatchEvent(new MouseEvent('mouseup', opts(x)))
        const gaps = frames.slice(1).map((v, i) => v - frames[i]).sort((a, b) => a - b)
        resolve({
          frames: frames.length,
          fps: ((frames.length - 1) / (frames[frames.length - 1] - frames[0])) * 1000,
          p95: gaps[Math.floor(gaps.length * 0.95)] ?? 0,
          worst: gaps[gaps.length - 1] ?? 0,
          windows: windows.size,
        })
        return
      }
      x += dir * 6
      if (x > x1 || x < x0) dir = -dir
      window.dispatchEvent(new MouseEvent('mousemove', opts(x)))
      requestAnimationFrame(tick)
    }
    requestAnimationFrame(tick)
  })`) as Promise<Sample>
}

async function main() {
  mkdirSync(outDir, { recursive: true })
  const probe = await serveProbePage('chart-probe', outDir)
  const browser = await launchChromium()
  try {
    const page = await browser.newPage({ viewport: { width, height: 900 } })
    await page.goto(`${probe.url}?example=long-stream&lanes=8`)
    await page.locator('#status').filter({ hasText: 'done' }).waitFor({ timeout: 60_000 })
    const chart = page.getByTestId('lane-chart')
    const bars = await chart.getAttribute('data-bars')
    const groups = await chart.getAttribute('data-bar-groups')
    const cycles = (await chart.getAttribute('aria-label'))?.match(/([\d,]+) cycles/)?.[1]
    console.log(`Lane chart frame rate: examples/long-stream.s, 1,000 instructions, 8 lanes, ${cycles} cycles, ${groups} bar groups, ${bars} bars, renderer ${await chart.getAttribute('data-renderer')}, plot ${Math.round((await page.locator('.lc-bars').boundingBox())!.width)} px wide`)
    // Zoom levels by key presses on the focused chart: each '+' narrows the window by 1.5.
    const levels: [string, number][] = [
      ['half the run in view', 2],
      ['an eighth of the run in view', 5],
      ['a 64th of the run in view', 10],
    ]
    let pressed = 0
    for (const [label, presses] of levels) {
      await chart.focus()
      await page.keyboard.press('0')
      pressed = 0
      while (pressed < presses) {
        await page.keyboard.press('+')
        pressed++
      }
      // Keep the pan inside the run: start from the middle.
      for (let i = 0; i < presses * 2; i++) await page.keyboard.press('ArrowRight')
      const s = await recordWhilePanning(page, seconds * 1000)
      const span = Number(await chart.getAttribute('data-window-end')) - Number(await chart.getAttribute('data-window-start'))
      console.log(`  ${label} (${Math.round(span).toLocaleString('en-US')} cycles): ${s.fps.toFixed(1)} frames/s, p95 frame ${s.p95.toFixed(1)} ms, worst ${s.worst.toFixed(1)} ms, ${s.frames} frames, ${s.windows} distinct windows`)
    }
  } finally {
    await browser.close()
    await probe.close()
  }
}

main().catch((e) => {
  console.error(e)
  process.exit(1)
})
