/**
 * What every structure of the model shares during a run: the derived machine,
 * the register file, renaming, the recorder, per-lane unit state and the
 * per-cycle notes from which stalls are classified.
 */
import type { Machine } from '../../schemas/machine'
import { STALL_RANK } from '../trace/types'
import type { Derived } from './config'
import { Arena } from './arena'
import type { InstState } from './inst'
import { UNIT_COUNT, UNITS } from './config'
import type { SpanRecorder } from './recorder'
import type { RegFile } from './regfile'
import type { Renamer } from './rename'

/** Called by an instruction when it is finished everywhere. */
export interface CompletionSink {
  completed(seq: number, c: number): void
  laneFinished(lane: number, seq: number, tookSlot: boolean): void
}

export class Ctx {
  readonly m: Machine
  readonly L: number
  /** [lane][unit]: first cycle the unit can take a beat. */
  readonly unitFree: Int32Array
  /** [lane][unit] resource ids. */
  readonly unitRes: Int32Array
  /** [lane][bank] resource ids. */
  readonly bankRes: Int32Array
  /** Ring links: up[l] carries lane l -> l+1, down[l] carries lane l+1 -> l (mod L). */
  readonly linkUpRes: Int32Array
  readonly linkDownRes: Int32Array
  readonly loadBusRes: number
  readonly storeBusRes: number
  /**
   * Machine fields read every cycle, copied once: the one-lane plan's machine
   * (symmetry.ts) is an object of another shape than a parsed one, and a
   * property read that has seen both is slower.
   */
  readonly loadBusBits: number
  readonly storeBusBits: number
  readonly ringHopLatency: number
  /** Bits the load and store buses still carry in `busCycle` (accesses take them oldest first). */
  private loadBusLeft = 0
  private storeBusLeft = 0
  private busCycle = -1
  /** Lanes of the machine each timed lane stands for (1 each unless symmetry.ts groups alike lanes). */
  readonly laneWeight: Int32Array
  /** Per lane, this cycle: did the lane read, execute, write or hold results in flight. */
  readonly progress: Uint8Array
  /** The cycle being stepped (notes are only valid within it). */
  cycle = 0
  /** Per lane, this cycle: the instructions denied something (each holds its reason in `noteReason`), in note order. */
  readonly denied: InstState[][]
  readonly deniedCount: Int32Array
  /** Per lane, this cycle: the oldest instruction waiting out a latency (load data, ring values) and why. */
  readonly waitSeq: Int32Array
  readonly waitReason: Int8Array
  /** Per lane, this cycle: the oldest instruction in its read phase, and the arithmetic instruction refused a start. */
  readonly reader: (InstState | null)[]
  readonly refused: (InstState | null)[]
  /** Link bookings: [link][cycle mod RING_HORIZON] = cycle booked. */
  readonly upBook: Int32Array
  readonly downBook: Int32Array
  /** Per lane: the instructions started and not finished there, oldest first (kept by Inst). */
  readonly laneActive: InstState[][]
  sink!: CompletionSink
  /** The typed arrays of the run's instructions (arena.ts). */
  readonly arena = new Arena()

  constructor(
    readonly d: Derived,
    readonly rf: RegFile,
    readonly ren: Renamer,
    readonly rec: SpanRecorder,
    readonly laneTimes: Int32Array,
  ) {
    this.m = d.machine
    this.loadBusBits = this.m.loadBusBits
    this.storeBusBits = this.m.storeBusBits
    this.ringHopLatency = this.m.ringHopLatency
    const L = (this.L = d.lanes)
    this.unitFree = new Int32Array(L * UNIT_COUNT)
    this.unitRes = new Int32Array(L * UNIT_COUNT)
    this.bankRes = new Int32Array(L * d.banks)
    for (let l = 0; l < L; l++) {
      UNITS.forEach((u, k) => {
        this.unitRes[l * UNIT_COUNT + k] = rec.addResource({ kind: 'unit', name: `lane ${l} ${u}`, lane: l, capacity: 1 })
      })
      for (let b = 0; b < d.banks; b++) {
        this.bankRes[l * d.banks + b] = rec.addResource({ kind: 'bank', name: `lane ${l} bank ${b}`, lane: l, capacity: d.ports })
      }
    }
    const links = L > 1 ? L : 0
    this.linkUpRes = new Int32Array(links)
    this.linkDownRes = new Int32Array(links)
    for (let l = 0; l < links; l++) {
      this.linkUpRes[l] = rec.addResource({ kind: 'ring', name: `ring ${l}->${(l + 1) % L}`, lane: l, capacity: 1 })
      this.linkDownRes[l] = rec.addResource({ kind: 'ring', name: `ring ${(l + 1) % L}->${l}`, lane: (l + 1) % L, capacity: 1 })
    }
    // One load bus and one store bus, shared by every memory port (timing model section 7). The names keep
    // their index 0 from when each port had its own bus.
    this.loadBusRes = rec.addResource({ kind: 'bus', name: 'load bus 0', lane: null, capacity: this.m.loadBusBits })
    this.storeBusRes = rec.addResource({ kind: 'bus', name: 'store bus 0', lane: null, capacity: this.m.storeBusBits })
    rec.seal()
    this.laneWeight = new Int32Array(L).fill(1)
    this.progress = new Uint8Array(L)
    this.denied = Array.from({ length: L }, () => [])
    this.deniedCount = new Int32Array(L)
    this.waitSeq = new Int32Array(L)
    this.waitReason = new Int8Array(L)
    this.reader = new Array<InstState | null>(L).fill(null)
    this.refused = new Array<InstState | null>(L).fill(null)
    this.upBook = new Int32Array(links * RING_HORIZON).fill(-1)
    this.downBook = new Int32Array(links * RING_HORIZON).fill(-1)
    this.laneActive = Array.from({ length: L }, () => [])
  }

  /**
   * `inst` asked for something in `lane` this cycle and was refused (a port, a
   * queue entry, a word not yet written, a start, a link). An instruction
   * refused several things in one lane-cycle keeps the strongest reason
   * (`STALL_RANK`).
   */
  deny(lane: number, inst: InstState, reason: number): void {
    const c = this.cycle
    if (inst.noteCycle[lane] !== c) {
      inst.noteCycle[lane] = c
      inst.noteReason[lane] = reason
      const n = this.deniedCount[lane] ?? 0
      ;(this.denied[lane] as InstState[])[n] = inst
      this.deniedCount[lane] = n + 1
    } else if ((RANK[reason] ?? 0) < (RANK[inst.noteReason[lane] ?? 0] ?? 0)) inst.noteReason[lane] = reason
  }

  /** `inst` waits out a latency in `lane` (load data, values from other lanes): a stall only of a lane that did nothing. */
  wait(lane: number, seq: number, reason: number): void {
    if (seq < (this.waitSeq[lane] ?? 0)) {
      this.waitSeq[lane] = seq
      this.waitReason[lane] = reason
    }
  }

  /** Bits the load (or store) bus can still carry in cycle c. */
  busLeft(store: boolean, c: number): number {
    if (this.busCycle !== c) {
      this.busCycle = c
      this.loadBusLeft = this.loadBusBits
      this.storeBusLeft = this.storeBusBits
    }
    return store ? this.storeBusLeft : this.loadBusLeft
  }

  /**
   * An access moves `bits` on the load (or store) bus in cycle c (after
   * busLeft in the same cycle); `machineBits` is what the machine's bus
   * carries for them (more when the timed lanes stand for several, symmetry.ts).
   */
  takeBus(store: boolean, c: number, bits: number, machineBits: number, seq: number): void {
    if (store) this.storeBusLeft -= bits
    else this.loadBusLeft -= bits
    this.rec.use(store ? this.storeBusRes : this.loadBusRes, c, machineBits, seq)
  }

  busyLane(lane: number): void {
    this.progress[lane] = 1
  }

  /** Books link `link` (up or down) in cycle c if free; true when booked. */
  bookLink(up: boolean, link: number, c: number, seq: number): boolean {
    const book = up ? this.upBook : this.downBook
    const k = link * RING_HORIZON + (c % RING_HORIZON)
    if (book[k] === c) return false
    book[k] = c
    this.rec.use((up ? this.linkUpRes : this.linkDownRes)[link] ?? 0, c, 1, seq)
    return true
  }

  linkFree(up: boolean, link: number, c: number): boolean {
    return (up ? this.upBook : this.downBook)[link * RING_HORIZON + (c % RING_HORIZON)] !== c
  }
}

// A module binding may cost a getter call per use in the per-cycle paths: copied once.
const RANK: Int8Array = STALL_RANK

/** Bookings reach at most lanes x ringHopLatency (64 x 16) cycles ahead. */
export const RING_HORIZON = 2048
