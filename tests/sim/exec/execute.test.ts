/**
 * Execution errors, limits and the dynamic stream. Expected values are derived
 * from the RISC-V V 1.0 specification (section numbers beside each case) or
 * are plain arithmetic on the test's own data.
 */
import { describe, expect, it } from 'vitest'
import { EXECUTE_DEFAULTS, execute } from '../../../shared/sim/exec/execute'
import { OPS } from '../../../shared/sim/isa/table'
import { handlerTable } from '../../../shared/sim/exec/handlers'
import { program } from './helpers'

function fails(text: string, options: Partial<Parameters<typeof execute>[1]> = {}) {
  const r = execute(program(text), { vlen: 128, ...options })
  if (r.ok) throw new Error('expected the run to fail')
  return r.error
}

describe('execution errors carry the line and column of the instruction', () => {
  it.each([
    {
      what: 'a misaligned ld',
      text: '.data\n.balign 8\nbuf: .zero 16\n.text\n  la a0, buf\n  ld a1, 3(a0)',
      line: 6, column: 3, code: 'misaligned', message: /8-byte access at 0x[0-9a-f]+ is not 8-byte aligned/,
    },
    {
      what: 'a store outside the data memory',
      text: '.data\nbuf: .zero 8\n.text\n  la a0, buf\n  sd a0, 64(a0)',
      line: 5, column: 3, code: 'memory-bounds', message: /outside the data memory/,
    },
    {
      what: 'a vector load running past the data memory',
      text: '.data\nbuf: .zero 8\n.text\n  li t0, 4\n  vsetvli t0, t0, e32, m1\n  la a0, buf\n    vle32.v v1, (a0)',
      line: 7, column: 5, code: 'memory-bounds', message: /vle32\.v.*outside the data memory/,
    },
    {
      what: 'a vector instruction before any vsetvli (vtype resets to vill, V 1.0 section 3.4.4)',
      text: '  nop\n  vadd.vv v1, v2, v3',
      line: 2, column: 3, code: 'illegal-vtype', message: /illegal vtype use: vadd\.vv/,
    },
    {
      what: 'a vector instruction after an unsupported vtype',
      text: '  li t3, 0x20\n  vsetvl t0, zero, t3\n  vadd.vv v1, v2, v3',
      line: 3, column: 3, code: 'illegal-vtype', message: /vill/,
    },
    {
      what: 'an FP vector instruction at SEW 16 (no half precision)',
      text: '  vsetvli t0, zero, e16, m1\n  vfadd.vv v1, v2, v3',
      line: 2, column: 3, code: 'illegal-sew', message: /SEW 32 or 64/,
    },
    {
      what: 'an ecall other than write and exit',
      text: '  li a7, 63\n  ecall',
      line: 2, column: 3, code: 'syscall', message: /a7=63: only write \(64\) and exit \(93\)/,
    },
    {
      what: 'a write to a descriptor other than 1',
      text: '  li a7, 64\n  li a0, 2\n  ecall',
      line: 3, column: 3, code: 'syscall', message: /only fd 1/,
    },
    {
      what: 'a jump out of the program',
      text: '  la t0, end\n  jalr zero, 64(t0)\nend:',
      line: 2, column: 3, code: 'jump-range', message: /outside the program/,
    },
  ])('$what', ({ text, line, column, code, message }) => {
    const e = fails(text)
    expect(e).toMatchObject({ line, column, code })
    expect(e.message).toMatch(message)
  })
})

describe('limits', () => {
  const spin = 'loop:\n  addi t0, t0, 1\n  j loop'

  it('stops an endless loop at the step limit with a clear error', () => {
    const e = fails(spin, { stepLimit: 1000 })
    expect(e.code).toBe('step-limit')
    expect(e.message).toMatch(/step limit exceeded: 1000 dynamic instructions/)
    expect(e.line).toBe(2)
  })

  it('has a default step limit of 10 million dynamic instructions', () => {
    expect(EXECUTE_DEFAULTS.stepLimit).toBe(10_000_000)
  })

  it('runs exactly up to the step limit: a program of N instructions passes with stepLimit N', () => {
    const r = execute(program('nop\nnop\nnop'), { vlen: 128, stepLimit: 3 })
    expect(r.ok && r.steps).toBe(3)
  })

  it('rejects a data segment above the memory limit, at its label', () => {
    const e = fails('.data\nsmall: .zero 16\nbig: .zero 4096', { memoryLimit: 1024 })
    expect(e).toMatchObject({ code: 'memory-limit', line: 3 })
  })

  it('stops a run whose recorded stream outgrows the memory limit', () => {
    const e = fails(`.data\nbuf: .zero 64\n.text\n  vsetvli t0, zero, e8, m1\n  la a0, buf\nloop:\n  vle8.v v1, (a0)\n  j loop`, { memoryLimit: 100_000, stackBytes: 0 })
    expect(e.code).toBe('memory-limit')
    expect(e.message).toMatch(/dynamic instruction stream/)
  })

  it.each([
    { options: { vlen: 100 }, message: /vlen must be a power of two/ },
    { options: { vlen: 128, stepLimit: 0 }, message: /stepLimit must be a positive integer/ },
  ])('rejects bad options ($options)', ({ options, message }) => {
    const r = execute(program('nop'), options)
    expect(!r.ok && r.error.message).toMatch(message)
  })
})

describe('results', () => {
  it('returns registers, memory, output and the exit status of exit (a7 = 93)', () => {
    const r = execute(program(`
      .data
      msg: .byte 104, 105, 10
      .text
      li a7, 64
      li a0, 1
      la a1, msg
      li a2, 3
      ecall
      li a7, 93
      li a0, 300
      ecall
      li a0, 5
    `), { vlen: 256 })
    if (!r.ok) throw new Error(r.error.message)
    expect(new TextDecoder().decode(r.output)).toBe('hi\n')
    expect(r.exitCode).toBe(300 & 0xff) // Linux passes the low 8 bits of the status
    expect(r.ended).toBe('exit')
    expect(r.v).toHaveLength(32)
    expect(r.v[0]).toHaveLength(32)
  })

  it('ends normally at the end of the text without an exit call', () => {
    const r = execute(program('li a0, -7'), { vlen: 128 })
    expect(r.ok && [r.ended, r.exitCode, r.x[10]]).toEqual(['end-of-text', 0, -7n])
  })

  it('ends normally when a function returns to its caller (ret with the initial ra of 0), as an imported function does', () => {
    const r = execute(program('li a0, 9\nret\nli a0, 1'), { vlen: 128 })
    expect(r.ok && [r.ended, r.exitCode, r.x[10]]).toEqual(['return', 0, 9n])
  })

  it('still reports a jump to any other address outside the program', () => {
    const r = execute(program('li t0, 64\njr t0'), { vlen: 128 })
    expect(r.ok ? r.ended : r.error.message).toMatch(/jumps outside the program/)
  })

  it('keeps tail and masked-off elements undisturbed even with ta, ma (the QEMU default policy)', () => {
    const r = execute(program(`
      vsetvli t0, zero, e8, m1, ta, ma
      vmv.v.i v1, 9
      li t1, 0x5
      vmv.s.x v0, t1
      li a0, 4
      vsetvli t0, a0, e8, m1, ta, ma
      vadd.vi v1, v1, 1, v0.t
    `), { vlen: 128 })
    if (!r.ok) throw new Error(r.error.message)
    expect(Array.from(r.v[1]!.subarray(0, 6))).toEqual([10, 9, 10, 9, 9, 9])
  })

  it('a vector FP instruction that rounds refuses a reserved frm (RISC-V V 1.0 section 13.1: illegal instruction), vfmax does not round', () => {
    const text = (op: string) => `
      li a0, 2
      vsetvli t0, a0, e64, m1, ta, ma
      li t1, 5
      fsrm t1
      ${op}`
    const refused = execute(program(text('vfadd.vv v1, v2, v3')), { vlen: 128 })
    expect(refused.ok).toBe(false)
    if (!refused.ok) expect(refused.error).toMatchObject({ code: 'rounding-mode', line: 6 })
    const sqrt = execute(program(text('vfsqrt.v v1, v2')), { vlen: 128 })
    expect(sqrt.ok).toBe(false)
    expect(execute(program(text('vfmax.vv v1, v2, v3')), { vlen: 128 }).ok).toBe(true)
  })

  it('every instruction of the isa table has semantics, and nothing else does', () => {
    const table = handlerTable(() => 0, { write: () => undefined }, () => undefined)
    expect([...table.keys()].sort()).toEqual(OPS.map((o) => o.op).sort())
  })

  it('sums vfredusum in a caller-supplied order (fpReductionOrder), unlike element order', () => {
    // 1e16 + 1 + 1 in element order loses both ones (ulp of 1e16 is 2); (1 + 1) + 1e16 keeps them.
    const text = `
      .data
      .balign 8
      xs: .double 1e16, 1.0, 1.0
      .text
      li a0, 3
      vsetvli t0, a0, e64, m2
      la a1, xs
      vle64.v v2, (a1)
      vmv.s.x v1, zero
      vfredusum.vs v4, v2, v1
      vfmv.f.s fa0, v4`
    const element = execute(program(text), { vlen: 128 })
    const reversed = execute(program(text), {
      vlen: 128,
      fpReductionOrder: ({ start, values, add }) => values.reduceRight((acc, v) => add(acc, v), start),
    })
    if (!element.ok || !reversed.ok) throw new Error('run failed')
    const f64 = (bits: bigint) => new Float64Array(new BigUint64Array([bits]).buffer)[0]
    expect(f64(element.f[10]!)).toBe(1e16)
    expect(f64(reversed.f[10]!)).toBe(1e16 + 2)
  })
})

describe('the dynamic stream for the timing model', () => {
  const p = program(`
    .data
    .balign 8
    xs: .word 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12
    .text
    li a0, 6
    vsetvli t0, a0, e32, m2, ta, ma
    la a1, xs
    li a2, 8
    vlse32.v v2, (a1), a2
    li t1, 0x2d
    vmv.s.x v0, t1
    vfmacc.vv v4, v2, v6, v0.t
    vslideup.vi v8, v2, 2
    vcpop.m t2, v0
  `)
  const r = execute(p, { vlen: 128 })
  if (!r.ok) throw new Error(r.error.message)
  const ops = r.stream.ops

  it('records every vector op (vset* included) with the scalar instructions before it', () => {
    expect(ops.map((o) => o.op)).toEqual(['vsetvli', 'vlse32.v', 'vmv.s.x', 'vfmacc.vv', 'vslideup.vi', 'vcpop.m'])
    expect(ops.map((o) => o.scalarBefore)).toEqual([1, 3, 1, 0, 0, 0]) // li | la (auipc+addi), li | li
    expect(r.stream.dynamicCount).toBe(r.steps)
    expect(ops[0]).toMatchObject({ isConfig: true, vl: 6, sew: 32, lmul: 2 })
  })

  it('gives strided element addresses from base + i x stride (V 1.0 section 7.5)', () => {
    const base = p.symbols.xs!
    expect(Array.from(ops[1]!.memory!.addresses)).toEqual([0, 1, 2, 3, 4, 5].map((i) => base + 8 * i))
    expect(ops[1]).toMatchObject({ unit: 'load', shape: 'memory', eew: 32, dstRegs: [2, 3], memory: { pattern: 'strided', isStore: false } })
  })

  it('marks masked ops with their active elements and lists register groups', () => {
    expect(ops[3]).toMatchObject({ masked: true, unit: 'fpu', flopsPerElement: 2, dstRegs: [4, 5], srcRegs: [[6, 7], [2, 3], [4, 5]] })
    expect(Array.from(ops[3]!.active!)).toEqual([1, 0, 1, 1, 0, 1]) // 0x2d = 0b101101
  })

  it('gives the source element of each permuted element (-1: undisturbed)', () => {
    expect(Array.from(ops[4]!.sourceIndex!)).toEqual([-1, -1, 0, 1, 2, 3])
    expect(ops[5]).toMatchObject({ scalarResult: true, shape: 'scalar-result' })
  })

  it('stays lean: a 100,000-instruction strip-mined run records its stream in well under 256 MiB', () => {
    const loop = program(`
      .data
      .balign 8
      x: .zero 2048
      y: .zero 2048
      .text
      li s0, 6000
    outer:
      li a0, 256
      la a1, x
      la a2, y
    strip:
      vsetvli t0, a0, e64, m1, ta, ma
      vle64.v v8, (a1)
      vle64.v v16, (a2)
      vfmacc.vv v16, v8, v8
      vse64.v v16, (a2)
      slli t1, t0, 3
      add a1, a1, t1
      add a2, a2, t1
      sub a0, a0, t0
      bnez a0, strip
      addi s0, s0, -1
      bnez s0, outer`)
    // Typed-array contents live outside the V8 heap: count them too.
    const used = (): number => process.memoryUsage().heapUsed + process.memoryUsage().arrayBuffers
    const before = used()
    const run = execute(loop, { vlen: 16384 })
    const grown = used() - before
    if (!run.ok) throw new Error(run.error.message)
    expect(run.steps).toBeGreaterThanOrEqual(100_000)
    expect(grown).toBeLessThan(256 * 1024 * 1024)
    console.info(`stream of ${run.steps} instructions (${run.stream.ops.length} vector ops, vl 256): heap and array buffers grew ${(grown / 2 ** 20).toFixed(1)} MiB`)
  })
})
