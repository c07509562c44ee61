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

const hex = (n: number): string => `0x${(n >>> 0).toString(16)}`
/** Branch and jump targets: hex without 0x, then <label> when known, as objdump does. */
const target = (address: number, imm: number, label?: string): string => {
  const t = (address + imm).toString(16)
  return label ? `${t} <${label}>` : t
}

function operandText(kind: OperandKind, o: Operands, address: number, label?: string): string | undefined {
  switch (kind) {
    case 'xd': return registerName('x', o.rd ?? 0)
    case 'fd': return registerName('f', o.rd ?? 0)
    case 'xs1': return registerName('x', o.rs1 ?? 0)
    case 'fs1': return registerName('f', o.rs1 ?? 0)
    case 'xs2': return registerName('x', o.rs2 ?? 0)
    case 'fs2': return registerName('f', o.rs2 ?? 0)
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
    const s = operandText(k, o, address, label)
    if (s !== undefined) parts.push(s)
  }
  return parts.length ? `${info.op} ${parts.join(',')}` : info.op
}
