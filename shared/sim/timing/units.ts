/**
 * Element-wise instructions on the lane units (handbook sections 1, 5, 6): a
 * unit takes a beat when all its operand words are queued; the result asks for
 * a write port `latency` cycles later. The divider is not pipelined.
 */
import type { VectorOp } from '../exec/stream'
import type { ExecUnit } from './config'
import { elementsPerBeat, UNIT_COUNT as UNITS_PER_LANE, UNIT_INDEX, unitLatency, wordsFor } from './config'
import type { Ctx } from './context'
import type { Operand } from './inst'
import { F_EXEC_START, F_READ_START, fillLaneElements, Inst, KIND } from './inst'
import { opClass } from './op-class'

// Copied once: under tsx's module transform (Node: the CLIs, the server, the bench) each use of an imported binding is a getter call.
const UNIT_COUNT: number = UNITS_PER_LANE

export function execUnitOf(op: VectorOp): ExecUnit {
  return op.unit === 'mul' || op.unit === 'fpu' || op.unit === 'div' ? op.unit : 'alu'
}

/** Bits an element reads and writes: 1 for masks, else SEW, or the EEW of widening, narrowing and extending ops (docs/model.md). */
export function maskBits(op: VectorOp): { src: number; dst: number; maskOnly: boolean } {
  const k = opClass(op.op)
  return {
    src: k.maskSrc ? 1 : (op.widths?.vs2 ?? op.sew),
    dst: k.maskDst ? 1 : (op.widths?.dst ?? op.sew),
    maskOnly: k.maskOnly,
  }
}

export class UnitInst extends Inst {
  readonly unit: ExecUnit
  protected readonly u: number
  protected readonly latency: number
  protected readonly epc: number
  protected readonly beatDone: Int32Array
  protected readonly dstBits: number

  constructor(ctx: Ctx, op: VectorOp, srcPhys: Int32Array[], maskPhys: Int32Array | null) {
    super(ctx, op, KIND.unit)
    const m = ctx.m
    this.unit = execUnitOf(op)
    this.u = UNIT_INDEX[this.unit]
    this.latency = unitLatency(m, this.unit)
    const bits = maskBits(op)
    this.dstBits = bits.dst
    this.epc = bits.maskOnly ? 64 : elementsPerBeat(m, this.unit, op.sew)
    this.layout()
    for (const g of srcPhys) this.st.addSource(g, bits.src, (l) => wordsFor(this.st.n[l] ?? 0, bits.src))
    if (maskPhys) this.st.addSource(maskPhys, 1, (l) => wordsFor(this.st.n[l] ?? 0, 1))
    for (let l = 0; l < this.st.L; l++) {
      this.st.beats[l] = Math.ceil((this.st.n[l] ?? 0) / this.epc)
      this.st.dstWords[l] = wordsFor(this.st.n[l] ?? 0, this.dstBits)
    }
    this.st.writesPerCycle = Math.max(1, Math.ceil((this.epc * this.dstBits) / 64))
    this.beatDone = ctx.arena.i32(this.st.L)
    this.st.allocResults()
    this.st.writeCounts()
  }

  /** Element positions per lane; element-0 forms override it. */
  protected layout(): void {
    const op = this.op
    if (op.shape === 'scalar-result' && !opClass(op.op).maskScalar) {
      // vmv.x.s, vfmv.f.s: lane 0 reads element 0; the result goes to the front end.
      this.st.n[0] = 1
      this.st.scalarDst = true
      return
    }
    if (op.shape === 'scalar-insert') {
      this.st.n[0] = op.vl > 0 ? 1 : 0
      return
    }
    fillLaneElements(this.st.n, op.vl)
  }

  exec(lane: number, c: number): void {
    if (this.st.started[lane] !== 1) return
    const j = this.beatDone[lane] ?? 0
    const b = this.st.beats[lane] ?? 0
    if (j >= b) return
    const ctx = this.st.ctx
    const uk = lane * UNIT_COUNT + this.u
    const n = this.st.n[lane] ?? 0
    const upto = Math.min(n, (j + 1) * this.epc)
    let reads = 0
    for (let k = 0; k < this.st.srcs.length; k++) {
      const s = this.st.srcs[k] as Operand
      const words = s.words[lane] ?? 0
      if (words === 0) continue
      reads++
      // Words of `bits`-bit elements up to `upto`, rounded up (integer: upto x bits stays far below 2^31).
      if ((s.readCnt[lane] ?? 0) < (upto * s.bits + 63) >> 6) return
    }
    if (reads === 0 && this.st.time(lane, F_READ_START) >= c) return // nothing to read: beats start the cycle after the start
    if ((ctx.unitFree[uk] ?? 0) > c) return
    const occupy = this.unit === 'div' ? this.latency : 1
    ctx.unitFree[uk] = c + occupy
    ctx.rec.use(ctx.unitRes[uk] ?? 0, c, 1, this.st.seq, occupy)
    ctx.busyLane(lane)
    if (j === 0) this.st.setTime(lane, F_EXEC_START, c)
    const last = j === b - 1
    const srcs = this.st.srcs
    for (let k = 0; k < srcs.length; k++) {
      const s = srcs[k] as Operand
      s.cons[lane] = last ? (s.words[lane] ?? 0) : (upto * s.bits) >> 6
    }
    const before = j === 0 ? 0 : (Math.min(n, j * this.epc) * this.dstBits) >> 6
    const after = last ? (this.st.dstWords[lane] ?? 0) : (upto * this.dstBits) >> 6
    for (let w = before; w < after; w++) this.st.resultReady(lane, w, c + this.latency)
    this.beatDone[lane] = j + 1
  }
}
