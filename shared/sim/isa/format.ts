/**
 * Canonical instruction text: the form `objdump -d` (GNU binutils) prints,
 * ABI register names, operands separated by ',' and the aliases it prefers
 * (li, mv, nop, j, ret, beqz, vmnot.m, vneg.v, ...). One deliberate difference:
 * binutils 2.40 prints addi/andi/ori/slli/srli/srai as add/and/or/sll/srl/sra
 * with an immediate; Chimeline keeps the ISA's names (the reference check
 * normalises that).
 */
import type { OperandKind } from './fields'
import { registerName } from './registers'
import type { OpInfo } from './table'
import type { Operands } from './types'
import { decodeVtype, formatVtype } from './vtype'
import { csrName } from './csr'
import { ROUNDING_MODES } from './operands'

const hex = (n: number): string => `0x${(n >>> 0).toString(16)}`
/** Branch and jump targets: hex without 0x, then <label> when known, as objdump does. */
const target = (address: number, imm: number, label?: string): string => {
  const t = (address + imm).toString(16)
  return label ? `${t} <${label}>` : t
}

const fenceSet = (n: number): string => (n === 0 ? '0' : `${n & 8 ? 'i' : ''}${n & 4 ? 'o' : ''}${n & 2 ? 'r' : ''}${n & 1 ? 'w' : ''}`)

function operandText(kind: OperandKind, o: Operands, address: number, label: string | undefined, rmDefault: number | undefined): string | undefined {
  switch (kind) {
    case 'xd': return registerName('x', o.rd ?? 0)
    case 'fd': return registerName('f', o.rd ?? 0)
    case 'xs1': return registerName('x', o.rs1 ?? 0)
    case 'fs1': return registerName('f', o.rs1 ?? 0)
    case 'xs2': return registerName('x', o.rs2 ?? 0)
    case 'fs2': return registerName('f', o.rs2 ?? 0)
    case 'fs3': return registerName('f', o.rs3 ?? 0)
    case 'shamt5': return hex(o.imm ?? 0)
    case 'rm': return o.rm === rmDefault ? undefined : ROUNDING_MODES[o.rm ?? 7] || String(o.rm)
    case 'csr': return csrName(o.csr ?? 0)
    case 'pred': case 'succ': return fenceSet(o[kind] ?? 0)
    case 'vd': case 'vs3': return `v${o.vd ?? 0}`
    case 'vs1': return `v${o.vs1 ?? 0}`
    case 'vs2': return `v${o.vs2 ?? 0}`
    case 'simm5': case 'uimm5': case 'avl5': case 'simm12': return String(o.imm ?? 0)
    case 'shamt6': case 'uimm20': return hex(o.imm ?? 0)
    case 'load': case 'store': return `${o.imm ?? 0}(${registerName('x', o.rs1 ?? 0)})`
    case 'vaddr': return `(${registerName('x', o.rs1 ?? 0)})`
    case 'branch': case 'jump': return target(address, o.imm ?? 0, label)
    case 'vtypei11': case 'vtypei10': {
      const v = decodeVtype(o.vtypei ?? 0)
      return v ? formatVtype(v) : String(o.vtypei ?? 0)
    }
    case 'vm': return o.vm === false ? 'v0.t' : undefined
    case 'v0': return 'v0'
  }
}

const x = (n: number | undefined): string => registerName('x', n ?? 0)
const f = (n: number | undefined): string => registerName('f', n ?? 0)
/** objdump's names for the CSR pseudo-instructions of the F extension's fields. */
const FP_CSR: Record<number, [string, string]> = { 1: ['frflags', 'fsflags'], 2: ['frrm', 'fsrm'], 3: ['frcsr', 'fscsr'] }
const COUNTERS: Record<number, string> = { 0xc00: 'rdcycle', 0xc01: 'rdtime', 0xc02: 'rdinstret' }
const vmSuffix = (o: Operands): string => (o.vm === false ? ',v0.t' : '')

/** The alias objdump prints for this instruction, if any. */
function alias(info: OpInfo, o: Operands, address: number, label?: string): string | undefined {
  const t = (): string => target(address, o.imm ?? 0, label)
  switch (info.op) {
    case 'addi':
      if (o.rd === 0 && o.rs1 === 0 && o.imm === 0) return 'nop'
      if (o.rs1 === 0) return `li ${x(o.rd)},${o.imm}`
      if (o.imm === 0) return `mv ${x(o.rd)},${x(o.rs1)}`
      return undefined
    case 'sub': return o.rs1 === 0 ? `neg ${x(o.rd)},${x(o.rs2)}` : undefined
    case 'subw': return o.rs1 === 0 ? `negw ${x(o.rd)},${x(o.rs2)}` : undefined
    case 'addiw': return o.imm === 0 ? `sext.w ${x(o.rd)},${x(o.rs1)}` : undefined
    case 'andi': return o.imm === 255 ? `zext.b ${x(o.rd)},${x(o.rs1)}` : undefined
    case 'xori': return o.imm === -1 ? `not ${x(o.rd)},${x(o.rs1)}` : undefined
    case 'sltiu': return o.imm === 1 ? `seqz ${x(o.rd)},${x(o.rs1)}` : undefined
    case 'sltu': return o.rs1 === 0 ? `snez ${x(o.rd)},${x(o.rs2)}` : undefined
    case 'slt':
      if (o.rs2 === 0) return `sltz ${x(o.rd)},${x(o.rs1)}`
      if (o.rs1 === 0) return `sgtz ${x(o.rd)},${x(o.rs2)}`
      return undefined
    case 'fsgnj.s': case 'fsgnj.d': case 'fsgnjn.s': case 'fsgnjn.d': case 'fsgnjx.s': case 'fsgnjx.d': {
      if (o.rs1 !== o.rs2) return undefined
      const name = info.op.startsWith('fsgnjn') ? 'fneg' : info.op.startsWith('fsgnjx') ? 'fabs' : 'fmv'
      return `${name}.${info.op.slice(-1)} ${f(o.rd)},${f(o.rs1)}`
    }
    case 'fence': return o.pred === 15 && o.succ === 15 ? 'fence' : undefined
    case 'csrrs': {
      if (o.rs1 !== 0) return o.rd === 0 ? `csrs ${csrName(o.csr ?? 0)},${x(o.rs1)}` : undefined
      const fp = FP_CSR[o.csr ?? 0]
      const counter = COUNTERS[o.csr ?? 0]
      return fp ? `${fp[0]} ${x(o.rd)}` : counter ? `${counter} ${x(o.rd)}` : `csrr ${x(o.rd)},${csrName(o.csr ?? 0)}`
    }
    case 'csrrw': {
      const fp = FP_CSR[o.csr ?? 0]
      if (fp) return o.rd === 0 ? `${fp[1]} ${x(o.rs1)}` : `${fp[1]} ${x(o.rd)},${x(o.rs1)}`
      return o.rd === 0 ? `csrw ${csrName(o.csr ?? 0)},${x(o.rs1)}` : undefined
    }
    case 'csrrc': return o.rd === 0 ? `csrc ${csrName(o.csr ?? 0)},${x(o.rs1)}` : undefined
    // binutils 2.40 prints the immediate forms under the register forms' names.
    case 'csrrwi': {
      const fp = FP_CSR[o.csr ?? 0]
      if (fp && fp[1] !== 'fscsr') return `${fp[1]}i ${x(o.rd)},${o.imm}`
      return o.rd === 0 ? `csrw ${csrName(o.csr ?? 0)},${o.imm}` : `csrrw ${x(o.rd)},${csrName(o.csr ?? 0)},${o.imm}`
    }
    case 'csrrsi': return o.rd === 0 ? `csrs ${csrName(o.csr ?? 0)},${o.imm}` : `csrrs ${x(o.rd)},${csrName(o.csr ?? 0)},${o.imm}`
    case 'csrrci': return o.rd === 0 ? `csrc ${csrName(o.csr ?? 0)},${o.imm}` : `csrrc ${x(o.rd)},${csrName(o.csr ?? 0)},${o.imm}`
    case 'vl1re8.v': case 'vl2re8.v': case 'vl4re8.v': case 'vl8re8.v':
      return `${info.op.slice(0, 3)}r.v v${o.vd},(${x(o.rs1)})`
    case 'vwadd.vx': return o.rs1 === 0 ? `vwcvt.x.x.v v${o.vd},v${o.vs2}${vmSuffix(o)}` : undefined
    case 'vwaddu.vx': return o.rs1 === 0 ? `vwcvtu.x.x.v v${o.vd},v${o.vs2}${vmSuffix(o)}` : undefined
    case 'vnsrl.wx': return o.rs1 === 0 ? `vncvt.x.x.w v${o.vd},v${o.vs2}${vmSuffix(o)}` : undefined
    case 'jal':
      if (o.rd === 0) return `j ${t()}`
      if (o.rd === 1) return `jal ${t()}`
      return undefined
    case 'jalr': {
      const addr = o.imm === 0 ? x(o.rs1) : `${o.imm}(${x(o.rs1)})`
      if (o.rd === 0 && o.rs1 === 1 && o.imm === 0) return 'ret'
      if (o.rd === 0) return `jr ${addr}`
      if (o.rd === 1) return `jalr ${addr}`
      return `jalr ${x(o.rd)},${addr}`
    }
    case 'beq': return o.rs2 === 0 ? `beqz ${x(o.rs1)},${t()}` : undefined
    case 'bne': return o.rs2 === 0 ? `bnez ${x(o.rs1)},${t()}` : undefined
    case 'bge':
      if (o.rs2 === 0) return `bgez ${x(o.rs1)},${t()}`
      if (o.rs1 === 0) return `blez ${x(o.rs2)},${t()}`
      return undefined
    case 'blt':
      if (o.rs2 === 0) return `bltz ${x(o.rs1)},${t()}`
      if (o.rs1 === 0) return `bgtz ${x(o.rs2)},${t()}`
      return undefined
    case 'vrsub.vx': return o.rs1 === 0 ? `vneg.v v${o.vd},v${o.vs2}${vmSuffix(o)}` : undefined
    case 'vxor.vi': return o.imm === -1 ? `vnot.v v${o.vd},v${o.vs2}${vmSuffix(o)}` : undefined
    case 'vfsgnjn.vv': return o.vs1 === o.vs2 ? `vfneg.v v${o.vd},v${o.vs2}${vmSuffix(o)}` : undefined
    case 'vfsgnjx.vv': return o.vs1 === o.vs2 ? `vfabs.v v${o.vd},v${o.vs2}${vmSuffix(o)}` : undefined
    case 'vmand.mm': return o.vs1 === o.vs2 ? `vmmv.m v${o.vd},v${o.vs2}` : undefined
    case 'vmnand.mm': return o.vs1 === o.vs2 ? `vmnot.m v${o.vd},v${o.vs2}` : undefined
    case 'vmxor.mm': return o.vs1 === o.vd && o.vs2 === o.vd ? `vmclr.m v${o.vd}` : undefined
    case 'vmxnor.mm': return o.vs1 === o.vd && o.vs2 === o.vd ? `vmset.m v${o.vd}` : undefined
    default: return undefined
  }
}

/** Canonical text of one instruction at `address`; `label` names a branch/jump target. */
export function formatInstruction(info: OpInfo, o: Operands, address: number, label?: string): string {
  const a = alias(info, o, address, label)
  if (a !== undefined) return a
  const parts: string[] = []
  for (const k of info.syntax) {
    const s = operandText(k, o, address, label, info.rmDefault)
    if (s !== undefined) parts.push(s)
  }
  return parts.length ? `${info.op} ${parts.join(',')}` : info.op
}
