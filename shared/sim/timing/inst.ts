/**
 * An instruction in flight: its per-lane element counts, source operand
 * queues, results waiting for write ports, and the phase times it records
 * (`InstState`, one class for every kind), and its kind (the `Inst`
 * subclasses: units, reductions, ring, memory), which adds what its shape needs.
 */
import type { VectorOp } from '../exec/stream'
import { LANE_FIELD_COUNT as FIELD_COUNT, NO_CYCLE as NULL_CYCLE, REASON } from '../trace/types'
import { laneElements } from './config'
import type { Arena } from './arena'
import type { Ctx } from './context'

const F_ELEMENTS = 0
export const F_BEATS = 1
export const F_READ_START = 2
export const F_READ_END = 3
export const F_EXEC_START = 4
const F_EXEC_END = 5
export const F_WRITE_START = 6
export const F_WRITE_END = 7

// Imported bindings are copied once: in the hot paths a module binding may cost a getter call per use.
const LANE_FIELD_COUNT: number = FIELD_COUNT
const NO_CYCLE: number = NULL_CYCLE
const R_RAW = REASON.raw
const R_QUEUE = REASON.queue
const R_BANK = REASON.bank

/** A source operand group: words read into its queue and consumed by beats, per lane. */
export class Operand {
  readonly words: Int32Array
  readonly readCnt: Int32Array
  readonly cons: Int32Array
  /**
   * Segment store data (docs/model.md, "Segments"): `fields` register groups
   * of `fieldRegs` registers each, read element-major (word j of every field,
   * then word j + 1); 1: one group read word after word.
   */
  fields = 1
  fieldRegs = 1
  constructor(
    readonly group: Int32Array,
    readonly bits: number,
    lanes: number,
    arena: Arena,
  ) {
    this.words = arena.i32(lanes)
    this.readCnt = arena.i32(lanes)
    this.cons = arena.i32(lanes)
  }
}

/** The instruction classes (phases.ts calls each one's steps through a switch on its kind). */
export const KIND = { unit: 0, load: 1, store: 2, reduction: 3, orderedReduction: 4, permutation: 5 } as const
export type Kind = (typeof KIND)[keyof typeof KIND]

/** The destination and results of an instruction before dispatch sets them (never written). */
const NONE = new Int32Array(0)

/**
 * What every instruction keeps per lane, and the steps all kinds share
 * (reads, writes, starting and finishing a lane). One class for every kind of
 * instruction: the per-cycle code that reads it sees one object shape. With the
 * fields on the instruction classes themselves, a process that had timed all
 * six kinds ran the long stream 1.6 times slower (V8's property caches at the
 * shared sites went megamorphic; docs/model.md "Speed").
 */
export class InstState {
  readonly seq: number
  readonly L: number
  /** Active element positions (0..vl-1) per lane. */
  readonly n: Int32Array
  readonly beats: Int32Array
  readonly srcs: Operand[] = []
  dst: Int32Array = NONE
  oldDst: Int32Array = NONE
  /** Words each lane writes to `dst`, and has written. */
  readonly dstWords: Int32Array
  readonly wrCnt: Int32Array
  /** [lane][word]: cycle the result asks for a write port; -1 while not computed. */
  readyAt: Int32Array = NONE
  maxDstWords = 0
  /** Writes a lane may do for this instruction in one cycle. */
  writesPerCycle = 1
  /** Segment loads: the destination is `dstFields` groups of `dstFieldRegs` registers, written element-major (see Operand). */
  dstFields = 1
  dstFieldRegs = 1
  /** A scalar result (vmv.x.s, vcpop.m): no vector write port, it goes to the front end. */
  scalarDst = false
  /** Lanes with anything to do for the instruction (the kind decides: `Inst.hasWork`; set by `fillWork`). */
  readonly work: Uint8Array
  readonly started: Uint8Array
  readonly readDone: Uint8Array
  readonly laneDone: Uint8Array
  startedCount = 0
  readDoneCount = 0
  doneCount = 0
  dispatch = -1
  complete = -1
  /** Lanes where the instruction holds a lane slot. */
  readonly tookSlot: Uint8Array
  /** Per lane: the last cycle the instruction was refused something there (Ctx.deny), and the reason. */
  readonly noteCycle: Int32Array
  readonly noteReason: Int8Array
  readonly base: number
  private readonly chaining: boolean

  constructor(
    readonly ctx: Ctx,
    op: VectorOp,
    /** The instruction whose kind decides what the shared steps cannot (its work per lane, extra phases). */
    readonly owner: Inst,
    readonly kind: Kind,
  ) {
    this.seq = op.seq
    const L = (this.L = ctx.L)
    const arena = ctx.arena
    this.n = arena.i32(L)
    this.beats = arena.i32(L)
    this.dstWords = arena.i32(L)
    this.wrCnt = arena.i32(L)
    this.work = arena.u8(L)
    this.started = arena.u8(L)
    this.readDone = arena.u8(L)
    this.laneDone = arena.u8(L)
    this.tookSlot = arena.u8(L)
    this.noteCycle = arena.i32(L).fill(-1)
    this.noteReason = arena.i8(L)
    this.base = op.seq * L * LANE_FIELD_COUNT
    this.chaining = ctx.m.chaining
  }

  /** Asks the kind which lanes have work, once it is built (dispatch): the per-cycle code then reads `work`. */
  fillWork(): void {
    for (let l = 0; l < this.L; l++) this.work[l] = this.owner.hasWork(l) ? 1 : 0
  }

  /** Sets up results storage once dstWords is known. */
  allocResults(): void {
    let max = 0
    for (let l = 0; l < this.L; l++) max = Math.max(max, this.dstWords[l] ?? 0)
    this.maxDstWords = max
    this.readyAt = this.ctx.arena.i32(this.L * max).fill(-1)
  }

  addSource(group: Int32Array, bits: number, wordsOf: (lane: number) => number): Operand {
    const o = new Operand(group, bits, this.L, this.ctx.arena)
    for (let l = 0; l < this.L; l++) o.words[l] = wordsOf(l)
    this.srcs.push(o)
    return o
  }

  setTime(lane: number, field: number, c: number): void {
    this.ctx.laneTimes[this.base + lane * LANE_FIELD_COUNT + field] = c
  }

  time(lane: number, field: number): number {
    return this.ctx.laneTimes[this.base + lane * LANE_FIELD_COUNT + field] ?? NO_CYCLE
  }

  /** Records elements and beats of each lane; lanes without elements keep null phases. */
  writeCounts(): void {
    for (let l = 0; l < this.L; l++) {
      this.setTime(l, F_ELEMENTS, this.n[l] ?? 0)
      this.setTime(l, F_BEATS, this.beats[l] ?? 0)
    }
  }

  /** The lane may start: reads from this cycle on. */
  startLane(lane: number, c: number): void {
    this.started[lane] = 1
    this.startedCount++
    if (this.work[lane] !== 1) {
      this.readDone[lane] = 1
      this.readDoneCount++
      this.finishLane(lane, c)
      this.checkAllRead()
      return
    }
    // Join the lane's active list in program order (memory and arithmetic instructions start independently).
    const list = this.ctx.laneActive[lane] as InstState[]
    let k = list.length
    list.push(this)
    while (k > 0 && (list[k - 1] as InstState).seq > this.seq) {
      list[k] = list[k - 1] as InstState
      k--
    }
    list[k] = this
    let anyWords = false
    for (const s of this.srcs) if ((s.words[lane] ?? 0) > 0) anyWords = true
    if (!anyWords) {
      // Nothing to read (vmv.v.x, vid.v, unit-stride loads): the read phase is the start cycle itself.
      this.setTime(lane, F_READ_START, c)
      this.setTime(lane, F_READ_END, c)
      this.readDone[lane] = 1
      this.readDoneCount++
      this.checkAllRead()
    }
  }

  /** The reason a lane waiting on this instruction without a more specific note is given. */
  waitReason: number = REASON.raw

  /** Read lane words into the operand queues: one word per operand per cycle, oldest instruction first. */
  read(lane: number, c: number): void {
    if (this.started[lane] !== 1 || this.readDone[lane] === 1) return
    const ctx = this.ctx
    const reader = ctx.reader[lane]
    if (!reader || this.seq < reader.seq) ctx.reader[lane] = this
    const { rf, rec } = ctx
    const wpr = rf.wpr
    const shift = rf.wprShift
    const depth = ctx.d.queueDepth
    const bankBase = lane * rf.banks
    let all = true
    let readAny = false
    let full = false
    const srcs = this.srcs
    for (let k = 0; k < srcs.length; k++) {
      const s = srcs[k] as Operand
      const w = s.readCnt[lane] ?? 0
      const words = s.words[lane] ?? 0
      if (w >= words) continue
      all = false
      // A segment store's data queue holds at least a row of its fields (docs/model.md, "Segment accesses").
      if (w - (s.cons[lane] ?? 0) >= (s.fields === 1 ? depth : Math.max(depth, s.fields))) {
        full = true
        continue
      }
      const g = s.group
      let r: number
      let off: number
      if (s.fields === 1) {
        r = shift >= 0 ? w >> shift : (w / wpr) | 0
        off = w - r * wpr
      } else {
        // Word j of field f is read as word j x fields + f (fieldWord).
        const nf = s.fields
        const j = (w / nf) | 0
        const q = (j / wpr) | 0
        r = (w - j * nf) * s.fieldRegs + q
        off = j - q * wpr
      }
      const p = g[r < g.length ? r : g.length - 1] ?? 0
      if ((rf.ready[(p * this.L + lane) * wpr + off] ?? 0) > c) {
        ctx.deny(lane, this, R_RAW)
        continue
      }
      const bank = rf.bankOfWord[p * wpr + off] ?? 0
      if (!rf.grant(lane, bank, c)) {
        ctx.deny(lane, this, R_BANK)
        continue
      }
      rec.use(ctx.bankRes[bankBase + bank] ?? 0, c, 1, this.seq)
      s.readCnt[lane] = w + 1
      readAny = true
      if (w + 1 >= words) all = true
    }
    // A full queue while another operand reads only shows that operand is ahead; with none reading, the unit is behind.
    if (full && !readAny) ctx.deny(lane, this, R_QUEUE)
    if (readAny) {
      ctx.busyLane(lane)
      const t = ctx.laneTimes
      const at = this.base + lane * LANE_FIELD_COUNT
      if (t[at + F_READ_START] === NO_CYCLE) t[at + F_READ_START] = c
      t[at + F_READ_END] = c
    }
    if (all) all = this.allRead(lane)
    if (all) {
      this.readDone[lane] = 1
      this.readDoneCount++
      this.checkAllRead()
    }
  }

  private allRead(lane: number): boolean {
    for (let k = 0; k < this.srcs.length; k++) {
      const s = this.srcs[k] as Operand
      if ((s.readCnt[lane] ?? 0) < (s.words[lane] ?? 0)) return false
    }
    return true
  }

  private checkAllRead(): void {
    if (this.readDoneCount !== this.L) return
    for (const s of this.srcs) for (const p of s.group) this.ctx.ren.dropReader(p)
  }

  /** A result word of `lane` asks for a write port from cycle `at`. */
  resultReady(lane: number, w: number, at: number): void {
    this.readyAt[lane * this.maxDstWords + w] = at
  }

  /** Write back ready results, in word order, writes before reads. */
  write(lane: number, c: number): void {
    if (this.laneDone[lane] === 1 || this.started[lane] !== 1) return
    const total = this.dstWords[lane] ?? 0
    let w = this.wrCnt[lane] ?? 0
    const ctx = this.ctx
    const { rf, rec } = ctx
    const row = lane * this.maxDstWords
    const wrote = w
    for (let k = 0; k < this.writesPerCycle && w < total; k++) {
      const at = this.readyAt[row + w] ?? -1
      if (at < 0) break
      if (at > c) {
        ctx.busyLane(lane) // the result is still in the unit's pipeline
        break
      }
      if (!this.scalarDst) {
        // The physical register and offset of destination word w (segment loads: word j of field f is w = j x nf + f).
        const g = this.dst
        const wpr = rf.wpr
        const nf = this.dstFields
        const j = nf === 1 ? w : (w / nf) | 0
        const q = rf.wprShift >= 0 ? j >> rf.wprShift : (j / wpr) | 0
        const r = nf === 1 ? q : (w - j * nf) * this.dstFieldRegs + q
        const p = g[r < g.length ? r : g.length - 1] ?? 0
        const off = j - q * wpr
        const bank = rf.bankOfWord[p * wpr + off] ?? 0
        if (!rf.grant(lane, bank, c)) {
          ctx.deny(lane, this, R_BANK)
          break
        }
        rec.use(ctx.bankRes[lane * rf.banks + bank] ?? 0, c, 1, this.seq, 1, 1)
        if (this.chaining) rf.ready[(p * this.L + lane) * wpr + off] = c + 1
      }
      w++
    }
    if (w > wrote) {
      ctx.busyLane(lane)
      const t = ctx.laneTimes
      const at = this.base + lane * LANE_FIELD_COUNT
      if (t[at + F_WRITE_START] === NO_CYCLE) t[at + F_WRITE_START] = c
      t[at + F_WRITE_END] = c
      this.wrCnt[lane] = w
    }
    if (w >= total && this.owner.lanePhasesDone(lane)) this.finishLane(lane, c)
  }

  finishLane(lane: number, c: number): void {
    if (this.laneDone[lane] === 1) return
    this.laneDone[lane] = 1
    this.doneCount++
    const list = this.ctx.laneActive[lane] as InstState[]
    const at = list.indexOf(this)
    if (at >= 0) list.splice(at, 1)
    if ((this.n[lane] ?? 0) > 0) {
      const ws = this.time(lane, F_WRITE_END)
      const es = this.time(lane, F_EXEC_START)
      if (ws !== NO_CYCLE && es !== NO_CYCLE) this.setTime(lane, F_EXEC_END, Math.max(es, ws - 1))
    }
    this.ctx.sink.laneFinished(lane, this.seq, this.tookSlot[lane] === 1)
    if (this.doneCount === this.L && this.owner.globalDone()) this.finishAll(c)
  }

  finishAll(c: number): void {
    if (this.complete >= 0) return
    this.complete = c
    const { rf, ren } = this.ctx
    for (const p of this.dst) {
      rf.release(p, c + 1)
      ren.written(p)
    }
    for (const p of this.oldDst) ren.supersede(p)
    this.ctx.sink.completed(this.seq, c)
  }
}

/**
 * An instruction in flight: its kind (the subclasses) decides its work per
 * lane, its beats and any phase outside the lanes, in the methods phases.ts
 * calls (`write`, `exec`, `read`, `global`, where the kind has them); `st`
 * holds what all kinds share and takes the shared steps.
 */
export abstract class Inst {
  readonly st: InstState

  constructor(
    ctx: Ctx,
    readonly op: VectorOp,
    kind: Kind,
  ) {
    this.st = new InstState(ctx, op, this, kind)
  }

  /** Whether the lane has anything to do for this instruction (lanes without any finish at once). */
  hasWork(lane: number): boolean {
    return (this.st.n[lane] ?? 0) > 0
  }

  /** Whether a lane has nothing left besides its writes (kinds with extra phases override). */
  lanePhasesDone(_lane: number): boolean {
    return true
  }

  /** Whether phases outside the lanes (ring, memory port) are finished. */
  globalDone(): boolean {
    return true
  }
}

/** Flops of the active elements of an op (timing model section 6). */
export function opFlops(op: VectorOp): number {
  if (op.flopsPerElement === 0) return 0
  let active = op.vl
  if (op.active) {
    active = 0
    for (let i = 0; i < op.vl; i++) active += op.active[i] ?? 0
  }
  return active * op.flopsPerElement
}

/** Elements per lane for the standard layout. */
export function fillLaneElements(n: Int32Array, vl: number): void {
  const L = n.length
  for (let l = 0; l < L; l++) n[l] = laneElements(vl, l, L)
}

