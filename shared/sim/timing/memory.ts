/**
 * The memory unit (handbook section 7): `memoryPorts` memory instructions at a
 * time, started in program order. A unit-stride access moves busBits / EEW
 * consecutive elements a cycle, strided and indexed ones
 * `gatherElementsPerCycle` (never more than the bus carries); loaded elements
 * arrive `memLatency` cycles after their request and are written like results.
 * There is one load bus and one store bus for all ports: each cycle the
 * accesses in flight take what is left of it in program order.
 */
import type { VectorOp } from '../exec/stream'
import { NO_CYCLE, REASON } from '../trace/types'
import { wordsFor } from './config'
import type { Ctx } from './context'
import { F_BEATS, F_EXEC_START, F_READ_END, F_READ_START, F_WRITE_END, F_WRITE_START, fillLaneElements, Inst, KIND, type Kind, type Operand } from './inst'

export abstract class MemInst extends Inst {
  /**
   * Values moved on the bus: elements (vl, or ceil(vl / 8) bytes for vlm/vsm:
   * the stream already says so) times the fields of a segment access, in
   * element order, field after field (value k is field k mod nf of element
   * floor(k / nf)).
   */
  readonly count: number
  /** Fields an element (segment accesses: nf; otherwise 1). */
  readonly nf: number
  readonly eew: number
  readonly perCycle: number
  readonly lo: number
  readonly hi: number
  port = -1
  next = 0
  busDone = false
  /** Last cycle the access needs its port: the last request, or a load's last arrival. */
  portUntil = -1
  protected readonly laneBeats: Int32Array
  protected readonly lastCycle: Int32Array
  protected index: Operand | null = null
  protected indexBits = 64
  /**
   * What the per-element loops read of the op, copied once: ops come in
   * several object shapes (with or without `memory`, `active`, `nf`), and a
   * property read that has seen them all is slow (docs/model.md "Speed").
   */
  readonly isStore: boolean
  protected readonly indexed: boolean
  /** Unit-stride (or mask) access: moves whole lines, masked-off elements included. */
  protected readonly unitStride: boolean
  /** Active elements (absent: all), as VectorOp.active. */
  protected readonly active: Uint8Array | null
  protected readonly memLatency: number

  constructor(ctx: Ctx, op: VectorOp, kind: Kind) {
    super(ctx, op, kind)
    this.st.waitReason = REASON.memory
    const L = this.st.L
    this.nf = op.nf ?? 1
    this.count = op.vl * this.nf
    this.eew = op.eew
    const mem = op.memory
    this.isStore = mem?.isStore === true
    this.indexed = mem?.pattern === 'indexed'
    this.active = op.active ?? null
    this.memLatency = ctx.m.memLatency
    const bus = this.isStore ? ctx.m.storeBusBits : ctx.m.loadBusBits
    const unit = (this.unitStride = !mem || mem.pattern === 'unit' || mem.pattern === 'mask')
    // Values of EEW bits a cycle: a segment's fields each take their place on the bus like elements.
    this.perCycle = unit ? Math.max(1, bus / this.eew) : Math.max(1, Math.min(ctx.m.gatherElementsPerCycle, bus / this.eew))
    fillLaneElements(this.st.n, op.vl)
    let lo = Infinity
    let hi = -Infinity
    const addr = mem?.addresses
    if (addr) for (let i = 0; i < addr.length; i++) {
      const a = addr[i] ?? 0
      if (a < lo) lo = a
      // A segment's fields are adjacent to its first (RISC-V V 1.0 section 7.8).
      if (a + (this.nf * this.eew) / 8 > hi) hi = a + (this.nf * this.eew) / 8
    }
    this.lo = lo
    this.hi = hi
    this.laneBeats = ctx.arena.i32(L)
    this.lastCycle = ctx.arena.i32(L).fill(-1)
  }

  overlaps(o: MemInst): boolean {
    return this.lo < o.hi && o.lo < this.hi
  }

  /** Gets a memory port: every lane may read (indices, store data) from this cycle. */
  begin(c: number, port: number): void {
    this.port = port
    for (let l = 0; l < this.st.L; l++) this.st.startLane(l, c)
  }

  protected isActive(i: number): boolean {
    const a = this.active
    return a === null || a[i] === 1
  }

  /** Whether element i's index (indexed) is queued in its lane. */
  protected indexReady(i: number): boolean {
    const ix = this.index
    if (!ix) return true
    const lane = i % this.st.L
    return (ix.readCnt[lane] ?? 0) >= Math.floor((Math.floor(i / this.st.L) * this.indexBits) / 64) + 1
  }

  protected touchLane(lane: number, c: number): void {
    if (this.lastCycle[lane] === c) return
    if (this.lastCycle[lane] === -1) this.st.setTime(lane, F_EXEC_START, c)
    this.lastCycle[lane] = c
    this.laneBeats[lane] = (this.laneBeats[lane] ?? 0) + 1
    this.st.setTime(lane, F_BEATS, this.laneBeats[lane] ?? 0)
    this.st.ctx.busyLane(lane)
  }

  protected consumeIndex(i: number): void {
    const ix = this.index
    if (!ix) return
    const lane = i % this.st.L
    const local = Math.floor(i / this.st.L)
    ix.cons[lane] = local === (this.st.n[lane] ?? 0) - 1 ? (ix.words[lane] ?? 0) : Math.floor(((local + 1) * this.indexBits) / 64)
  }

  override globalDone(): boolean {
    return this.busDone
  }
}

export class LoadInst extends MemInst {
  constructor(ctx: Ctx, op: VectorOp, srcPhys: Int32Array[], maskPhys: Int32Array | null) {
    super(ctx, op, KIND.load)
    const [index] = srcPhys
    if (index && this.indexed) {
      this.indexBits = (op.memory as { indexEew?: number } | undefined)?.indexEew ?? op.sew
      this.index = this.st.addSource(index, this.indexBits, (l) => wordsFor(this.st.n[l] ?? 0, this.indexBits))
    }
    if (maskPhys) this.st.addSource(maskPhys, 1, (l) => wordsFor(this.st.n[l] ?? 0, 1))
    const nf = this.nf
    for (let l = 0; l < this.st.L; l++) this.st.dstWords[l] = nf * wordsFor(this.st.n[l] ?? 0, this.eew)
    // A lane may receive several elements a cycle from a wide bus; with segments, every field of them.
    this.st.writesPerCycle = nf === 1 ? Math.max(1, Math.ceil(this.perCycle / this.st.L)) : Math.min(this.perCycle, nf * Math.ceil((this.perCycle + nf) / (nf * this.st.L)))
    if (nf > 1) {
      this.st.dstFields = nf
      this.st.dstFieldRegs = Math.max(1, op.dstRegs.length / nf)
    }
    this.st.allocResults()
    this.st.writeCounts()
  }

  /** Issues this cycle's requests on the load bus. */
  global(c: number): void {
    if (this.port < 0 || this.busDone) return
    const ctx = this.st.ctx
    const L = this.st.L
    const per = 64 / this.eew
    let moved = 0
    let weighed = 0
    const weight = ctx.laneWeight
    const unit = this.unitStride
    // The load bus is shared: older accesses took their share of this cycle first.
    const most = Math.min(this.perCycle, Math.floor(ctx.busLeft(false, c) / this.eew))
    const nf = this.nf
    while (this.next < this.count && moved < most) {
      const k = this.next
      // Value k is field f of element i.
      const i = nf === 1 ? k : (k / nf) | 0
      const f = k - i * nf
      const active = this.isActive(i)
      if (active && !this.indexReady(i)) break
      // Unit-stride moves whole lines, masked-off elements included; gathers skip them.
      const lane = i % L
      if (active || unit) {
        moved++
        weighed += weight[lane] ?? 1
      }
      this.touchLane(lane, c)
      this.consumeIndex(i)
      // Local element j completes word floor(j / per) of field f when it is the word's last element or the lane's.
      const j = (i / L) | 0
      if ((j + 1) % per === 0 || j + 1 === (this.st.n[lane] ?? 0)) this.st.resultReady(lane, ((j / per) | 0) * nf + f, c + this.memLatency)
      this.next++
    }
    if (moved > 0) ctx.takeBus(false, c, moved * this.eew, weighed * this.eew, this.st.seq)
    if (this.next >= this.count) {
      this.busDone = true
      // One memory pipeline: the port stays with the load until its last element has arrived.
      this.portUntil = c + this.memLatency
      // Lanes without elements finished at the start; an empty access is complete now.
      if (this.st.doneCount === this.st.L) this.st.finishAll(c)
    }
  }

  write(lane: number, c: number): void {
    if (this.st.started[lane] === 1 && this.st.laneDone[lane] !== 1) {
      const at = this.st.readyAt[lane * this.st.maxDstWords + (this.st.wrCnt[lane] ?? 0)] ?? -1
      if (at < 0 || at > c) this.st.ctx.wait(lane, this.st.seq, REASON.memory)
    }
    this.st.write(lane, c)
  }
}

export class StoreInst extends MemInst {
  private readonly data: Operand | null
  private readonly sentCount: Int32Array

  constructor(ctx: Ctx, op: VectorOp, srcPhys: Int32Array[], maskPhys: Int32Array | null) {
    super(ctx, op, KIND.store)
    const [data, index] = srcPhys
    const nf = this.nf
    this.data = data ? this.st.addSource(data, this.eew, (l) => nf * wordsFor(this.st.n[l] ?? 0, this.eew)) : null
    if (this.data && nf > 1) {
      this.data.fields = nf
      this.data.fieldRegs = Math.max(1, this.data.group.length / nf)
    }
    if (index && this.indexed) {
      this.indexBits = (op.memory as { indexEew?: number } | undefined)?.indexEew ?? op.sew
      this.index = this.st.addSource(index, this.indexBits, (l) => wordsFor(this.st.n[l] ?? 0, this.indexBits))
    }
    if (maskPhys) this.st.addSource(maskPhys, 1, (l) => wordsFor(this.st.n[l] ?? 0, 1))
    this.st.allocResults()
    this.sentCount = this.st.ctx.arena.i32(this.st.L)
    this.st.writeCounts()
  }

  /** Sends this cycle's elements on the store bus, in element order, once their data words are queued. */
  global(c: number): void {
    if (this.port < 0 || this.busDone) return
    const ctx = this.st.ctx
    const L = this.st.L
    let moved = 0
    let weighed = 0
    const weight = ctx.laneWeight
    const unit = this.unitStride
    // The store bus is shared: older accesses took their share of this cycle first.
    const most = Math.min(this.perCycle, Math.floor(ctx.busLeft(true, c) / this.eew))
    const nf = this.nf
    while (this.next < this.count && moved < most) {
      const k = this.next
      // Value k is field f of element i; its data is word floor(local x EEW / 64) of field f, read element-major.
      const i = nf === 1 ? k : (k / nf) | 0
      const f = k - i * nf
      const lane = i % L
      const local = Math.floor(i / L)
      const active = this.isActive(i)
      if (active) {
        const d = this.data
        if (d && (d.readCnt[lane] ?? 0) < Math.floor((local * this.eew) / 64) * nf + f + 1) break
        if (!this.indexReady(i)) break
      }
      if (active || unit) {
        moved++
        weighed += weight[lane] ?? 1
      }
      this.touchLane(lane, c)
      this.consumeIndex(i)
      this.next++
      // An element is sent with its last field.
      if (f < nf - 1) continue
      const sent = (this.sentCount[lane] = (this.sentCount[lane] ?? 0) + 1)
      const d = this.data
      if (d) d.cons[lane] = sent === (this.st.n[lane] ?? 0) ? (d.words[lane] ?? 0) : Math.floor((sent * this.eew) / 64) * nf
      if (sent === (this.st.n[lane] ?? 0)) {
        // The store's write phase in a lane is the cycle its last element leaves for memory.
        this.st.setTime(lane, F_WRITE_START, c)
        this.st.setTime(lane, F_WRITE_END, c)
        if (this.st.time(lane, F_READ_START) === NO_CYCLE) {
          this.st.setTime(lane, F_READ_START, c)
          this.st.setTime(lane, F_READ_END, c)
        }
      }
    }
    if (moved > 0) ctx.takeBus(true, c, moved * this.eew, weighed * this.eew, this.st.seq)
    if (this.next >= this.count) {
      this.busDone = true
      this.portUntil = c
    }
    if (this.busDone && this.st.doneCount === this.st.L) this.st.finishAll(c)
    for (let l = 0; l < L; l++) {
      if (this.st.laneDone[l] !== 1 && this.st.started[l] === 1 && (this.sentCount[l] ?? 0) >= (this.st.n[l] ?? 0)) this.st.finishLane(l, c)
    }
  }
}
