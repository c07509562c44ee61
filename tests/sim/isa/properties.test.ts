import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { assemble } from '../../../shared/sim/isa/assembler'
import { decodeWord } from '../../../shared/sim/isa/decoder'
import { encode } from '../../../shared/sim/isa/encoder'
import { FIELDS, IMM_RANGE, type OperandKind } from '../../../shared/sim/isa/fields'
import { liSequence } from '../../../shared/sim/isa/pseudo'
import { OPS } from '../../../shared/sim/isa/table'
import type { Operands } from '../../../shared/sim/isa/types'

/** Random operands for one table entry, each within its field. */
function operandsFor(syntax: readonly OperandKind[], vector: boolean): fc.Arbitrary<Operands> {
  const parts: Record<string, fc.Arbitrary<unknown>> = {}
  for (const k of syntax) {
    const f = FIELDS[k]
    const range = IMM_RANGE[k]
    if (k === 'vm') parts.vm = fc.boolean()
    else if (k === 'v0') parts.vm = fc.constant(false)
    // rm: the five rounding modes and dyn (5 and 6 are reserved); fence sets are 4 bits; any 12-bit CSR number.
    else if (k === 'rm') parts.rm = fc.constantFrom(0, 1, 2, 3, 4, 7)
    else if (k === 'pred' || k === 'succ') parts[k] = fc.integer({ min: 0, max: 15 })
    else if (k === 'csr') parts.csr = fc.integer({ min: 0, max: 0xfff })
    else if (k === 'branch' || k === 'jump') parts.imm = fc.integer({ min: (range?.[0] ?? 0) / 2, max: (range?.[1] ?? 0) / 2 }).map((v) => v * 2)
    else if (range) parts[f.key] = fc.integer({ min: range[0], max: range[1] })
    else parts[f.key] = fc.integer({ min: 0, max: 31 })
    if (k === 'load' || k === 'store') parts.rs1 = fc.integer({ min: 0, max: 31 })
  }
  if (vector && !('vm' in parts)) parts.vm = fc.constant(true)
  return fc.record(parts) as fc.Arbitrary<Operands>
}

const anyInstruction = fc.constantFrom(...OPS).chain((info) => operandsFor(info.syntax, info.vector).map((operands) => ({ info, operands })))

describe('property tests (fast-check)', () => {
  it('random valid instructions round-trip through encode and decode', () => {
    fc.assert(fc.property(anyInstruction, ({ info, operands }) => {
      const w = encode({ op: info.op, operands })
      const d = decodeWord(w, 0x10000)
      expect(d.ok && { op: d.instruction.op, operands: d.instruction.operands }).toEqual({ op: info.op, operands })
    }), { numRuns: 3000 })
  })

  it('random 32-bit words never crash the decoder, and decoded words encode back to themselves', () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 0xffffffff }), (word) => {
      const d = decodeWord(word, 0)
      if (d.ok) expect(encode(d.instruction)).toBe(word)
      else expect(d.error.message.length).toBeGreaterThan(0)
    }), { numRuns: 20000 })
  })

  it('the canonical text of a decoded non-branch instruction assembles to the same word (or is a reserved overlap)', () => {
    const nonBranch = anyInstruction.filter(({ info }) => !info.syntax.includes('branch') && !info.syntax.includes('jump'))
    fc.assert(fc.property(nonBranch, ({ info, operands }) => {
      const w = encode({ op: info.op, operands })
      const d = decodeWord(w, 0x10000)
      if (!d.ok) throw new Error(d.error.message)
      const r = assemble(d.instruction.text)
      if (r.ok) expect(r.program.instructions.map((i) => encode(i))).toEqual([w])
      else {
        // One instruction can break more than one overlap rule (vd over both vs1 and vs2).
        expect(r.errors.length).toBeGreaterThan(0)
        for (const e of r.errors) expect(e.code).toMatch(/^(mask-overlap|overlap)$/)
      }
    }), { numRuns: 3000 })
  })

  const vocabulary = ['vadd.vv', 'vle32.v', 'vsetvli', 'li', 'la', 'bnez', 'v0.t', 'v1', 'v31', 'a0', 'x99', 'fa0', 'e32', 'm4', 'ta', ',', '(', ')', ':', '#', '.data', '.text', '.word', '.double', '.balign', '0x', '-1', '99999999999999999999', 'L', '\n', ' ', '\t', 'é']
  const noisyText = fc.oneof(fc.string({ maxLength: 200 }), fc.array(fc.constantFrom(...vocabulary), { maxLength: 80 }).map((a) => a.join('')))

  it('random text never crashes the assembler: always a program or located errors', () => {
    fc.assert(fc.property(noisyText, (text) => {
      const r = assemble(text)
      if (!r.ok) {
        expect(r.errors.length).toBeGreaterThan(0)
        for (const e of r.errors) {
          expect(e.line).toBeGreaterThanOrEqual(1)
          expect(e.column).toBeGreaterThanOrEqual(1)
          expect(e.code).toMatch(/^[a-z-]+$/)
          expect(e.message.length).toBeGreaterThan(0)
        }
      }
    }), { numRuns: 3000 })
  })

  it('li materialises any 64-bit value with lui/addi/slli (RV64I semantics: lui sign-extends imm << 12)', () => {
    fc.assert(fc.property(fc.bigInt({ min: -(1n << 63n), max: (1n << 64n) - 1n }), (v) => {
      let x = 0n
      for (const s of liSequence(v)) {
        const base = s.fromZero ? 0n : x
        if (s.op === 'lui') x = BigInt.asIntN(64, BigInt.asIntN(32, BigInt(s.imm) << 12n))
        else if (s.op === 'addi') x = BigInt.asIntN(64, base + BigInt(s.imm))
        else x = BigInt.asIntN(64, base << BigInt(s.imm))
        expect(s.op === 'lui' ? s.imm >= 0 && s.imm <= 0xfffff : s.op === 'addi' ? s.imm >= -2048 && s.imm <= 2047 : s.imm >= 0 && s.imm <= 63).toBe(true)
      }
      expect(x).toBe(BigInt.asIntN(64, v))
      expect(liSequence(v).length).toBeLessThanOrEqual(8)
    }), { numRuns: 5000 })
  })
})
