/**
 * The `npm run -s sim` command line, run as a child process the way a user
 * runs it. Exit codes (issue 4): 2 for a usage error, 1 for a program or model
 * error, 0 otherwise; every error is one line on stderr.
 */
import { spawnSync } from 'node:child_process'
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { parse } from 'csv-parse/sync'
import { parseVcd } from '../sim/trace/vcdReader'
import { traceJsonSchema } from '../../shared/sim/trace/schema'
import { elementSum, machine as fpMachine, machineSum, program as fpProgram } from '../sim/fpOrderFixture'

const root = join(import.meta.dirname, '..', '..')
const examples = readdirSync(join(root, 'examples')).filter((f) => f.endsWith('.s')).sort()
const tmp = mkdtempSync(join(tmpdir(), 'chimeline-cli-'))

function sim(...args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/sim.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000, maxBuffer: 256 * 1024 * 1024 })
  return { code: r.status, stdout: r.stdout, stderr: r.stderr }
}

function file(name: string, text: string): string {
  const path = join(tmp, name)
  writeFileSync(path, text)
  return path
}

const expectOneLine = (stderr: string) => expect(stderr.trimEnd().split('\n')).toHaveLength(1)

describe('sim usage errors exit with code 2 and one line on stderr', () => {
  it.each([
    ['no program file', [], /no program file given/],
    ['two program files', ['a.s', 'b.s'], /one program file expected, got 2/],
    ['an unknown option', ['examples/dot.s', '--lanes', '4'], /lanes/],
    ['an unknown format', ['examples/dot.s', '--format', 'xml'], /--format must be one of summary, json, csv, vcd \(got "xml"\)/],
    ['a --set without =', ['examples/dot.s', '--set', 'lanes'], /--set expects path=value/],
    ['an unknown machine field', ['examples/dot.s', '--set', 'lane=4'], /unknown machine field "lane"/],
    ['an unknown nested field', ['examples/dot.s', '--set', 'units.fpu.depth=4'], /unknown machine field "units.fpu.depth" \(fields of units.fpu: latency\)/],
    ['a group set as a value', ['examples/dot.s', '--set', 'units.fpu=4'], /"units.fpu" is a group of fields/],
    ['lanes out of range', ['examples/dot.s', '--set', 'lanes=99'], /lanes: 99 is outside the range 1\.\.64/],
    ['a latency out of range', ['examples/dot.s', '--set', 'units.fpu.latency=0'], /units\.fpu\.latency: 0 is outside the range 1\.\.32/],
    ['an issue policy that does not exist', ['examples/dot.s', '--set', 'issue=eager'], /issue: "eager" is not one of serial, lockstep, staggered/],
    ['vlen too small for the lanes', ['examples/dot.s', '--set', 'lanes=64', '--set', 'vlen=1024'], /vlen: .*at least 64 x lanes = 4096/],
    ['a missing program file', ['examples/none.s'], /cannot read program examples\/none\.s: ENOENT/],
    ['an unknown preset', ['examples/dot.s', '--preset', 'huge'], /unknown preset "huge"/],
    ['a config file that is not JSON', ['examples/dot.s', '--config', file('bad.json', '{lanes: 4')], /is not JSON/],
    ['a config file with a bad field', ['examples/dot.s', '--config', file('lanes.json', '{"lanes": 0}')], /lanes: 0 is outside the range/],
    ['an unknown FP reduction order', ['examples/dot.s', '--fp-order', 'tree'], /--fp-order must be one of element, machine \(got "tree"\)/],
    ['a malformed --dump', ['examples/dot.s', '--dump', 'result:eight:f64'], /COUNT 'eight' must be a positive integer/],
    ['--dump with a format other than summary', ['examples/dot.s', '--dump', 'result:1:f64', '--format', 'csv'], /--dump adds data to the summary; it cannot be used with --format csv/],
    ['--dump of a label the program lacks', ['examples/dot.s', '--dump', 'nowhere:1:f64'], /no label 'nowhere'/],
  ])('%s', (_what, args, message) => {
    const r = sim(...args)
    expect(r.code).toBe(2)
    expectOneLine(r.stderr)
    expect(r.stderr).toMatch(message)
    expect(r.stdout).toBe('')
  })
})

describe('sim program errors exit with code 1', () => {
  it('names the line and column of an assembly error', () => {
    const r = sim(file('typo.s', 'vsetvli t0, a0, e64, m1, ta, ma\nvfadd.vv v1, v2\n'))
    expect(r.code).toBe(1)
    expectOneLine(r.stderr)
    expect(r.stderr).toMatch(/typo\.s: assemble: line 2, column \d+: /)
  })

  it('reports an execution error with its line', () => {
    // A load far outside the data segment (RISC-V: ld from address 0x7fff0000).
    const r = sim(file('wild.s', 'li a0, 0x7fff0000\nld a1, 0(a0)\n'))
    expect(r.code).toBe(1)
    expectOneLine(r.stderr)
    expect(r.stderr).toMatch(/wild\.s: execute: line 2, column \d+: /)
  })
})

describe('sim runs every shipped example', () => {
  it.each(examples)('%s gives a summary with cycles, metrics and per-lane times', (name) => {
    const r = sim(`examples/${name}`)
    expect(r.stderr).toBe('')
    expect(r.code).toBe(0)
    const s = JSON.parse(r.stdout)
    expect(s.cycles).toBeGreaterThan(0)
    expect(Object.keys(s.metrics)).toEqual(expect.arrayContaining(['cycles', 'flops', 'flopsPerCycle', 'peakFlopsPerCycle', 'stallCycles']))
    expect(s.instructions.length).toBeGreaterThan(0)
    expect(Object.keys(s.instructions[0])).toEqual(expect.arrayContaining(['index', 'text', 'vl', 'sew', 'lanes']))
    expect(s.instructions[0].lanes).toHaveLength(8)
    expect(Object.keys(s.instructions[0].lanes[0])).toEqual(['lane', 'elements', 'beats', 'readStart', 'readEnd', 'execStart', 'execEnd', 'writeStart', 'writeEnd'])
  })
})

describe('sim options', () => {
  it('applies --preset, then --config, then each --set', () => {
    const config = file('machine.json', JSON.stringify({ lanes: 2, units: { fpu: { latency: 7 } } }))
    const r = sim('examples/saxpy.s', '--preset', 'Starter 4-lane', '--config', config, '--set', 'lanes=4', '--format', 'json')
    expect(r.code).toBe(0)
    const j = traceJsonSchema.parse(JSON.parse(r.stdout))
    expect(j.instructions[0]!.lanes).toHaveLength(4)
    expect(j.machine.lanes).toBe(4)
    expect(j.machine.units.fpu.latency).toBe(7)
  })

  it('writes --format csv to --out, one row per instruction and lane', () => {
    const out = join(tmp, 'saxpy.csv')
    const r = sim('examples/saxpy.s', '--set', 'lanes=4', '--format', 'csv', '--out', out)
    expect(r.code).toBe(0)
    expect(r.stdout).toBe('')
    const rows: string[][] = parse(readFileSync(out, 'utf8'))
    expect((rows.length - 1) % 4).toBe(0)
    expect(rows[0]!.slice(0, 2)).toEqual(['index', 'text'])
  })

  it('writes a VCD that the grammar-based reader accepts, one lane scope per lane', () => {
    const r = sim('examples/stencil.s', '--set', 'lanes=2', '--format', 'vcd')
    expect(r.code).toBe(0)
    const f = parseVcd(r.stdout)
    expect(new Set(f.vars.map((v) => v.scope.join('.')))).toEqual(new Set(['chimeline.lane0', 'chimeline.lane1']))
  })
})

describe('sim --fp-order', () => {
  // Expected sums computed in tests/sim/fpOrderFixture.ts with Math.fround (IEEE 754 binary32, round to nearest even).
  const prog = file('fp-order.s', fpProgram)
  const config = file('fp-order.json', JSON.stringify(fpMachine))
  const sumWith = (...extra: string[]) => {
    const r = sim(prog, '--config', config, '--dump', 'sum:1:f32', ...extra)
    expect(r.stderr).toBe('')
    expect(r.code).toBe(0)
    return JSON.parse(r.stdout).dumps['sum:f32'][0]
  }

  it.each([
    ['element order by default, as QEMU', [], elementSum],
    ['element order with --fp-order element', ['--fp-order', 'element'], elementSum],
    ["this machine's order with --fp-order machine", ['--fp-order', 'machine'], machineSum],
  ])('sums vfredusum in %s', (_what, extra, expected) => {
    expect(sumWith(...extra)).toBe(expected)
  })

  it('gives different sums for the two orders on this program (16777216 vs 16777218)', () => {
    expect(sumWith('--fp-order', 'machine')).not.toBe(sumWith())
  })
})
