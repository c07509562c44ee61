/**
 * Vector loads and stores (RISC-V V 1.0 section 7): unit-stride, strided,
 * indexed (ordered and unordered alike: one hart, element order), segments
 * (nf fields an element, 7.8), fault-only-first (7.7), whole registers (7.9)
 * and the mask forms vlm.v/vsm.v. Masked-off elements are not accessed.
 */
import type { Instruction, Lmul, Sew } from '../isa/types'
import type { Handler } from './handler'
import { checkMaskOverlap, operand, requireVtype } from './handler'
import { checkGroup, ExecFault, ArchState, regGroup } from './machine'
import type { MemoryPattern } from './stream'

type Pattern = Exclude<MemoryPattern, 'mask'>

/** EMUL = (EEW / SEW) x LMUL must lie in [1/8, 8] (V 1.0 section 7.3). */
function emulOf(ins: Instruction, eew: Sew, sew: Sew, lmul: Lmul): number {
  const emul = (eew / sew) * lmul
  if (emul < 0.125 || emul > 8) {
    throw new ExecFault('illegal-emul', `${ins.op}: EEW=${eew} with SEW=${sew} and LMUL=${lmul} gives EMUL=${emul}, outside 1/8..8`)
  }
  return emul
}

function readMem(m: ArchState, address: number, width: Sew): bigint | number {
  const off = m.offset(address, width >> 3)
  switch (width) {
    case 8:
      return m.mem.getUint8(off)
    case 16:
      return m.mem.getUint16(off, true)
    case 32:
      return m.mem.getUint32(off, true)
    default:
      return m.mem.getBigUint64(off, true)
  }
}

function writeMem(m: ArchState, address: number, width: Sew, value: bigint | number): void {
  const off = m.offset(address, width >> 3)
  switch (width) {
    case 8:
      return m.mem.setUint8(off, Number(value))
    case 16:
      return m.mem.setUint16(off, Number(value), true)
    case 32:
      return m.mem.setUint32(off, Number(value), true)
    default:
      return m.mem.setBigUint64(off, BigInt(value), true)
  }
}

function readReg(m: ArchState, index: number, width: Sew): bigint | number {
  return width === 64 ? m.u64[index]! : m.ints(width, false)[index]!
}

function writeReg(m: ArchState, index: number, width: Sew, value: bigint | number): void {
  if (width === 64) m.u64[index] = BigInt(value)
  else m.ints(width, false)[index] = Number(value)
}

/** Whether an access of `size` bytes at `address` would fault (outside the data memory and stack, or misaligned). */
function faults(m: ArchState, address: number, size: number): boolean {
  return m.locate(address, size) < 0 || address % size !== 0
}

/**
 * Unit-stride, strided and indexed accesses with `nf` fields an element
 * (nf = 1: the plain forms). Field f of element i lives at the element's
 * address + f x the field size, in register group vd + f x EMUL.
 * `faultOnlyFirst`: a fault at element i > 0 sets vl = i instead of trapping.
 */
function memoryOp(pattern: Pattern, eew: Sew, isStore: boolean, nf = 1, faultOnlyFirst = false): Handler {
  return (m, ins, rec) => {
    requireVtype(m, ins)
    const { sew, lmul } = m.vtype
    const indexed = pattern === 'indexed'
    // Indexed accesses move SEW-wide data with EEW-wide indices.
    const dataWidth = indexed ? sew : eew
    const dataEmul = indexed ? lmul : emulOf(ins, eew, sew, lmul)
    const indexEmul = indexed ? emulOf(ins, eew, sew, lmul) : 0
    const fieldRegs = Math.max(1, dataEmul)
    if (nf * fieldRegs > 8) throw new ExecFault('illegal-emul', `${ins.op}: ${nf} fields of EMUL ${dataEmul} need ${nf * fieldRegs} registers; a segment may use 8 (spec 7.8)`)
    const vd = checkGroup(ins.operands.vd, dataEmul, isStore ? 'vs3' : 'vd', ins)
    if (vd + nf * fieldRegs > 32) throw new ExecFault('register-group', `${ins.op}: the fields v${vd}..v${vd + nf * fieldRegs - 1} run past v31`)
    const vs2 = indexed ? checkGroup(ins.operands.vs2, indexEmul, 'vs2', ins) : 0
    if (!isStore) checkMaskOverlap(ins, vd)
    let vl = m.vl
    const bytes = dataWidth >> 3
    const base = Number(m.xu[operand(ins, 'rs1')]!)
    const stride = pattern === 'strided' ? Number(m.x[operand(ins, 'rs2')]!) : bytes * nf
    const ix = m.base(vs2, eew)
    const addressOf = (i: number): number => (indexed ? ArchState.address(BigInt(m.xu[operand(ins, 'rs1')]!), BigInt(readReg(m, ix + i, eew))) : base + i * stride)
    if (faultOnlyFirst) {
      for (let i = 1; i < vl; i++) {
        if (!m.active(ins.operands.vm, i)) continue
        const a = addressOf(i)
        let bad = false
        for (let f = 0; f < nf && !bad; f++) bad = faults(m, a + f * bytes, bytes)
        if (bad) {
          vl = i
          m.vl = i
          break
        }
      }
    }
    const addresses = rec.on ? new Float64Array(vl) : undefined
    for (let i = 0; i < vl; i++) {
      const address = addressOf(i)
      if (addresses) addresses[i] = address
      if (!m.active(ins.operands.vm, i)) continue
      for (let f = 0; f < nf; f++) {
        const d = m.base(vd + f * fieldRegs, dataWidth)
        if (isStore) writeMem(m, address + f * bytes, dataWidth, readReg(m, d + i, dataWidth))
        else writeReg(m, d + i, dataWidth, readMem(m, address + f * bytes, dataWidth))
      }
    }
    if (rec.on) {
      const span = nf * fieldRegs
      const data = nf === 1 ? regGroup(vd, dataEmul) : Array.from({ length: span }, (_, k) => vd + k)
      const srcRegs = isStore ? [data] : []
      if (indexed) srcRegs.push(regGroup(vs2, indexEmul))
      rec.vector(ins, {
        eew: dataWidth,
        vl,
        dstRegs: isStore ? [] : data,
        srcRegs,
        memory: { pattern, isStore, addresses: addresses!, ...(indexed ? { indexEew: eew } : {}) },
        ...(nf > 1 ? { nf } : {}),
      })
    }
  }
}

/** vl<nr>re<eew>.v and vs<nr>r.v: nr whole registers, VLEN x nr / EEW elements, whatever vl and vtype say (spec 7.9). */
function wholeRegisterOp(nr: number, eew: Sew, isStore: boolean): Handler {
  return (m, ins, rec) => {
    const vd = checkGroup(ins.operands.vd, nr, isStore ? 'vs3' : 'vd', ins)
    const bytes = eew >> 3
    const evl = (nr * m.vlenb) / bytes
    const base = Number(m.xu[operand(ins, 'rs1')]!)
    const d = m.base(vd, eew)
    const addresses = rec.on ? new Float64Array(evl) : undefined
    for (let i = 0; i < evl; i++) {
      const address = base + i * bytes
      if (addresses) addresses[i] = address
      if (isStore) writeMem(m, address, eew, readReg(m, d + i, eew))
      else writeReg(m, d + i, eew, readMem(m, address, eew))
    }
    if (rec.on) {
      const regs = regGroup(vd, nr)
      rec.vector(ins, {
        eew, vl: evl, dstRegs: isStore ? [] : regs, srcRegs: isStore ? [regs] : [],
        memory: { pattern: 'unit', isStore, addresses: addresses! }, wholeRegisters: nr,
      })
    }
  }
}

/** vlm.v / vsm.v: ceil(vl / 8) bytes, unmasked (V 1.0 section 7.4). */
function maskMemoryOp(isStore: boolean): Handler {
  return (m, ins, rec) => {
    requireVtype(m, ins)
    const vd = operand(ins, 'vd')
    const evl = Math.ceil(m.vl / 8)
    const base = Number(m.xu[operand(ins, 'rs1')]!)
    const addresses = rec.on ? new Float64Array(evl) : undefined
    for (let i = 0; i < evl; i++) {
      const at = vd * m.vlenb + i
      if (addresses) addresses[i] = base + i
      if (isStore) m.mem.setUint8(m.offset(base + i, 1), m.u8[at]!)
      else m.u8[at] = m.mem.getUint8(m.offset(base + i, 1))
    }
    if (rec.on) {
      const reg = regGroup(vd, 1)
      rec.vector(ins, {
        eew: 8,
        vl: evl,
        dstRegs: isStore ? [] : reg,
        srcRegs: isStore ? [reg] : [],
        memory: { pattern: 'mask', isStore, addresses: addresses! },
      })
    }
  }
}

export const memoryHandlers: Record<string, Handler> = {
  'vlm.v': maskMemoryOp(false),
  'vsm.v': maskMemoryOp(true),
}
for (const eew of [8, 16, 32, 64] as const) {
  memoryHandlers[`vle${eew}.v`] = memoryOp('unit', eew, false)
  memoryHandlers[`vse${eew}.v`] = memoryOp('unit', eew, true)
  memoryHandlers[`vlse${eew}.v`] = memoryOp('strided', eew, false)
  memoryHandlers[`vsse${eew}.v`] = memoryOp('strided', eew, true)
  memoryHandlers[`vle${eew}ff.v`] = memoryOp('unit', eew, false, 1, true)
  for (const order of ['u', 'o']) {
    memoryHandlers[`vl${order}xei${eew}.v`] = memoryOp('indexed', eew, false)
    memoryHandlers[`vs${order}xei${eew}.v`] = memoryOp('indexed', eew, true)
  }
  for (let nf = 2; nf <= 8; nf++) {
    memoryHandlers[`vlseg${nf}e${eew}.v`] = memoryOp('unit', eew, false, nf)
    memoryHandlers[`vlseg${nf}e${eew}ff.v`] = memoryOp('unit', eew, false, nf, true)
    memoryHandlers[`vsseg${nf}e${eew}.v`] = memoryOp('unit', eew, true, nf)
    memoryHandlers[`vlsseg${nf}e${eew}.v`] = memoryOp('strided', eew, false, nf)
    memoryHandlers[`vssseg${nf}e${eew}.v`] = memoryOp('strided', eew, true, nf)
    for (const order of ['u', 'o']) {
      memoryHandlers[`vl${order}xseg${nf}ei${eew}.v`] = memoryOp('indexed', eew, false, nf)
      memoryHandlers[`vs${order}xseg${nf}ei${eew}.v`] = memoryOp('indexed', eew, true, nf)
    }
  }
  for (const nr of [1, 2, 4, 8]) memoryHandlers[`vl${nr}re${eew}.v`] = wholeRegisterOp(nr, eew, false)
}
for (const nr of [1, 2, 4, 8]) memoryHandlers[`vs${nr}r.v`] = wholeRegisterOp(nr, 8, true)
