/**
 * What QEMU cannot check byte for byte here: fault-only-first loads (QEMU
 * faults at unmapped pages, Chimeline at the end of the program's data), the
 * stack, the `_start` entry and the stream fields the timing model reads.
 * Expected values follow from the RISC-V V 1.0 specification (section
 * numbers beside each case) and the test's own data.
 */
import { describe, expect, it } from 'vitest'
import { execute } from '../../../shared/sim/exec/execute'
import { STACK_TOP } from '../../../shared/sim/exec/machine'
import { program } from './helpers'

const run = (text: string, vlen = 128) => {
  const r = execute(program(text), { vlen })
  if (!r.ok) throw new Error(`${r.error.line}:${r.error.column} ${r.error.message}`)
  return r
}

describe('fault-only-first loads (V 1.0 section 7.7)', () => {
  it('trims vl to the first element past the data instead of trapping', () => {
    // 6 words of data, 8 requested: elements 6 and 7 lie past the data, so vl = 6.
    const r = run('.data\nw: .word 1, 2, 3, 4, 5, 6\n.text\n  li a0, 8\n  vsetvli t0, a0, e32, m2, ta, ma\n  la a1, w\n  vle32ff.v v2, (a1)\n  csrr a2, vl')
    expect(r.vl).toBe(6)
    expect(r.x[12]).toBe(6n)
    expect(Array.from(new Int32Array(r.v[2]!.buffer, r.v[2]!.byteOffset, 4))).toEqual([1, 2, 3, 4])
    const op = r.stream.ops.find((o) => o.op === 'vle32ff.v')
    expect(op?.vl).toBe(6)
  })

  it('traps when element 0 faults', () => {
    const r = execute(program('.data\nw: .word 1\n.text\n  li a0, 4\n  vsetvli t0, a0, e32, m1, ta, ma\n  la a1, w\n  addi a1, a1, -64\n  vle32ff.v v2, (a1)'), { vlen: 128 })
    expect(!r.ok && r.error.code).toBe('memory-bounds')
  })

  it('segment form: an element whose last field is past the data trims vl there', () => {
    // 5 halves = 2 whole segments of 2 fields and one half; vl becomes 2.
    const r = run('.data\nh: .half 1, 2, 3, 4, 5\n.text\n  li a0, 4\n  vsetvli t0, a0, e16, m1, ta, ma\n  la a1, h\n  vlseg2e16ff.v v4, (a1)')
    expect(r.vl).toBe(2)
  })
})

describe('the stack, the entry point and the stream', () => {
  it('starts at _start with sp at the top of the stack, and a call returns through it', () => {
    const r = run('f:\n  addi sp, sp, -16\n  sd ra, 8(sp)\n  li a0, 42\n  ld ra, 8(sp)\n  addi sp, sp, 16\n  ret\n_start:\n  mv s1, sp\n  call f\n  li a7, 93\n  ecall')
    expect(r.x[9]).toBe(BigInt(STACK_TOP))
    expect(r.x[2]).toBe(BigInt(STACK_TOP))
    expect(r.exitCode).toBe(42)
  })

  it('records EEW of widening and narrowing ops, segment fields and whole registers for the timing model', () => {
    const r = run('.data\nb: .zero 256\n.text\n  la a1, b\n  li a0, 4\n  vsetvli t0, a0, e16, m1, ta, ma\n  vwadd.vv v2, v4, v5\n  vnsrl.wi v6, v2, 0\n  vlseg3e16.v v8, (a1)\n  vl2re32.v v12, (a1)\n  vmv4r.v v16, v12')
    const by = (op: string) => r.stream.ops.find((o) => o.op === op)!
    expect(by('vwadd.vv').widths).toEqual({ dst: 32, vs2: 16 })
    expect(by('vwadd.vv').dstRegs).toEqual([2, 3]) // EMUL 2: a 2 x SEW destination doubles the registers written
    expect(by('vnsrl.wi').widths).toEqual({ dst: 16, vs2: 32 })
    expect(by('vlseg3e16.v').nf).toBe(3)
    expect(by('vlseg3e16.v').dstRegs).toEqual([8, 9, 10])
    // VLEN 128 = 16 bytes a register: two registers are 8 words of 32 bits, whatever vl says.
    expect(by('vl2re32.v')).toMatchObject({ wholeRegisters: 2, vl: 8, eew: 32 })
    expect(by('vmv4r.v')).toMatchObject({ wholeRegisters: 4, dstRegs: [16, 17, 18, 19] })
  })
})
