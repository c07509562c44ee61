/**
 * What the browser benchmarks and the fresh-clone smoke check share: Debian's
 * Chromium launched headless with the flags this closed network needs, and a
 * probe page (e2e/fixtures/*.html) built in production mode and served by
 * `vite preview`, so figures are those of shipped code.
 */
import path from 'node:path'
import { chromium, type Browser } from '@playwright/test'
import { build, preview } from 'vite'

/** Without the background-networking flags Chromium keeps calling out of a closed network. */
const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync']

export function launchChromium(): Promise<Browser> {
  return chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: CHROMIUM_ARGS })
}

/** Builds `e2e/fixtures/<name>.html` into outDir and serves it; `url` is the page's address. */
export async function serveProbePage(name: string, outDir: string): Promise<{ url: string; close: () => Promise<void> }> {
  await build({
    configFile: 'vite.config.ts',
    logLevel: 'error',
    // The probe page lives in e2e/fixtures; a root-relative input keeps its path in the output.
    build: { outDir, emptyOutDir: true, rollupOptions: { input: { probe: path.resolve(`e2e/fixtures/${name}.html`) } } },
  })
  const server = await preview({ configFile: 'vite.config.ts', logLevel: 'error', build: { outDir }, preview: { port: 0, host: '127.0.0.1' } })
  const address = server.httpServer.address()
  if (!address || typeof address === 'string') throw new Error('the preview server did not start')
  return {
    url: `http://127.0.0.1:${address.port}/e2e/fixtures/${name}.html`,
    close: () => new Promise<void>((resolve) => server.httpServer.close(() => resolve())),
  }
}
