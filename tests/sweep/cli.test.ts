/**
 * The `npm run -s sweep` command line, run as a child process the way a user
 * runs it: exit 2 for usage errors, 1 when a limit stopped the sweep or every
 * point failed, 0 otherwise (failed points are rows). Its figures are those of
 * a single run of the same point (checked against runPipeline here).
 */
import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { parse } from 'csv-parse/sync'
import { describe, expect, it } from 'vitest'
import { runPipeline } from '../../shared/sim/run'
import { figuresOf } from '../../shared/sweep/figures'
import { withSymbols } from '../../shared/sweep/symbols'
import { FMA_CURVE } from './programs'

const root = join(import.meta.dirname, '..', '..')
const tmp = mkdtempSync(join(tmpdir(), 'chimeline-sweep-'))
const fma = join(tmp, 'fma.s')
writeFileSync(fma, FMA_CURVE)

function sweep(...args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/sweep.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 120_000 })
  return { code: r.status, stdout: r.stdout, stderr: r.stderr }
}

describe('sweep usage errors exit with code 2 and one line on stderr', () => {
  it.each([
    ['no --vary', [fma], /give at least one --vary PATH=SPEC/],
    ['a --vary without =', [fma, '--vary', 'AVL'], /--vary expects PATH=SPEC/],
    ['a bad range', [fma, '--vary', 'AVL=9..1'], /AVL: "9\.\.1": the range ends \(1\) before it starts \(9\)/],
    ['a value out of range', [fma, '--vary', 'lanes=32..96:32'], /lanes=96: 96 is outside the range 1\.\.64/],
    ['an unknown symbol', [fma, '--vary', 'N=1,2'], /"N" is neither a machine field nor a program symbol/],
    ['an unknown format', [fma, '--vary', 'AVL=1', '--format', 'xml'], /--format must be one of csv, json \(got "xml"\)/],
    ['a bad worker count', [fma, '--vary', 'AVL=1', '--workers', '0'], /--workers takes a whole number from 1 to 256 \(got "0"\)/],
    ['a bad --set', [fma, '--vary', 'AVL=1', '--set', 'lanes=0'], /machine\.lanes|lanes: 0 is outside the range 1\.\.64/],
  ])('%s', (_what, args, message) => {
    const r = sweep(...args)
    expect(r.stderr).toMatch(message)
    expect(r.code).toBe(2)
    expect(r.stderr.trimEnd().split('\n')).toHaveLength(1)
    expect(r.stdout).toBe('')
  })
})

describe('sweep output', () => {
  it('writes one CSV row per point, the first --vary slowest, with the figures of a single run of that point', () => {
    const r = sweep(fma, '--set', 'lanes=4', '--vary', 'issue=serial,staggered', '--vary', 'AVL=7,8', '--workers', '2')
    expect(r.stderr).toBe('')
    expect(r.code).toBe(0)
    const rows = parse(r.stdout, { columns: true }) as Record<string, string>[]
    expect(rows.map((row) => [row.issue, row.AVL])).toEqual([
      ['serial', '7'],
      ['serial', '8'],
      ['staggered', '7'],
      ['staggered', '8'],
    ])
    const single = runPipeline({ program: withSymbols(FMA_CURVE, new Map([['AVL', 8]])), machine: { lanes: 4, issue: 'staggered' } })
    if (!single.ok) throw new Error(single.error.message)
    const f = figuresOf(single.trace.metrics)
    expect(rows[3]).toMatchObject({ cycles: String(f.cycles), flops: String(f.flops), flopsPerCycle: String(f.flopsPerCycle), laneBusyMin: String(f.laneBusyMin), 'stall.bank': String(f.stalls.bank), status: 'ok', error: '' })
  })

  it('keeps failed points as rows and exits 1 when every point failed', () => {
    const broken = join(tmp, 'broken.s')
    writeFileSync(broken, '    .equ AVL, 4\n    li a0, AVL\n    vsetvli t0, a0, e64, m2, ta, ma\n    vfrob.vv v8, v8, v8\n')
    const r = sweep(broken, '--vary', 'AVL=1,2', '--format', 'json', '--workers', '1')
    expect(r.code).toBe(1)
    expect(r.stderr).toMatch(/^sweep: every point failed; the first at assemble: line 4, column 5: /)
    const out = JSON.parse(r.stdout) as { points: { status: string; error: { stage: string } }[] }
    expect(out.points.map((p) => [p.status, p.error.stage])).toEqual([
      ['failed', 'assemble'],
      ['failed', 'assemble'],
    ])
  })

  it('stops at --max-points with exit 1 and writes the points done', () => {
    const r = sweep(fma, '--vary', 'AVL=1..3', '--max-points', '2', '--workers', '1')
    expect(r.code).toBe(1)
    expect(r.stderr).toBe('sweep: the grid has 3 points, over the limit of 2 points a sweep; the first 2 were run\n')
    expect(r.stdout.trimEnd().split('\r\n')).toHaveLength(3)
  })
})
