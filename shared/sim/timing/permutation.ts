/**
 * Permutations over the ring (handbook section 9): slides, gathers and
 * vcompress. Each source word a lane has read is sent, as one packet per
 * destination lane, over (b - a) mod L links (the shorter way when the ring is
 * bidirectional), one packet per link and direction a cycle, `ringHopLatency`
 * per hop. A destination word is written once every packet feeding it arrived.
 */
import type { VectorOp } from '../exec/stream'
import { REASON } from '../trace/types'
import { wordsFor } from './config'
import type { Ctx } from './context'
import { F_BEATS, F_EXEC_START, F_READ_END, F_READ_START, fillLaneElements, Inst, KIND } from './inst'

export class PermutationInst extends Inst {
  /** Per source lane, packets in source-word order: source word, destination lane, destination word. */
  private readonly pkWord: Int32Array[]
  private readonly pkDst: Int32Array[]
  private readonly pkDstWord: Int32Array[]
  private readonly pkNext: Int32Array
  /** [lane][word]: packets still to arrive, and the latest arrival. */
  private readonly waiting: Int32Array
  private readonly arrival: Int32Array
  private readonly sent: Int32Array

  constructor(ctx: Ctx, op: VectorOp, srcPhys: Int32Array[], maskPhys: Int32Array | null) {
    super(ctx, op, KIND.permutation)
    this.st.waitReason = REASON.ring
    const L = this.st.L
    const sew = op.sew
    fillLaneElements(this.st.n, op.vl)
    const src = op.sourceIndex ?? new Int32Array(0)
    const maxLocal = new Int32Array(L).fill(-1)
    const rows: [number, number, number][][] = Array.from({ length: L }, () => [])
    for (let i = 0; i < op.vl; i++) {
      const s = src[i] ?? -1
      if (s < 0 || (op.active && op.active[i] === 0)) continue
      const a = s % L
      const local = Math.floor(s / L)
      if (local > (maxLocal[a] ?? -1)) maxLocal[a] = local
      const sw = Math.floor((local * sew) / 64)
      const b = i % L
      const dw = Math.floor((Math.floor(i / L) * sew) / 64)
      const row = rows[a] as [number, number, number][]
      const last = row[row.length - 1]
      // Elements of one source word bound for one destination word travel together.
      if (!last || last[0] !== sw || last[1] !== b || last[2] !== dw) row.push([sw, b, dw])
    }
    const [vs2, extra] = srcPhys
    if (vs2) this.st.addSource(vs2, sew, (l) => wordsFor((maxLocal[l] ?? -1) + 1, sew))
    // vrgather.vv reads its indices, vcompress its selection mask, in the destination lanes.
    if (extra) this.st.addSource(extra, op.op.startsWith('vcompress') ? 1 : sew, (l) => wordsFor(this.st.n[l] ?? 0, op.op.startsWith('vcompress') ? 1 : sew))
    if (maskPhys) this.st.addSource(maskPhys, 1, (l) => wordsFor(this.st.n[l] ?? 0, 1))
    for (let l = 0; l < L; l++) this.st.dstWords[l] = wordsFor(this.st.n[l] ?? 0, sew)
    this.st.allocResults()
    this.pkWord = []
    this.pkDst = []
    this.pkDstWord = []
    this.waiting = ctx.arena.i32(L * this.st.maxDstWords)
    this.arrival = ctx.arena.i32(L * this.st.maxDstWords)
    for (let a = 0; a < L; a++) {
      const row = (rows[a] as [number, number, number][]).sort((x, y) => x[0] - y[0])
      this.pkWord.push(Int32Array.from(row, (r) => r[0]))
      this.pkDst.push(Int32Array.from(row, (r) => r[1]))
      this.pkDstWord.push(Int32Array.from(row, (r) => r[2]))
      for (const [, b, dw] of row) this.waiting[b * this.st.maxDstWords + dw] = (this.waiting[b * this.st.maxDstWords + dw] ?? 0) + 1
    }
    this.pkNext = ctx.arena.i32(L)
    this.sent = ctx.arena.i32(L)
    this.st.writeCounts()
  }

  override hasWork(lane: number): boolean {
    return (this.st.n[lane] ?? 0) > 0 || (this.pkWord[lane]?.length ?? 0) > 0
  }

  /** The lane may start (phases.ts `startLaneStep`): reads from this cycle on, and the datapath engages. */
  startLane(lane: number, c: number): void {
    this.st.startLane(lane, c)
    if (this.st.time(lane, F_READ_START) >= 0) this.engage(lane, this.st.time(lane, F_READ_START))
  }

  /**
   * The lane's permutation datapath is engaged from the cycle after its first read
   * (or after its start when it reads nothing); words no packet feeds (slide-in
   * scalars, zeros, undisturbed elements) are ready from then on.
   */
  private engage(lane: number, first: number): void {
    if (this.st.time(lane, F_EXEC_START) >= 0 || !this.hasWork(lane)) return
    this.st.setTime(lane, F_EXEC_START, first + 1)
    for (let w = 0; w < (this.st.dstWords[lane] ?? 0); w++) {
      if ((this.waiting[lane * this.st.maxDstWords + w] ?? 0) === 0) this.st.resultReady(lane, w, first + 1)
    }
  }

  read(lane: number, c: number): void {
    this.st.read(lane, c)
    if (this.st.time(lane, F_READ_START) === c) this.engage(lane, c)
  }

  /** Each source lane injects its next packet when its word is queued and the whole path is free. */
  global(c: number): void {
    const ctx = this.st.ctx
    const L = this.st.L
    const hop = ctx.ringHopLatency
    const vs2 = this.st.srcs[0]
    for (let a = 0; a < L; a++) {
      if (this.st.started[a] !== 1) continue
      const words = this.pkWord[a] as Int32Array
      const k = this.pkNext[a] ?? 0
      if (k >= words.length) continue
      const sw = words[k] ?? 0
      if (!vs2 || (vs2.readCnt[a] ?? 0) <= sw) continue
      const b = (this.pkDst[a] as Int32Array)[k] ?? 0
      const upHops = (b - a + L) % L
      const downHops = (a - b + L) % L
      const up = !ctx.m.ringBidirectional || upHops <= downHops
      const hops = up ? upHops : downHops
      let free = true
      for (let h = 0; h < hops && free; h++) {
        const link = up ? (a + h) % L : (a - h - 1 + L) % L
        free = ctx.linkFree(up, link, c + h * hop)
      }
      if (!free) {
        ctx.deny(a, this.st, REASON.ring)
        continue
      }
      for (let h = 0; h < hops; h++) ctx.bookLink(up, up ? (a + h) % L : (a - h - 1 + L) % L, c + h * hop, this.st.seq)
      ctx.busyLane(a)
      const at = c + hops * hop
      const dw = (this.pkDstWord[a] as Int32Array)[k] ?? 0
      const slot = b * this.st.maxDstWords + dw
      this.arrival[slot] = Math.max(this.arrival[slot] ?? 0, at)
      this.waiting[slot] = (this.waiting[slot] ?? 0) - 1
      if (this.waiting[slot] === 0) this.st.resultReady(b, dw, this.arrival[slot] ?? at)
      this.sent[a] = (this.sent[a] ?? 0) + 1
      this.st.setTime(a, F_BEATS, this.sent[a] ?? 0)
      this.pkNext[a] = k + 1
      // A source word leaves its queue once all its packets are on their way.
      vs2.cons[a] = k + 1 < words.length ? (words[k + 1] ?? 0) : (vs2.words[a] ?? 0)
    }
  }

  write(lane: number, c: number): void {
    const extra = this.st.srcs[1]
    if (extra && extra !== this.st.srcs[0] && (extra.readCnt[lane] ?? 0) < (extra.words[lane] ?? 0)) return
    // Nothing is written before the lane's own read phase has begun.
    if (this.st.time(lane, F_EXEC_START) < 0) return
    const w = this.st.wrCnt[lane] ?? 0
    const total = this.st.dstWords[lane] ?? 0
    // The last word is written once the lane has read and sent all its own source words,
    // so that a lane's phases stay in order: read, then exchange, then write.
    if (w === total - 1 && (this.st.readDone[lane] !== 1 || !this.lanePhasesDone(lane) || this.st.time(lane, F_READ_END) >= c)) return
    if (this.st.started[lane] === 1 && this.st.laneDone[lane] !== 1 && w < total) {
      const at = this.st.readyAt[lane * this.st.maxDstWords + w] ?? -1
      if (at < 0) this.st.ctx.wait(lane, this.st.seq, REASON.ring) // waiting for packets from other lanes
    }
    this.st.write(lane, c)
  }

  override lanePhasesDone(lane: number): boolean {
    return (this.pkNext[lane] ?? 0) >= (this.pkWord[lane]?.length ?? 0)
  }
}
