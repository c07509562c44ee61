/**
 * `chimeline check`, run as a child process through the package's bin
 * launcher the way a team's CI runs it: one line per expectation, JUnit XML,
 * exit 0 / 1 / 2. The figures are the closed form of one vfadd.vv worked out
 * in tests/expectations/evaluate.test.ts (handbook timing-model.md section 5):
 * on the default machine (8 lanes, FPU latency 4) it takes 16 cycles; with
 * units.fpu.latency=8 the closed form gives c0 + b + D + 2 = 2 + 8 + 8 + 2 = 20.
 */
import { spawnSync } from 'node:child_process'
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { Window } from 'happy-dom'
import { describe, expect, it } from 'vitest'
import { scenarioContentSchema } from '../../shared/schemas/scenario'

const root = join(import.meta.dirname, '..', '..')
const tmp = mkdtempSync(join(tmpdir(), 'chimeline-check-'))

const VFADD = '  li a0, 64\n  vsetvli t0, a0, e64, m1, ta, ma\n  vfadd.vv v3, v1, v2\n'

function bundleText(scenarios: { title: string; program: string; expectations: unknown[] }[]): string {
  const versions = (s: (typeof scenarios)[number]) => [
    { number: 1, message: '', author: 'Vera', createdAt: '2026-12-03T10:00:00.000Z', content: scenarioContentSchema.parse({ title: s.title, program: s.program }), run: { status: 'failed', stage: 'assemble', code: 'x', message: 'x' } },
    { number: 2, message: 'Add checks', author: 'Vera', createdAt: '2026-12-03T11:00:00.000Z', content: { ...scenarioContentSchema.parse({ title: s.title, program: s.program }), expectations: s.expectations }, run: { status: 'failed', stage: 'assemble', code: 'x', message: 'x' } },
  ]
  return JSON.stringify({ format: 'chimeline-scenario-bundle', formatVersion: 1, exportedAt: '2026-12-03T12:00:00.000Z', scenarios: scenarios.map((s) => ({ versions: versions(s) })) }, null, 2)
}

function write(name: string, text: string): string {
  const file = join(tmp, name)
  writeFileSync(file, text)
  return file
}

function check(...args: string[]) {
  const r = spawnSync(process.execPath, ['bin/chimeline.js', 'check', ...args], { cwd: root, encoding: 'utf8', timeout: 120_000 })
  return { code: r.status, stdout: r.stdout, stderr: r.stderr }
}

const good = write(
  'good.json',
  bundleText([
    {
      title: 'One vfadd',
      program: VFADD,
      expectations: [
        { kind: 'metric', metric: 'cycles', op: '<=', value: 16 },
        { kind: 'stall', reason: 'bank', op: '==', value: 0 },
        { kind: 'phase', lane: 3, instruction: 1, field: 'writeEnd', op: '==', value: 15 },
      ],
    },
    { title: 'Negative case', program: 'vfoo.vv v1, v2, v3\n', expectations: [{ kind: 'fails', stage: 'assemble' }] },
  ]),
)

describe('chimeline check', () => {
  it('prints one line per expectation, writes JUnit XML and exits 0 when all pass', () => {
    const junit = join(tmp, 'pass.xml')
    const r = check(good, '--junit', junit)
    expect(r.stderr).toBe('')
    expect(r.code).toBe(0)
    expect(r.stdout.trimEnd().split('\n')).toEqual([
      'PASS  One vfadd › cycles <= 16 (measured 16)',
      'PASS  One vfadd › stall.bank == 0 (measured 0)',
      'PASS  One vfadd › lane 3, instruction 1, writeEnd == 15 (measured 15)',
      'PASS  Negative case › run fails at stage assemble (measured fails at stage assemble (unknown-mnemonic))',
      '4 expectations in 2 scenarios: 4 passed, 0 failed (model estimates, not sign-off for silicon)',
    ])
    // Read back with an XML parser that is not ours (happy-dom's DOMParser).
    const doc = new new Window().DOMParser().parseFromString(readFileSync(junit, 'utf8'), 'application/xml')
    expect(doc.documentElement.getAttribute('tests')).toBe('4')
    expect(doc.documentElement.getAttribute('failures')).toBe('0')
    expect([...doc.querySelectorAll('testcase')].map((t) => t.getAttribute('name'))).toContain('cycles <= 16')
  })

  it('exits 1 when a machine change breaks one, naming the deciding cycle, in the output and the JUnit failure', () => {
    const junit = join(tmp, 'fail.xml')
    const r = check(good, '--set', 'units.fpu.latency=8', '--junit', junit)
    expect(r.code).toBe(1)
    const lines = r.stdout.trimEnd().split('\n')
    // Last busy cycle 19 (cycles count from 0); lane 0 is the first lane found writing in it.
    expect(lines[0]).toBe('FAIL  One vfadd › cycles <= 16 (measured 20; cycle 19, lane 0, instruction 1)')
    expect(lines[2]).toBe('FAIL  One vfadd › lane 3, instruction 1, writeEnd == 15 (measured 19; cycle 19, lane 3, instruction 1)')
    expect(lines.at(-1)).toBe('4 expectations in 2 scenarios on units.fpu.latency=8: 2 passed, 2 failed (model estimates, not sign-off for silicon)')
    const doc = new new Window().DOMParser().parseFromString(readFileSync(junit, 'utf8'), 'application/xml')
    const failures = [...doc.querySelectorAll('failure')]
    expect(failures).toHaveLength(2)
    expect(failures[0]!.getAttribute('message')).toBe('measured 20')
    expect(failures[0]!.textContent).toContain('decided at cycle 19, lane 0, instruction 1')
  })

  it('checks on a preset instead of the scenario\'s machine', () => {
    // "Starter 4-lane": 4 lanes give b = 64 / 4 = 16 beats: cycles 2 + 16 + D + 2 > 16 for any latency.
    const r = check(good, '--preset', 'Starter 4-lane')
    expect(r.code).toBe(1)
    expect(r.stdout).toMatch(/^FAIL {2}One vfadd › cycles <= 16 \(measured \d+;/m)
  })

  it.each([
    ['no bundle', [], /no bundle file given; usage: chimeline check BUNDLE\.json/],
    ['an unknown option', [good, '--junt', 'x.xml'], /Unknown option '--junt'/],
    ['a missing file', [join(tmp, 'none.json')], /cannot read bundle .*none\.json: ENOENT/],
    ['an unknown preset', [good, '--preset', 'huge'], /unknown preset "huge" \(presets: /],
    ['an unknown machine field', [good, '--set', 'lane=4'], /--set lane=4: unknown machine field "lane"/],
    ['a machine field out of range', [good, '--set', 'lanes=0'], /machine field lanes: 0 is outside the range 1\.\.64/],
  ])('exits 2 on %s, with one line on stderr', (_what, args, message) => {
    const r = check(...args)
    expect(r.stderr).toMatch(message)
    expect(r.stderr.trimEnd().split('\n')).toHaveLength(1)
    expect(r.code).toBe(2)
  })

  it('names the file, line, column and field of a bad claim in the bundle', () => {
    const text = bundleText([{ title: 'Bad', program: VFADD, expectations: [{ kind: 'metric', metric: 'cycles', op: '=<', value: 16 }] }])
    const file = write('bad-claim.json', text)
    const line = text.split('\n').findIndex((l) => l.includes('"=<"')) + 1
    const r = check(file)
    expect(r.code).toBe(2)
    expect(r.stderr).toMatch(new RegExp(`${file.replace(/[.\\/]/g, '\\$&')}:${line}:\\d+: scenarios\\.0\\.versions\\.1\\.content\\.expectations\\.0\\.op: The operator is one of == != < <= > >=`))
  })

  it('names the line and column where a bundle stops being JSON', () => {
    const file = write('broken.json', '{\n  "format": "chimeline-scenario-bundle",\n  "scenarios": [,]\n}\n')
    const r = check(file)
    expect(r.code).toBe(2)
    expect(r.stderr).toBe(`chimeline check: ${file}:3:17: not JSON: Unexpected token ','\n`)
  })
})
