/**
 * Run-length encoding of what the lanes did: stall spans per lane and
 * resource-use spans per resource, in growable typed arrays, plus the totals
 * the metrics need. Nothing here is per cycle and lane.
 */
import type { ResourceInfo, StallSpans, UsageSpans } from '../trace/types'

class Growable {
  i32: Int32Array[]
  u8: Uint8Array[]
  u16: Uint16Array[]
  u32: Uint32Array[]
  count = 0
  cap: number
  constructor(n32: number, n8: number, n16: number, nu32: number, cap = 1024) {
    this.cap = cap
    this.i32 = Array.from({ length: n32 }, () => new Int32Array(cap))
    this.u8 = Array.from({ length: n8 }, () => new Uint8Array(cap))
    this.u16 = Array.from({ length: n16 }, () => new Uint16Array(cap))
    this.u32 = Array.from({ length: nu32 }, () => new Uint32Array(cap))
  }
  /** Index of a new row. */
  push(): number {
    if (this.count === this.cap) {
      const cap = this.cap * 2
      const grow = <T extends Int32Array | Uint8Array | Uint16Array | Uint32Array>(a: T, make: (n: number) => T): T => {
        const b = make(cap)
        b.set(a)
        return b
      }
      this.i32 = this.i32.map((a) => grow(a, (n) => new Int32Array(n)))
      this.u8 = this.u8.map((a) => grow(a, (n) => new Uint8Array(n)))
      this.u16 = this.u16.map((a) => grow(a, (n) => new Uint16Array(n)))
      this.u32 = this.u32.map((a) => grow(a, (n) => new Uint32Array(n)))
      this.cap = cap
    }
    return this.count++
  }
}

export class Recorder {
  readonly resources: ResourceInfo[] = []
  /** Uses summed over the run, per resource. */
  readonly totals: Float64Array
  readonly recordUsage: boolean
  private readonly stall = new Growable(3, 1, 1, 0) // start, length, instruction | reason | lane
  private readonly usage = new Growable(3, 0, 1, 1) // start, length, instruction | amount | resource
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
    const i = this.stall.push()
    const [start, len, inst] = this.stall.i32 as [Int32Array, Int32Array, Int32Array]
    start[i] = this.sStart[lane] ?? 0
    len[i] = this.sLen[lane] ?? 0
    inst[i] = this.sInst[lane] ?? 0
    ;(this.stall.u8[0] as Uint8Array)[i] = this.sReason[lane] ?? 0
    ;(this.stall.u16[0] as Uint16Array)[i] = lane
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
    const i = this.usage.push()
    const [start, len, inst] = this.usage.i32 as [Int32Array, Int32Array, Int32Array]
    start[i] = this.uStart[r] ?? 0
    len[i] = this.uLen[r] ?? 0
    inst[i] = this.uInst[r] ?? 0
    ;(this.usage.u16[0] as Uint16Array)[i] = this.uAmt[r] ?? 0
    ;(this.usage.u32[0] as Uint32Array)[i] = r
    this.uInst[r] = -1
  }

  /** Closes the open spans and returns them sorted by start cycle. */
  finish(): { stalls: StallSpans; usage: UsageSpans } {
    for (let l = 0; l < this.sReason.length; l++) if ((this.sReason[l] ?? -1) >= 0) this.flushStall(l)
    if (this.recordUsage) for (let r = 0; r < this.resources.length; r++) if ((this.uInst[r] ?? -1) >= 0) this.flushUse(r)
    const s = this.stall
    const so = order(s.i32[0] as Int32Array, s.count)
    const u = this.usage
    const uo = order(u.i32[0] as Int32Array, u.count)
    return {
      stalls: {
        count: s.count,
        start: pick(s.i32[0] as Int32Array, so, Int32Array),
        length: pick(s.i32[1] as Int32Array, so, Int32Array),
        instruction: pick(s.i32[2] as Int32Array, so, Int32Array),
        reason: pick(s.u8[0] as Uint8Array, so, Uint8Array),
        lane: pick(s.u16[0] as Uint16Array, so, Uint16Array),
      },
      usage: {
        count: u.count,
        start: pick(u.i32[0] as Int32Array, uo, Int32Array),
        length: pick(u.i32[1] as Int32Array, uo, Int32Array),
        instruction: pick(u.i32[2] as Int32Array, uo, Int32Array),
        amount: pick(u.u16[0] as Uint16Array, uo, Uint16Array),
        resource: pick(u.u32[0] as Uint32Array, uo, Uint32Array),
      },
    }
  }
}

/** Row order by start cycle, stable: a counting sort, as starts are cycle numbers. */
function order(start: Int32Array, n: number): Uint32Array {
  let max = 0
  for (let i = 0; i < n; i++) if ((start[i] ?? 0) > max) max = start[i] ?? 0
  const counts = new Uint32Array(max + 2)
  for (let i = 0; i < n; i++) counts[(start[i] ?? 0) + 1] = (counts[(start[i] ?? 0) + 1] ?? 0) + 1
  for (let k = 1; k < counts.length; k++) counts[k] = (counts[k] ?? 0) + (counts[k - 1] ?? 0)
  const idx = new Uint32Array(n)
  for (let i = 0; i < n; i++) {
    const k = start[i] ?? 0
    idx[counts[k] ?? 0] = i
    counts[k] = (counts[k] ?? 0) + 1
  }
  return idx
}

function pick<T extends Int32Array | Uint8Array | Uint16Array | Uint32Array>(
  a: T,
  idx: Uint32Array,
  Make: new (n: number) => T,
): T {
  const out = new Make(idx.length)
  for (let i = 0; i < idx.length; i++) out[i] = a[idx[i] ?? 0] ?? 0
  return out
}
