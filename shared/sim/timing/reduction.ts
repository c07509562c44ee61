/**
 * Reductions (handbook section 8). Unordered: each lane folds its beats into
 * `reductionAccumulators` partials used round-robin, combines them pairwise,
 * then the lane partials walk down the ring from the highest active lane to
 * lane 0 (or, with `interLane: 'tree'`, meet pairwise in log2 L levels, a level
 * k hop crossing 2^k links), where vs1[0] is added and vd[0] written. Ordered (vfredosum): one
 * running value visits the elements in order, lane to lane over the ring.
 */
import type { VectorOp } from '../exec/stream'
import { REASON } from '../trace/types'
import { elementsPerBeat, UNIT_COUNT as UNITS_PER_LANE, UNIT_INDEX, unitLatency, wordsFor } from './config'
import type { Ctx } from './context'
import { F_EXEC_START, F_WRITE_END, F_WRITE_START, fillLaneElements, Inst, KIND } from './inst'
import { execUnitOf, maskBits } from './units'

// Copied once: under tsx's module transform (Node: the CLIs, the server, the bench) each use of an imported binding is a getter call.
const UNIT_COUNT: number = UNITS_PER_LANE
const R_RING = REASON.ring

const STAGE_LANES = 0 // lanes folding their beats
const STAGE_SEND = 1 // running value waits in lane `pos` to be sent down
const STAGE_ADD = 2 // value on its way to lane `pos`, added there on arrival
const STAGE_FINAL = 3 // lane 0 adds vs1[0]
const STAGE_WRITE = 4 // vd[0] or the scalar result is being written

export class ReductionInst extends Inst {
  // Copied from the op once: ops come in several object shapes, and a property read that has seen them all is slow.
  private readonly vl: number
  private readonly masked: boolean
  private readonly u: number
  private readonly D: number
  private readonly epc: number
  private readonly A: number
  private readonly beatDone: Int32Array
  /** [lane][accumulator]: cycle the accumulator's last operation finishes (-1: unused). */
  private readonly acc: Int32Array
  /** Partials still to be combined per lane, and the lane's final partial time (-1 until known). */
  private readonly partials: Int32Array
  private readonly laneValue: Int32Array
  private readonly hasVs1: boolean
  private stage = STAGE_LANES
  private pos = 0
  private valueAt = 0
  /**
   * `interLane: 'tree'`: per lane, its level (0..levels), the cycle its running
   * value is ready (-1 before its lane partial), and per lane and level the cycle
   * the partner's value arrives (-1 while none is on its way; a value that arrives
   * before the lane reached that level waits in its input for that level). At level k lane l sends to l - 2^k when
   * bit k of l is set, and otherwise adds what lane l + 2^k sends, if that lane is active.
   */
  private readonly tree: boolean
  private readonly levels: number
  private readonly tLevel: Int8Array
  private readonly tVal: Int32Array
  private readonly tIn: Int32Array

  constructor(ctx: Ctx, op: VectorOp, srcPhys: Int32Array[], maskPhys: Int32Array | null) {
    super(ctx, op, KIND.reduction)
    this.vl = op.vl
    this.masked = op.masked
    this.st.waitReason = REASON.ring
    const unit = execUnitOf(op)
    this.u = UNIT_INDEX[unit]
    this.D = unitLatency(ctx.m, unit)
    const bits = maskBits(op)
    this.epc = bits.maskOnly ? 64 : elementsPerBeat(ctx.m, unit, op.sew)
    this.A = ctx.m.reductionAccumulators
    this.st.scalarDst = op.scalarResult
    const L = this.st.L
    fillLaneElements(this.st.n, op.vl)
    const [vs2, vs1] = srcPhys
    if (vs2) this.st.addSource(vs2, bits.src, (l) => wordsFor(this.st.n[l] ?? 0, bits.src))
    this.hasVs1 = !!vs1 && !op.scalarResult
    if (vs1 && this.hasVs1) this.st.addSource(vs1, op.sew, (l) => (l === 0 && op.vl > 0 ? 1 : 0))
    if (maskPhys) this.st.addSource(maskPhys, 1, (l) => wordsFor(this.st.n[l] ?? 0, 1))
    for (let l = 0; l < L; l++) this.st.beats[l] = Math.ceil((this.st.n[l] ?? 0) / this.epc)
    this.st.dstWords[0] = op.vl > 0 ? 1 : 0
    this.st.allocResults()
    const arena = ctx.arena
    this.beatDone = arena.i32(L)
    this.acc = arena.i32(L * this.A).fill(-1)
    this.partials = arena.i32(L)
    this.laneValue = arena.i32(L).fill(-1)
    this.tree = ctx.m.interLane === 'tree'
    this.levels = Math.ceil(Math.log2(Math.max(1, this.activeLanes())))
    this.tLevel = arena.i8(this.tree ? L : 0)
    this.tVal = arena.i32(this.tree ? L : 0).fill(-1)
    this.tIn = arena.i32(this.tree ? L * this.levels : 0).fill(-1)
    this.st.writeCounts()
  }

  private get vs2() {
    return this.st.srcs[0]
  }

  exec(lane: number, c: number): void {
    if (this.st.started[lane] !== 1) return
    const ctx = this.st.ctx
    const uk = lane * UNIT_COUNT + this.u
    if ((ctx.unitFree[uk] ?? 0) > c) return
    const j = this.beatDone[lane] ?? 0
    const b = this.st.beats[lane] ?? 0
    if (j < b) {
      const n = this.st.n[lane] ?? 0
      const upto = Math.min(n, (j + 1) * this.epc)
      const vs2 = this.vs2
      // Integer word counts (upto x bits stays far below 2^31).
      if (vs2 && (vs2.readCnt[lane] ?? 0) < (upto * vs2.bits + 63) >> 6) return
      const mask = this.masked ? this.st.srcs[this.st.srcs.length - 1] : undefined
      if (mask && (mask.readCnt[lane] ?? 0) < (upto + 63) >> 6) return
      const a = lane * this.A + (j % this.A)
      if ((this.acc[a] ?? -1) > c) {
        ctx.busyLane(lane) // the accumulator's previous add is in the pipeline
        return
      }
      this.beat(lane, uk, c)
      this.acc[a] = c + this.D
      if (j === 0) this.st.setTime(lane, F_EXEC_START, c)
      const last = j === b - 1
      if (vs2) vs2.cons[lane] = last ? (vs2.words[lane] ?? 0) : (upto * vs2.bits) >> 6
      if (mask) mask.cons[lane] = last ? (mask.words[lane] ?? 0) : upto >> 6
      this.beatDone[lane] = j + 1
      if (last) this.partials[lane] = Math.min(this.A, b)
      return
    }
    if ((this.laneValue[lane] ?? -1) < 0 && b > 0) {
      this.combine(lane, uk, c)
      return
    }
    if (this.tree) {
      const v = this.tVal[lane] ?? -1
      const k = this.tLevel[lane] ?? 0
      const arrives = k < this.levels ? (this.tIn[lane * this.levels + k] ?? -1) : -1
      if (arrives >= 0 && c >= arrives && v >= 0 && v <= c) {
        this.beat(lane, uk, c)
        this.tVal[lane] = c + this.D
        this.tLevel[lane] = k + 1
        this.settle(lane)
        return
      }
    }
    const own = this.laneValue[lane] ?? -1
    if (this.stage === STAGE_ADD && this.pos === lane && c >= this.valueAt && own >= 0 && own <= c) {
      this.beat(lane, uk, c)
      this.valueAt = c + this.D
      this.stage = lane === 0 ? this.afterRing() : STAGE_SEND
      return
    }
    if (this.stage === STAGE_FINAL && lane === 0 && c >= this.valueAt) {
      const vs1 = this.st.srcs[1]
      if (vs1 && (vs1.readCnt[0] ?? 0) < 1) return
      this.beat(lane, uk, c)
      this.valueAt = c + this.D
      this.toWrite()
    }
  }

  private beat(lane: number, uk: number, c: number): void {
    const ctx = this.st.ctx
    ctx.unitFree[uk] = c + 1
    ctx.rec.use(ctx.unitRes[uk] ?? 0, c, 1, this.st.seq)
    ctx.busyLane(lane)
  }

  /** Pairwise combination of the accumulators: the two earliest ready partials, when both are done. */
  private combine(lane: number, uk: number, c: number): void {
    const base = lane * this.A
    let i1 = -1
    let i2 = -1
    let pending = false
    for (let k = 0; k < this.A; k++) {
      const t = this.acc[base + k] ?? -1
      if (t < 0) continue
      if (t > c) {
        pending = true
        continue
      }
      if (i1 < 0 || t < (this.acc[base + i1] ?? 0)) {
        i2 = i1
        i1 = k
      } else if (i2 < 0 || t < (this.acc[base + i2] ?? 0)) i2 = k
    }
    const left = this.partials[lane] ?? 0
    if (left <= 1) {
      if (!pending && i1 >= 0) this.laneValue[lane] = this.acc[base + i1] ?? c
      else this.st.ctx.busyLane(lane)
      const v = this.laneValue[lane] ?? -1
      if (v >= 0 && this.tree) {
        this.tVal[lane] = v
        this.settle(lane)
      } else if (v >= 0) this.maybeStartRing()
      return
    }
    if (i1 < 0 || i2 < 0) {
      this.st.ctx.busyLane(lane)
      return
    }
    this.beat(lane, uk, c)
    this.acc[base + i1] = c + this.D
    this.acc[base + i2] = -1
    this.partials[lane] = left - 1
  }

  private activeLanes(): number {
    return Math.min(this.vl, this.st.L)
  }

  private maybeStartRing(): void {
    if (this.stage !== STAGE_LANES) return
    const top = this.activeLanes() - 1
    if (top < 0) return
    const t = this.laneValue[top] ?? -1
    if (t < 0) return
    this.pos = top
    this.valueAt = t
    this.stage = top === 0 ? this.afterRing() : STAGE_SEND
  }

  /** Tree: skips the levels where the lane has no active partner; lane 0 past the last level goes on to vs1[0]. */
  private settle(lane: number): void {
    const top = this.activeLanes()
    let k = this.tLevel[lane] ?? 0
    while (k < this.levels && ((lane >> k) & 1) === 0 && lane + (1 << k) >= top) k++
    this.tLevel[lane] = k
    if (k === this.levels && lane === 0) {
      this.valueAt = this.tVal[0] ?? 0
      this.stage = this.afterRing()
    }
  }

  /** Tree: a lane whose value is ready sends it 2^k lanes down, over 2^k links, hop after hop. */
  private treeSend(c: number): void {
    const ctx = this.st.ctx
    const hop = ctx.ringHopLatency
    const top = this.activeLanes()
    for (let l = 1; l < top; l++) {
      const k = this.tLevel[l] ?? 0
      const v = this.tVal[l] ?? -1
      if (k >= this.levels || ((l >> k) & 1) === 0 || v < 0 || c < v) continue
      const dist = 1 << k
      let free = true
      for (let j = 0; j < dist && free; j++) free = ctx.linkFree(false, l - 1 - j, c + j * hop)
      if (!free) {
        ctx.deny(l, this.st, R_RING)
        continue
      }
      for (let j = 0; j < dist; j++) ctx.bookLink(false, l - 1 - j, c + j * hop, this.st.seq)
      ctx.busyLane(l)
      this.st.setTime(l, F_WRITE_START, c)
      this.st.setTime(l, F_WRITE_END, c)
      this.tLevel[l] = this.levels
      this.st.finishLane(l, c)
      this.tIn[(l - dist) * this.levels + k] = c + dist * hop
    }
  }

  private afterRing(): number {
    if (this.hasVs1) return STAGE_FINAL
    this.toWrite()
    return STAGE_WRITE
  }

  private toWrite(): void {
    this.stage = STAGE_WRITE
    this.st.resultReady(0, 0, this.valueAt)
  }

  global(c: number): void {
    if (this.tree) {
      if (this.stage === STAGE_LANES) this.treeSend(c)
      return
    }
    if (this.stage !== STAGE_SEND || c < this.valueAt) return
    const from = this.pos
    if (!this.st.ctx.bookLink(false, from - 1, c, this.st.seq)) {
      this.st.ctx.deny(from, this.st, R_RING)
      return
    }
    this.st.ctx.busyLane(from)
    this.st.setTime(from, F_WRITE_START, c)
    this.st.setTime(from, F_WRITE_END, c)
    this.st.finishLane(from, c)
    this.pos = from - 1
    this.valueAt = c + this.st.ctx.ringHopLatency
    this.stage = STAGE_ADD
  }

  write(lane: number, c: number): void {
    if (lane !== 0 || this.st.started[0] !== 1) {
      this.waiting(lane)
      return
    }
    if (this.stage !== STAGE_WRITE && (this.st.n[0] ?? 0) > 0) {
      this.waiting(lane)
      return
    }
    this.st.write(lane, c)
  }

  /** A lane whose own work is done waits for the ring: the wait is the ring's. */
  private waiting(lane: number): void {
    if (this.st.laneDone[lane] === 1 || this.st.started[lane] !== 1) return
    if ((this.beatDone[lane] ?? 0) >= (this.st.beats[lane] ?? 0) && (this.laneValue[lane] ?? -1) >= 0) {
      this.st.ctx.wait(lane, this.st.seq, R_RING)
    }
  }

  override lanePhasesDone(lane: number): boolean {
    return lane === 0 ? this.stage === STAGE_WRITE || (this.st.n[0] ?? 0) === 0 : true
  }
}

/** vfredosum: the running sum visits element 0, 1, 2, ... in their lanes. */
export class OrderedReductionInst extends Inst {
  // Copied from the op once (see ReductionInst).
  private readonly vl: number
  private readonly sew: number
  private readonly masked: boolean
  private readonly u: number
  private readonly D: number
  private next = 0
  /** Lane the running value is in, the lane it must reach, and when it is there. */
  private at = 0
  private target = 0
  private valueAt = -1
  private adding = false
  private readonly lastOfLane: Int32Array
  private readonly beatDone: Int32Array

  constructor(ctx: Ctx, op: VectorOp, srcPhys: Int32Array[], maskPhys: Int32Array | null) {
    super(ctx, op, KIND.orderedReduction)
    this.vl = op.vl
    this.sew = op.sew
    this.masked = op.masked
    this.st.waitReason = REASON.ring
    const unit = execUnitOf(op)
    this.u = UNIT_INDEX[unit]
    this.D = unitLatency(ctx.m, unit)
    const L = this.st.L
    fillLaneElements(this.st.n, op.vl)
    const [vs2, vs1] = srcPhys
    if (vs2) this.st.addSource(vs2, op.sew, (l) => wordsFor(this.st.n[l] ?? 0, op.sew))
    if (vs1) this.st.addSource(vs1, op.sew, (l) => (l === 0 && op.vl > 0 ? 1 : 0))
    if (maskPhys) this.st.addSource(maskPhys, 1, (l) => wordsFor(this.st.n[l] ?? 0, 1))
    this.lastOfLane = ctx.arena.i32(L).fill(-1)
    for (let l = 0; l < L; l++) {
      // One element a beat: the order forbids folding elements together.
      this.st.beats[l] = this.st.n[l] ?? 0
      if ((this.st.n[l] ?? 0) > 0) this.lastOfLane[l] = l + ((this.st.n[l] ?? 0) - 1) * L
    }
    this.st.dstWords[0] = op.vl > 0 ? 1 : 0
    this.st.allocResults()
    this.beatDone = ctx.arena.i32(L)
    this.st.writeCounts()
  }

  exec(lane: number, c: number): void {
    if (this.st.started[lane] !== 1 || this.adding || this.next >= this.vl) return
    const L = this.st.L
    if (lane !== this.next % L || this.at !== lane) return
    const vs1 = this.st.srcs[1]
    if (this.valueAt < 0) {
      // The running value starts as vs1[0], read in lane 0.
      if (!vs1 || (vs1.readCnt[0] ?? 0) < 1) return
      this.valueAt = c
    }
    if (c < this.valueAt) {
      this.st.ctx.busyLane(lane)
      return
    }
    const vs2 = this.st.srcs[0]
    const local = Math.floor(this.next / L)
    const word = Math.floor((local * this.sew) / 64)
    if (vs2 && (vs2.readCnt[lane] ?? 0) < word + 1) return
    const mask = this.masked ? this.st.srcs[this.st.srcs.length - 1] : undefined
    if (mask && (mask.readCnt[lane] ?? 0) < Math.floor(local / 64) + 1) return
    const uk = lane * UNIT_COUNT + this.u
    const ctx = this.st.ctx
    if ((ctx.unitFree[uk] ?? 0) > c) return
    ctx.unitFree[uk] = c + 1
    ctx.rec.use(ctx.unitRes[uk] ?? 0, c, 1, this.st.seq)
    ctx.busyLane(lane)
    if ((this.beatDone[lane] ?? 0) === 0) this.st.setTime(lane, F_EXEC_START, c)
    this.beatDone[lane] = (this.beatDone[lane] ?? 0) + 1
    const lastLocal = (this.st.n[lane] ?? 0) - 1
    if (vs2) vs2.cons[lane] = local === lastLocal ? (vs2.words[lane] ?? 0) : Math.floor(((local + 1) * this.sew) / 64)
    if (mask) mask.cons[lane] = local === lastLocal ? (mask.words[lane] ?? 0) : Math.floor((local + 1) / 64)
    if (vs1 && lane === 0) vs1.cons[0] = 1
    this.valueAt = c + this.D
    this.next++
    this.target = this.next < this.vl ? this.next % L : 0
    if (this.target === lane && this.next >= this.vl) this.st.resultReady(0, 0, this.valueAt)
  }

  global(c: number): void {
    if (this.at === this.target || this.valueAt < 0 || c < this.valueAt) return
    if (this.next === 0) return
    const from = this.at
    if (!this.st.ctx.bookLink(true, from, c, this.st.seq)) {
      this.st.ctx.deny(from, this.st, R_RING)
      return
    }
    this.st.ctx.busyLane(from)
    if (this.lastOfLane[from] === this.next - 1 || ((this.lastOfLane[from] ?? -1) < this.next && from !== 0)) {
      if (this.st.laneDone[from] !== 1 && (this.st.n[from] ?? 0) > 0 && (this.lastOfLane[from] ?? -1) < this.next) {
        if (this.st.time(from, F_WRITE_START) < 0) this.st.setTime(from, F_WRITE_START, c)
        this.st.setTime(from, F_WRITE_END, c)
        if (from !== 0) this.st.finishLane(from, c)
      }
    }
    this.at = (from + 1) % this.st.L
    this.valueAt = c + this.st.ctx.ringHopLatency
    if (this.at === this.target && this.next >= this.vl) this.st.resultReady(0, 0, this.valueAt)
  }

  write(lane: number, c: number): void {
    if (lane !== 0) return
    if (this.next < this.vl || this.at !== 0) return
    this.st.write(lane, c)
  }

  override lanePhasesDone(lane: number): boolean {
    return lane !== 0 || (this.next >= this.vl && this.at === 0)
  }

  /** A lane done with its elements still waits on the ring while the running value has yet to pass through it. */
  pending(lane: number): boolean {
    if (this.st.laneDone[lane] !== 1) return true
    if (this.st.complete >= 0 || this.vl === 0) return false
    // The value moves up the ring one lane a hop: to each remaining element's lane in turn, then home to lane 0.
    const L = this.st.L
    const vl = this.vl
    const toLast = this.next < vl ? ((this.next - this.at) % L + L) % L + (vl - 1 - this.next) : 0
    const lastLane = (this.at + toLast) % L
    const hops = toLast + ((L - lastLane) % L)
    return (lane - this.at + L) % L <= hops
  }
}
