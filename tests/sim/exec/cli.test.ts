/** `npm run -s sim:exec`: dumps by type, and one-line errors with exit codes 2 (usage) and 1 (program). */
import { execFileSync, spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { runExecCli } from '../../../server/cli/exec'

const dir = mkdtempSync(join(tmpdir(), 'chimeline-exec-cli-'))
const file = join(dir, 'prog.s')
writeFileSync(file, `
  .data
  .balign 8
b: .byte -1, 2, 200, 4
h: .half -2, 65535
w: .word -3, 4000000000
d: .dword -9223372036854775808, 18446744073709551615
f: .float 1.5, -0.0
g: .double 0.1, nan
out: .zero 16
  .text
  li a0, 3
  vsetvli t0, a0, e32, m1
  la a1, w
  vle32.v v1, (a1)
  la a2, out
  vse32.v v1, (a2)
`)
const bad = join(dir, 'bad.s')
writeFileSync(bad, '  nop\n  vadd.vv v1, v2, v3\n')

const json = (argv: string[]) => {
  const r = runExecCli(argv)
  expect(r.code, r.stderr).toBe(0)
  return JSON.parse(r.stdout)
}

describe('sim:exec --dump LABEL:COUNT:TYPE', () => {
  it.each([
    { spec: 'b:4:i8', values: [-1, 2, -56, 4] },
    { spec: 'b:4:u8', values: [255, 2, 200, 4] },
    { spec: 'h:2:i16', values: [-2, -1] },
    { spec: 'h:2:u16', values: [65534, 65535] },
    { spec: 'w:2:i32', values: [-3, -294967296] },
    { spec: 'w:2:u32', values: [4294967293, 4000000000] },
    { spec: 'd:2:i64', values: ['-9223372036854775808', '-1'] },
    { spec: 'd:2:u64', values: ['9223372036854775808', '18446744073709551615'] },
    { spec: 'f:2:f32', values: [1.5, '-0'] },
    { spec: 'g:2:f64', values: [0.1, 'NaN'] },
    { spec: 'out:3:i32', values: [-3, -294967296, 0] }, // vl = 3 copies w[0], w[1] and the low word of d[0]
  ])('$spec prints $values', ({ spec, values }) => {
    const out = json([file, '--vlen', '128', '--dump', spec])
    expect(out.dumps[spec.replace(/:\d+:/, ':')]).toEqual(values)
  })

  it('prints how the run ended, the steps and the vl history', () => {
    expect(json([file])).toMatchObject({ vlen: 512, ended: 'end-of-text', exitCode: 0, vlHistory: [3] })
  })
})

describe('sim:exec errors', () => {
  it.each([
    { argv: [], message: /missing FILE\.s/ },
    { argv: [file, '--vlen', '96'], message: /--vlen 96: must be a power of two/ },
    { argv: [file, '--dump', 'b:4'], message: /expected LABEL:COUNT:TYPE/ },
    { argv: [file, '--dump', 'b:0:i8'], message: /COUNT '0' must be a positive integer/ },
    { argv: [file, '--dump', 'b:1:f16'], message: /TYPE 'f16' must be one of/ },
    { argv: [file, '--dump', 'nope:1:i8'], message: /no label 'nope'/ },
    { argv: [file, '--dump', 'g:99:f64'], message: /run outside the data segment/ },
    { argv: [file, '--frobnicate'], message: /Unknown option/ },
    { argv: [join(dir, 'missing.s')], message: /cannot read .*missing\.s: ENOENT/ },
  ])('$argv: one line on stderr and exit code 2', ({ argv, message }) => {
    const r = runExecCli(argv)
    expect(r.code).toBe(2)
    expect(r.stderr).toMatch(message)
    expect(r.stderr.trim().split('\n')).toHaveLength(1)
  })

  it('a program error is FILE:LINE:COLUMN: message with exit code 1', () => {
    const r = runExecCli([bad])
    expect(r.code).toBe(1)
    expect(r.stderr).toMatch(new RegExp(`^${bad.replace(/[.]/g, '\\.')}:2:3: .*illegal vtype use`))
  })

  it('runs as the npm script with those exit codes', () => {
    const ok = execFileSync('npx', ['tsx', 'server/cli/exec.ts', file, '--dump', 'b:1:u8'], { encoding: 'utf8' })
    expect(JSON.parse(ok).dumps['b:u8']).toEqual([255])
    const usage = spawnSync('npx', ['tsx', 'server/cli/exec.ts', file, '--vlen', 'x'], { encoding: 'utf8' })
    expect([usage.status, usage.stderr.trim().split('\n').length]).toEqual([2, 1])
  })
})
