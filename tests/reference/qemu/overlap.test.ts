/**
 * Register-group overlap across element widths (RISC-V V 1.0 section 5.2):
 * a narrowing destination may overlap its source only in the source's
 * lowest-numbered part, a widening one only in the destination's
 * highest-numbered part with a source EMUL of at least 1. Each case is run by
 * QEMU 7.2 user mode (an illegal instruction ends it with SIGILL) and by
 * Chimeline (an 'overlap' error): both must agree.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { afterAll, describe, expect, it } from 'vitest'
import { assemble } from '../../../shared/sim/isa/assembler'
import { execute } from '../../../shared/sim/exec/execute'
import { referenceToolsPresent } from '../tools'
import { build, runQemu, TOOLS } from './harness'

const present = referenceToolsPresent('the overlap check against QEMU', TOOLS, 'riscv')

const CASES: [string, string, boolean][] = [
  ['e32, m1', 'vfwcvt.f.f.v v4, v5', true], // the highest-numbered part of v4-v5
  ['e32, m1', 'vfwcvt.f.f.v v4, v4', false], // the lowest-numbered part
  ['e32, m1', 'vfncvt.f.f.w v2, v2', true], // the lowest-numbered part of v2-v3
  ['e32, m1', 'vfncvt.f.f.w v3, v2', false], // the highest-numbered part
  ['e16, m1', 'vnsrl.wi v4, v4, 1', true],
  ['e16, m1', 'vnsrl.wi v5, v4, 1', false],
  ['e16, mf2', 'vwadd.vv v4, v4, v6', false], // a source EMUL below 1 may not overlap at all
  ['e16, m2', 'vwaddu.vv v4, v6, v8', true], // v6-v7 is the highest part of v4-v7
  ['e16, m1', 'vzext.vf2 v4, v4', false],
]

describe.skipIf(!present)('overlap of groups of different EEW, as QEMU 7.2 decides it (V 1.0 section 5.2)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'chimeline-overlap-'))
  afterAll(() => rmSync(dir, { recursive: true, force: true }))

  it.each(CASES)('vsetvli %s: %s is %s', async (vtype, line, legal) => {
    const source = `    .globl _start\n    .text\n_start:\n    li a0, 4\n    vsetvli t0, a0, ${vtype}, ta, ma\n    ${line}\n    li a7, 93\n    li a0, 0\n    ecall\n`
    const name = `case${CASES.findIndex((c) => c[1] === line && c[0] === vtype)}`
    const path = join(dir, `${name}.s`)
    writeFileSync(path, source)
    const exe = await build({ name, path, source }, dir)
    const qemu = await runQemu(exe, 128).then((q) => (q.exitCode === 0 ? 'ok' : `exit ${q.exitCode}`), (e: Error) => (e.message.includes('SIGILL') ? 'illegal instruction' : e.message))
    expect(qemu).toBe(legal ? 'ok' : 'illegal instruction')
    const a = assemble(source)
    if (!a.ok) throw new Error(a.errors[0]?.message)
    const r = execute(a.program, { vlen: 128 })
    expect(r.ok ? 'ok' : r.error.code).toBe(legal ? 'ok' : 'overlap')
  })
})
