/**
 * A complete corpus of encodings for the opcode check: every value of the
 * bits that choose an operation in each major opcode of RV64GC and V 1.0
 * (the unprivileged ISA's opcode map, "RV32/64G Instruction Set Listings",
 * the RVC opcode map, and V 1.0 sections 7 and 10), with the register and
 * immediate fields fixed. Built from the opcode map, never from Chimeline's
 * table, so that a mnemonic binutils knows and the table lacks shows up.
 */

/** 32-bit words: [major opcode, word] pairs built field by field. */
export function corpusWords(): number[] {
  const out: number[] = []
  const w = (v: number) => out.push(v >>> 0)
  const rd = 10 << 7
  const rs1 = 11 << 15
  const rs2 = 12 << 20
  // OP-V: funct6, funct3 (OPIVV..OPMVX), vm and the vs1/rs1/imm field (which picks the unary ops).
  for (let f6 = 0; f6 < 64; f6++) for (let f3 = 0; f3 < 7; f3++) for (let vm = 0; vm < 2; vm++) for (let s1 = 0; s1 < 32; s1++) w((f6 << 26) | (vm << 25) | (16 << 20) | (s1 << 15) | (f3 << 12) | (8 << 7) | 0x57)
  // OPCFG: vsetvli, vsetivli, vsetvl by bits 31:25.
  for (let hi = 0; hi < 128; hi++) w((hi << 25) | (3 << 20) | rs1 | (7 << 12) | rd | 0x57)
  // LOAD-FP / STORE-FP: every width; for the vector widths every nf, mew, mop, vm and lumop/sumop/rs2/vs2 field.
  for (const op of [0x07, 0x27]) {
    for (let width = 0; width < 8; width++) {
      const vector = width === 0 || width >= 5
      if (!vector) {
        w((width << 12) | rs1 | (op === 0x07 ? rd : 0) | op)
        continue
      }
      for (let nf = 0; nf < 8; nf++) for (let mew = 0; mew < 2; mew++) for (let mop = 0; mop < 4; mop++) for (let vm = 0; vm < 2; vm++) for (let f = 0; f < 32; f++) {
        w((nf << 29) | (mew << 28) | (mop << 26) | (vm << 25) | (f << 20) | rs1 | (width << 12) | (8 << 7) | op)
      }
    }
  }
  // OP, OP-32: funct7 x funct3. OP-IMM, OP-IMM-32: funct3 x bits 31:26 (shift kinds).
  for (const op of [0x33, 0x3b]) for (let f7 = 0; f7 < 128; f7++) for (let f3 = 0; f3 < 8; f3++) w((f7 << 25) | rs2 | rs1 | (f3 << 12) | rd | op)
  for (const op of [0x13, 0x1b]) for (let hi = 0; hi < 64; hi++) for (let f3 = 0; f3 < 8; f3++) w((hi << 26) | (1 << 20) | rs1 | (f3 << 12) | rd | op)
  // LOAD, STORE, BRANCH, JALR, MISC-MEM: funct3; JAL, LUI, AUIPC: one each.
  for (const op of [0x03, 0x23, 0x63, 0x67]) for (let f3 = 0; f3 < 8; f3++) w((8 << 20) | rs1 | (f3 << 12) | (op === 0x23 || op === 0x63 ? 8 << 7 : rd) | op)
  for (let f3 = 0; f3 < 8; f3++) w((0xff << 20) | (f3 << 12) | 0x0f)
  for (const op of [0x6f, 0x37, 0x17]) w((1 << 21) | rd | op)
  // SYSTEM: funct3 0 by bits 31:20 with rs1 = rd = 0; the Zicsr forms on fflags.
  for (let f12 = 0; f12 < 4096; f12 += f12 < 64 ? 1 : 32) w((f12 << 20) | 0x73)
  for (let f7 = 0; f7 < 128; f7++) for (let r = 0; r < 32; r++) w((f7 << 25) | (r << 20) | 0x73)
  for (let f3 = 1; f3 < 8; f3++) w((1 << 20) | rs1 | (f3 << 12) | rd | 0x73)
  // AMO: funct5, aq, rl and funct3.
  for (let f5 = 0; f5 < 32; f5++) for (let aqrl = 0; aqrl < 4; aqrl++) for (let f3 = 0; f3 < 8; f3++) w((f5 << 27) | (aqrl << 25) | rs2 | rs1 | (f3 << 12) | rd | 0x2f)
  // OP-FP: funct7, rounding mode / funct3 and the rs2 field (which picks the conversions).
  for (let f7 = 0; f7 < 128; f7++) for (let f3 = 0; f3 < 8; f3++) for (let r = 0; r < 32; r++) w((f7 << 25) | (r << 20) | rs1 | (f3 << 12) | rd | 0x53)
  // FMADD, FMSUB, FNMSUB, FNMADD: format and rounding mode.
  for (const op of [0x43, 0x47, 0x4b, 0x4f]) for (let fmt = 0; fmt < 4; fmt++) for (let rm = 0; rm < 8; rm++) w((13 << 27) | (fmt << 25) | rs2 | rs1 | (rm << 12) | rd | op)
  return out
}

/** Every 16-bit half-word (quadrants 0, 1 and 2; quadrant 3 is the 32-bit space). */
export function corpusHalves(): number[] {
  const out: number[] = []
  for (let h = 0; h < 0x10000; h++) if ((h & 3) !== 3) out.push(h)
  return out
}
