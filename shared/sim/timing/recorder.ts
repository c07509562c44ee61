/**
 * Run-length encoding of what the lanes did: stall spans per lane and
 * resource-use spans per resource, in chunked typed arrays, plus the totals
 * the metrics need. Nothing here is per cycle and lane.
 *
 * A span takes its row when it opens; its length (and amount) are filled in
 * when it closes. Spans open in cycle order, so the rows are already sorted by
 * start and `finish` only concatenates the chunks. Only ring bookings made
 * ahead of time (permutations, tree sends) open out of order; then `finish`
 * sorts, stably, by start cycle.
 */
import type { ResourceInfo, StallSpans, UsageSpans } from '../trace/types'
import { STALL_REASONS } from '../trace/types'

type Column = Int32Array | Uint8Array | Uint16Array | Uint32Array

const CHUNK_BITS = 16
const CHUNK = 1 << CHUNK_BITS
const LOW = CHUNK - 1
/** Rows of the first chunk before it grows. */
const FIRST_ROWS = 256

/**
 * Rows in fixed-size chunks, each chunk column by column (column k of a chunk
 * of `cap` rows is chunk[k x cap ...]): appending never copies what is already
 * stored but a growing first chunk, and `column` copies each chunk's part of a
 * column as one contiguous block, then builds one exact-size column at a time,
 * so that a long run never holds its spans twice over (the chunks go once the
 * last column is built). Every column is stored as Int32 (one element type
 * keeps each store site monomorphic, which matters at a few stores per
 * simulated cycle) and takes its trace type only in `column`.
 */
class Columns {
  private chunks: Int32Array[] = []
  /** Rows the first chunk holds (it starts small and doubles to CHUNK); every later chunk holds CHUNK. */
  private firstCap = FIRST_ROWS
  count = 0
  /** Whether rows were opened in order of their start cycle (column 0). */
  sorted = true
  private lastStart = 0
  private built = 0
  constructor(private readonly width: number) {}
  private capOf(i: number): number {
    return i < CHUNK ? this.firstCap : CHUNK
  }
  /** A new row starting at cycle `start`; returns its index. */
  push(start: number): number {
    const i = this.count++
    const r = i & LOW
    let chunk = this.chunks[i >>> CHUNK_BITS]
    if (chunk === undefined) {
      // A short run (a sweep point) should not clear a whole chunk: the first one starts small.
      chunk = new Int32Array((i === 0 ? FIRST_ROWS : CHUNK) * this.width)
      this.chunks.push(chunk)
    } else if (i < CHUNK && r >= this.firstCap) {
      const cap = this.firstCap
      const grown = new Int32Array(cap * 2 * this.width)
      for (let k = 0; k < this.width; k++) grown.set(chunk.subarray(k * cap, k * cap + cap), k * cap * 2)
      this.chunks[0] = chunk = grown
      this.firstCap = cap * 2
    }
    if (start < this.lastStart) this.sorted = false
    this.lastStart = start
    chunk[r] = start
    return i
  }
  /** Columns 1 to 5 of row i at once (one chunk lookup): the rest of a row when its span closes. */
  setRest(i: number, a: number, b: number, c: number, d: number, e: number): void {
    const chunk = this.chunks[i >>> CHUNK_BITS] as Int32Array
    const cap = this.capOf(i)
    const r = i & LOW
    chunk[cap + r] = a
    chunk[2 * cap + r] = b
    chunk[3 * cap + r] = c
    chunk[4 * cap + r] = d
    if (this.width > 5) chunk[5 * cap + r] = e
  }
  set(k: number, i: number, v: number): void {
    ;(this.chunks[i >>> CHUNK_BITS] as Int32Array)[k * this.capOf(i) + (i & LOW)] = v
  }
  get(k: number, i: number): number {
    return (this.chunks[i >>> CHUNK_BITS] as Int32Array)[k * this.capOf(i) + (i & LOW)] ?? 0
  }
  /** Column k in row order `idx` (null: as stored), as a `Make`; the chunks go once every column is built. */
  column<T extends Column>(k: number, idx: Uint32Array | null, Make: new (n: number) => T): T {
    const n = this.count
    const out = new Make(n)
    const chunks = this.chunks
    if (idx === null) {
      // One block copy per chunk (set converts Int32 to the column's type as an element store would).
      for (let ci = 0, i = 0; i < n; ci++) {
        const cap = this.capOf(i)
        const rows = Math.min(n - i, cap)
        out.set((chunks[ci] as Int32Array).subarray(k * cap, k * cap + rows), i)
        i += rows
      }
    } else {
      for (let i = 0; i < idx.length; i++) {
        const j = idx[i] ?? 0
        out[i] = (chunks[j >>> CHUNK_BITS] as Int32Array)[k * this.capOf(j) + (j & LOW)] ?? 0
      }
    }
    if (++this.built === this.width) this.chunks = []
    return out
  }
  /** Row order by start cycle, stable (a counting sort: starts are cycle numbers); null when already in order. */
  order(): Uint32Array | null {
    if (this.sorted) return null
    const n = this.count
    let max = 0
    for (let i = 0; i < n; i++) max = Math.max(max, this.get(0, i))
    const counts = new Uint32Array(max + 2)
    for (let i = 0; i < n; i++) {
      const b = this.get(0, i) + 1
      counts[b] = (counts[b] ?? 0) + 1
    }
    for (let b = 1; b < counts.length; b++) counts[b] = (counts[b] ?? 0) + (counts[b - 1] ?? 0)
    const idx = new Uint32Array(n)
    for (let i = 0; i < n; i++) {
      const b = this.get(0, i)
      idx[counts[b] ?? 0] = i
      counts[b] = (counts[b] ?? 0) + 1
    }
    return idx
  }
}

// Column numbers of the two span tables (column 0 is the start cycle).
const S_LEN = 1
const S_INST = 2
const S_REASON = 3
const S_LANE = 4
const U_LEN = 1
const U_INST = 2
const U_AMOUNT = 3
const U_RESOURCE = 4
const U_WRITES = 5

export class SpanRecorder {
  readonly resources: ResourceInfo[] = []
  /** Uses summed over the run, per resource. */
  readonly totals: Float64Array
  readonly recordUsage: boolean
  private readonly stall = new Columns(5)
  private readonly usage = new Columns(6)
  // Open stall span per lane (reason -1: none) and its row.
  private readonly sReason: Int16Array
  private readonly sInst: Int32Array
  private readonly sStart: Int32Array
  private readonly sLen: Int32Array
  private readonly sRow: Int32Array
  // Open usage span per resource (instruction -1: none) and its row.
  private uInst = new Int32Array(0)
  private uAmt = new Int32Array(0)
  private uWr = new Int32Array(0)
  private uStart = new Int32Array(0)
  private uLen = new Int32Array(0)
  private uRow = new Int32Array(0)
  /** Closed spans, counted as the full machine holds them (see `setLaneWeights`). */
  private closed = 0
  /** Lanes of the machine each recorded lane stands for (1 each unless symmetry.ts groups lanes). */
  private readonly laneWeight: Int32Array
  private useWeight = new Int32Array(0)
  /** Stall cycles by reason index. */
  readonly stallTotals = new Float64Array(STALL_REASONS.length)
  /** Whether closeTotals ran: the stall spans are closed and cut, nothing more is recorded. */
  private totalsClosed = false

  constructor(lanes: number, recordUsage: boolean) {
    this.recordUsage = recordUsage
    this.sReason = new Int16Array(lanes).fill(-1)
    this.sInst = new Int32Array(lanes)
    this.sStart = new Int32Array(lanes)
    this.sLen = new Int32Array(lanes)
    this.sRow = new Int32Array(lanes)
    this.laneWeight = new Int32Array(lanes).fill(1)
    this.totals = new Float64Array(0)
  }

  addResource(info: Omit<ResourceInfo, 'id'>): number {
    const id = this.resources.length
    this.resources.push({ id, ...info })
    return id
  }

  /** Called once all resources are declared. */
  seal(): void {
    const n = this.resources.length
    this.uInst = new Int32Array(n).fill(-1)
    this.uAmt = new Int32Array(n)
    this.uWr = new Int32Array(n)
    this.uStart = new Int32Array(n)
    this.uLen = new Int32Array(n)
    this.uRow = new Int32Array(n)
    this.useWeight = new Int32Array(n).fill(1)
    ;(this as { totals: Float64Array }).totals = new Float64Array(n)
  }

  /**
   * Each recorded lane stands for `weights[lane]` alike lanes (symmetry.ts):
   * its stall cycles count that many times in the totals, and its stall spans
   * and lane-resource spans against the span limit, so that a run stops where
   * the full one would.
   */
  setLaneWeights(weights: Int32Array): void {
    this.laneWeight.set(weights)
    this.resources.forEach((r, i) => (this.useWeight[i] = r.lane === null ? 1 : (weights[r.lane] ?? 1)))
  }

  /** Spans closed so far (the trace-size limit counts these). */
  get spanCount(): number {
    return this.closed
  }

  /** Lane `lane` waited in cycle c for `inst` because of reason index `reason`. */
  stallAt(lane: number, c: number, reason: number, inst: number): void {
    this.stallTotals[reason] = (this.stallTotals[reason] ?? 0) + (this.laneWeight[lane] ?? 1)
    const open = this.sReason[lane] ?? -1
    if (open === reason && this.sInst[lane] === inst && (this.sStart[lane] ?? 0) + (this.sLen[lane] ?? 0) === c) {
      this.sLen[lane] = (this.sLen[lane] ?? 0) + 1
      return
    }
    if (open >= 0) this.closeStall(lane)
    // The row is taken now (rows stay in order of their start); the rest is written when the span closes.
    this.sRow[lane] = this.stall.push(c)
    this.sReason[lane] = reason
    this.sInst[lane] = inst
    this.sStart[lane] = c
    this.sLen[lane] = 1
  }

  /** Stall rows open in cycle order, so those from `cycles` on are a suffix; a row before may reach past it. */
  private clipStalls(cycles: number): void {
    const t = this.stall
    const tot = this.stallTotals
    let n = t.count
    while (n > 0 && t.get(0, n - 1) >= cycles) {
      n--
      const r = t.get(S_REASON, n)
      tot[r] = (tot[r] ?? 0) - t.get(S_LEN, n) * (this.laneWeight[t.get(S_LANE, n)] ?? 1)
    }
    t.count = n
    for (let i = 0; i < n; i++) {
      const over = t.get(0, i) + t.get(S_LEN, i) - cycles
      if (over <= 0) continue
      const r = t.get(S_REASON, i)
      tot[r] = (tot[r] ?? 0) - over * (this.laneWeight[t.get(S_LANE, i)] ?? 1)
      t.set(S_LEN, i, t.get(S_LEN, i) - over)
    }
  }

  private closeStall(lane: number): void {
    // Columns S_LEN, S_INST, S_REASON, S_LANE.
    this.stall.setRest(this.sRow[lane] ?? 0, this.sLen[lane] ?? 0, this.sInst[lane] ?? 0, this.sReason[lane] ?? 0, lane, 0)
    this.sReason[lane] = -1
    this.closed += this.laneWeight[lane] ?? 1
  }

  /**
   * `inst` uses `amount` of resource r over `len` cycles from c; `writes` of
   * those uses are writes (bank ports; 0 elsewhere). Uses of one instruction in
   * consecutive cycles with the same amount merge into one span; the writes are
   * kept as `UsageSpans.writes` says (a bit a cycle while the amount is 1, so
   * that reads and writes alternating on a bank still make one span).
   */
  use(r: number, c: number, amount: number, inst: number, len = 1, writes = 0): void {
    const totals = this.totals
    totals[r] = (totals[r] ?? 0) + amount * len
    if (!this.recordUsage) return
    const oi = this.uInst[r] ?? -1
    if (oi === inst && len === 1) {
      const os = this.uStart[r] ?? 0
      const ol = this.uLen[r] ?? 0
      if (os + ol === c && this.uAmt[r] === amount) {
        if (amount === 1) {
          // Bit k: the use in cycle start + k was a write; past bit 31 only reads extend the span.
          if (writes === 0 || ol < 32) {
            if (writes !== 0) this.uWr[r] = (this.uWr[r] ?? 0) | (1 << ol)
            this.uLen[r] = ol + 1
            return
          }
        } else if (this.uWr[r] === writes) {
          this.uLen[r] = ol + 1
          return
        }
      } else if (os + ol - 1 === c && os <= c) {
        // A second use in the same cycle: add it to that cycle's amount (the writes become a count).
        const total = (this.uAmt[r] ?? 0) + amount
        const before = this.uAmt[r] !== 1 ? (this.uWr[r] ?? 0) : ol - 1 < 32 ? ((this.uWr[r] ?? 0) >>> (ol - 1)) & 1 : 0
        const wr = before + writes
        if (ol === 1) {
          this.uAmt[r] = total
          this.uWr[r] = wr
          return
        }
        this.uLen[r] = ol - 1
        if (this.uAmt[r] === 1 && ol - 1 < 32) this.uWr[r] = (this.uWr[r] ?? 0) & ~(1 << (ol - 1))
        this.closeUse(r)
        this.openUse(r, c, total, inst, 1, wr)
        return
      }
    }
    if (oi >= 0) this.closeUse(r)
    this.openUse(r, c, amount, inst, len, writes)
  }

  private openUse(r: number, c: number, amount: number, inst: number, len: number, writes: number): void {
    // The row is taken now (rows stay in order of their start); the rest is written when the span closes.
    this.uRow[r] = this.usage.push(c)
    this.uInst[r] = inst
    this.uAmt[r] = amount
    this.uWr[r] = writes
    this.uStart[r] = c
    this.uLen[r] = len
  }

  private closeUse(r: number): void {
    // Columns U_LEN, U_INST, U_AMOUNT, U_RESOURCE, U_WRITES.
    this.usage.setRest(this.uRow[r] ?? 0, this.uLen[r] ?? 0, this.uInst[r] ?? 0, this.uAmt[r] ?? 0, r, this.uWr[r] ?? 0)
    this.uInst[r] = -1
    this.closed += this.useWeight[r] ?? 1
  }

  /**
   * Closes the open stall spans and cuts them at `cycles`, so that
   * `stallTotals` are final: all a run that keeps only its figures needs (a
   * sweep point). `finish` calls it first.
   */
  closeTotals(cycles: number): void {
    if (this.totalsClosed) return
    this.totalsClosed = true
    for (let l = 0; l < this.sReason.length; l++) if ((this.sReason[l] ?? -1) >= 0) this.closeStall(l)
    this.clipStalls(cycles)
  }

  /**
   * Closes the open spans and returns them sorted by start cycle, stalls cut
   * at `cycles`: a run can step past its last busy cycle (a memory port held
   * for an empty access), and a stall there would lie outside the run.
   */
  finish(cycles: number): { stalls: StallSpans; usage: UsageSpans } {
    this.closeTotals(cycles)
    if (this.recordUsage) for (let r = 0; r < this.resources.length; r++) if ((this.uInst[r] ?? -1) >= 0) this.closeUse(r)
    const s = this.stall
    const so = s.order()
    const u = this.usage
    const uo = u.order()
    return {
      stalls: {
        count: s.count,
        length: s.column(S_LEN, so, Int32Array),
        instruction: s.column(S_INST, so, Int32Array),
        reason: s.column(S_REASON, so, Uint8Array),
        lane: s.column(S_LANE, so, Uint16Array),
        start: s.column(0, so, Int32Array),
      },
      usage: {
        count: u.count,
        length: u.column(U_LEN, uo, Int32Array),
        instruction: u.column(U_INST, uo, Int32Array),
        amount: u.column(U_AMOUNT, uo, Uint16Array),
        resource: u.column(U_RESOURCE, uo, Uint32Array),
        writes: u.column(U_WRITES, uo, Uint32Array),
        start: u.column(0, uo, Int32Array),
      },
    }
  }
}
