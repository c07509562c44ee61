/**
 * Run-length encoding of what the lanes did: stall spans per lane and
 * resource-use spans per resource, in chunked typed arrays, plus the totals
 * the metrics need. Nothing here is per cycle and lane.
 */
import type { ResourceInfo, StallSpans, UsageSpans } from '../trace/types'

type Column = Int32Array | Uint8Array | Uint16Array | Uint32Array
type ColumnType = new (n: number) => Column

const CHUNK_BITS = 16
const CHUNK = 1 << CHUNK_BITS

/**
 * Rows of spans in fixed-size chunks per column: appending never copies what
 * is already stored, and `column` builds one exact-size, reordered column at a
 * time, releasing its chunks, so a long run never holds its spans twice over.
 */
class Columns {
  readonly chunks: Column[][]
  count = 0
  constructor(readonly types: ColumnType[]) {
    this.chunks = types.map(() => [])
  }
  /** Index of a new row. */
  push(): number {
    if ((this.count & (CHUNK - 1)) === 0) this.types.forEach((T, k) => (this.chunks[k] as Column[]).push(new T(CHUNK)))
    return this.count++
  }
  set(k: number, i: number, v: number): void {
    ;((this.chunks[k] as Column[])[i >>> CHUNK_BITS] as Column)[i & (CHUNK - 1)] = v
  }
  get(k: number, i: number): number {
    return ((this.chunks[k] as Column[])[i >>> CHUNK_BITS] as Column)[i & (CHUNK - 1)] ?? 0
  }
  /** Column k in the row order `idx`; its chunks are released. */
  column<T extends Column>(k: number, idx: Uint32Array, Make: new (n: number) => T): T {
    const out = new Make(idx.length)
    const chunks = this.chunks[k] as Column[]
    for (let i = 0; i < idx.length; i++) {
      const j = idx[i] ?? 0
      out[i] = (chunks[j >>> CHUNK_BITS] as Column)[j & (CHUNK - 1)] ?? 0
    }
    this.chunks[k] = []
    return out
  }
}

// Column numbers of the two span tables.
const S_START = 0
const S_LEN = 1
const S_INST = 2
const S_REASON = 3
const S_LANE = 4
const U_START = 0
const U_LEN = 1
const U_INST = 2
const U_AMOUNT = 3
const U_RESOURCE = 4

export class Recorder {
  readonly resources: ResourceInfo[] = []
  /** Uses summed over the run, per resource. */
  readonly totals: Float64Array
  readonly recordUsage: boolean
  private readonly stall = new Columns([Int32Array, Int32Array, Int32Array, Uint8Array, Uint16Array])
  private readonly usage = new Columns([Int32Array, Int32Array, Int32Array, Uint16Array, Uint32Array])
  // Open stall span per lane.
  private readonly sReason: Int16Array
  private readonly sInst: Int32Array
  private readonly sStart: Int32Array
  private readonly sLen: Int32Array
  // Open usage span per resource.
  private uInst!: Int32Array
  private uAmt!: Int32Array
  private uStart!: Int32Array
  private uLen!: Int32Array
  /** Stall cycles by reason index. */
  readonly stallTotals = new Float64Array(9)

  constructor(lanes: number, recordUsage: boolean) {
    this.recordUsage = recordUsage
    this.sReason = new Int16Array(lanes).fill(-1)
    this.sInst = new Int32Array(lanes)
    this.sStart = new Int32Array(lanes)
    this.sLen = new Int32Array(lanes)
    this.totals = new Float64Array(0)
  }

  addResource(info: Omit<ResourceInfo, 'id'>): number {
    const id = this.resources.length
    this.resources.push({ id, ...info })
    return id
  }

  /** Called once all resources are declared. */
  seal(): Recorder['totals'] {
    const n = this.resources.length
    this.uInst = new Int32Array(n).fill(-1)
    this.uAmt = new Int32Array(n)
    this.uStart = new Int32Array(n)
    this.uLen = new Int32Array(n)
    ;(this as { totals: Float64Array }).totals = new Float64Array(n)
    return this.totals
  }

  get spanCount(): number {
    return this.stall.count + this.usage.count
  }

  /** Lane `lane` waited in cycle c for `inst` because of reason index `reason`. */
  stallAt(lane: number, c: number, reason: number, inst: number): void {
    this.stallTotals[reason] = (this.stallTotals[reason] ?? 0) + 1
    const open = this.sReason[lane] ?? -1
    if (open === reason && this.sInst[lane] === inst && (this.sStart[lane] ?? 0) + (this.sLen[lane] ?? 0) === c) {
      this.sLen[lane] = (this.sLen[lane] ?? 0) + 1
      return
    }
    if (open >= 0) this.flushStall(lane)
    this.sReason[lane] = reason
    this.sInst[lane] = inst
    this.sStart[lane] = c
    this.sLen[lane] = 1
  }

  private flushStall(lane: number): void {
    const t = this.stall
    const i = t.push()
    t.set(S_START, i, this.sStart[lane] ?? 0)
    t.set(S_LEN, i, this.sLen[lane] ?? 0)
    t.set(S_INST, i, this.sInst[lane] ?? 0)
    t.set(S_REASON, i, this.sReason[lane] ?? 0)
    t.set(S_LANE, i, lane)
    this.sReason[lane] = -1
  }

  /**
   * `inst` uses `amount` of resource r over `len` cycles from c. Uses of one
   * instruction in consecutive cycles with the same amount merge into one span.
   */
  use(r: number, c: number, amount: number, inst: number, len = 1): void {
    this.totals[r] = (this.totals[r] ?? 0) + amount * len
    if (!this.recordUsage) return
    const oi = this.uInst[r] ?? -1
    const os = this.uStart[r] ?? 0
    const ol = this.uLen[r] ?? 0
    if (oi === inst && len === 1) {
      if (os + ol === c && this.uAmt[r] === amount) {
        this.uLen[r] = ol + 1
        return
      }
      if (os + ol - 1 === c && os <= c) {
        // A second use in the same cycle: add it to that cycle's amount.
        if (ol === 1) {
          this.uAmt[r] = (this.uAmt[r] ?? 0) + amount
          return
        }
        this.uLen[r] = ol - 1
        const total = (this.uAmt[r] ?? 0) + amount
        this.flushUse(r)
        this.open(r, c, total, inst, 1)
        return
      }
    }
    if (oi >= 0) this.flushUse(r)
    this.open(r, c, amount, inst, len)
  }

  private open(r: number, c: number, amount: number, inst: number, len: number): void {
    this.uInst[r] = inst
    this.uAmt[r] = amount
    this.uStart[r] = c
    this.uLen[r] = len
  }

  private flushUse(r: number): void {
    const t = this.usage
    const i = t.push()
    t.set(U_START, i, this.uStart[r] ?? 0)
    t.set(U_LEN, i, this.uLen[r] ?? 0)
    t.set(U_INST, i, this.uInst[r] ?? 0)
    t.set(U_AMOUNT, i, this.uAmt[r] ?? 0)
    t.set(U_RESOURCE, i, r)
    this.uInst[r] = -1
  }

  /** Closes the open spans and returns them sorted by start cycle. */
  finish(): { stalls: StallSpans; usage: UsageSpans } {
    for (let l = 0; l < this.sReason.length; l++) if ((this.sReason[l] ?? -1) >= 0) this.flushStall(l)
    if (this.recordUsage) for (let r = 0; r < this.resources.length; r++) if ((this.uInst[r] ?? -1) >= 0) this.flushUse(r)
    const s = this.stall
    const so = order(s, S_START)
    const u = this.usage
    const uo = order(u, U_START)
    return {
      stalls: {
        count: s.count,
        start: s.column(S_START, so, Int32Array),
        length: s.column(S_LEN, so, Int32Array),
        instruction: s.column(S_INST, so, Int32Array),
        reason: s.column(S_REASON, so, Uint8Array),
        lane: s.column(S_LANE, so, Uint16Array),
      },
      usage: {
        count: u.count,
        start: u.column(U_START, uo, Int32Array),
        length: u.column(U_LEN, uo, Int32Array),
        instruction: u.column(U_INST, uo, Int32Array),
        amount: u.column(U_AMOUNT, uo, Uint16Array),
        resource: u.column(U_RESOURCE, uo, Uint32Array),
      },
    }
  }
}

/** Row order by start cycle, stable: a counting sort, as starts are cycle numbers. */
function order(t: Columns, k: number): Uint32Array {
  const n = t.count
  let max = 0
  for (let i = 0; i < n; i++) max = Math.max(max, t.get(k, i))
  const counts = new Uint32Array(max + 2)
  for (let i = 0; i < n; i++) {
    const b = t.get(k, i) + 1
    counts[b] = (counts[b] ?? 0) + 1
  }
  for (let b = 1; b < counts.length; b++) counts[b] = (counts[b] ?? 0) + (counts[b - 1] ?? 0)
  const idx = new Uint32Array(n)
  for (let i = 0; i < n; i++) {
    const b = t.get(k, i)
    idx[counts[b] ?? 0] = i
    counts[b] = (counts[b] ?? 0) + 1
  }
  return idx
}
