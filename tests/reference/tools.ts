/**
 * The Debian reference tools a check runs (GNU binutils, QEMU, clang-16).
 * Locally a missing tool skips its check with a loud warning; under CI=true it
 * fails the run, since the test script installs them and a reference check
 * that silently did not run must not pass CI.
 */
import { execFileSync } from 'node:child_process'

/** The tools of `tools` that do not answer `--version` (not on PATH). */
export function missingTools(tools: readonly string[]): string[] {
  return tools.filter((tool) => {
    try {
      execFileSync(tool, ['--version'], { stdio: 'ignore' })
      return false
    } catch {
      return true
    }
  })
}

/**
 * True when every tool is present. Otherwise throws under CI, and elsewhere
 * warns that `check` is skipped and how to install the tools
 * (`scripts/ensure-tools.sh` with `groups`).
 */
export function referenceToolsPresent(check: string, tools: readonly string[], groups: string): boolean {
  const missing = missingTools(tools)
  if (missing.length === 0) return true
  const msg = `${missing.join(', ')} missing: install with \`bash scripts/ensure-tools.sh ${groups}\``
  if (process.env.CI === 'true') throw new Error(`CI: ${msg}`)
  console.warn(`\n!!!!! SKIPPING ${check}: ${msg} !!!!!\n`)
  return false
}
