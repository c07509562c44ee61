/**
 * `chimeline report` as a child process, the way the README's figure is made:
 * the shipped kernel suite's bundle (scripts/kernel-suite-bundle.ts) on two
 * presets as CSV an RFC 4180 reader (csv-parse) reads back; bad input exits 2.
 */
import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { parse } from 'csv-parse/sync'
import { describe, expect, it } from 'vitest'
import { KERNELS } from '../../server/services/demo-kernels'

const root = join(import.meta.dirname, '..', '..')
const tmp = mkdtempSync(join(tmpdir(), 'chimeline-report-'))
const run = (cmd: string[]) => spawnSync(process.execPath, cmd, { cwd: root, encoding: 'utf8', timeout: 300_000 })

describe('chimeline report', () => {
  it('tables the kernel suite on two presets with the ratio per kernel', () => {
    const bundle = run(['--import', 'tsx', 'scripts/kernel-suite-bundle.ts'])
    expect(bundle.status).toBe(0)
    const file = join(tmp, 'kernels.json')
    writeFileSync(file, bundle.stdout)
    const r = run(['bin/chimeline.js', 'report', file, '--preset', 'default-8', '--preset', 'Wide 16-lane', '--format', 'csv'])
    expect(r.stderr).toBe('')
    expect(r.status).toBe(0)
    const rows = parse(r.stdout, { record_delimiter: '\r\n' }) as string[][]
    expect(rows[0]?.slice(0, 2)).toEqual(['kernel', 'Default 8-lane cycles'])
    expect(rows[0]?.at(-1)).toBe('ratio of cycles')
    expect(rows.slice(1, -1).map((x) => x[0])).toEqual(KERNELS.map((k) => k.title))
    // The ratio column is the first machine's cycles over the second's.
    for (const row of rows.slice(1, -1)) expect(Number(row.at(-1))).toBeCloseTo(Number(row[1]) / Number(row[10]), 2)
  }, 300_000)

  it('exits 2 on an unknown preset or format', () => {
    const file = join(tmp, 'none.json')
    writeFileSync(file, '{}')
    expect(run(['bin/chimeline.js', 'report', file, '--preset', 'nope']).status).toBe(2)
    const bad = run(['bin/chimeline.js', 'report', file, '--format', 'pdf'])
    expect(bad.status).toBe(2)
    expect(bad.stderr).toBe('chimeline report: --format is md or csv, got "pdf"\n')
  })
})
