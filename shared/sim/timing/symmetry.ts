/**
 * Lanes that do the same work, timed once. A run's lanes fall into classes
 * of consecutive lanes that hold the same number of elements in every
 * instruction: with vl = q x L + r, lanes below r hold q + 1 elements and the
 * others q, so the cuts are the remainders r of the run's instructions (one
 * class when every vl is a multiple of L; two for a ragged tail). When every
 * instruction is element-wise, mask or unit-stride memory work (no masks, no
 * reductions or permutations, whose lanes meet over the ring), lanes of one
 * class go through the same history cycle for cycle: the bank of word w of
 * physical register p, (p + w) mod rfBanks, does not depend on the lane, and
 * a unit-stride access whose bus moves a multiple of L elements a cycle gives
 * every lane its k-th element in the same cycle. Such a run is timed on a
 * machine of one lane per class (the same words per register, an op's vl
 * giving each timed lane its class's elements, buses K/L as wide) and the
 * result replicated to every lane of each class: phase times, stalls,
 * totals; a usage row of a lane resource stands for the class's lanes
 * (UsageSpans.copies) instead of being copied. The timed lanes carry their
 * class's size as a weight wherever the run counts lanes (stall totals and
 * per-instruction stalls, the span limit, bus amounts). With several memory
 * ports, accesses share a bus cycle and split it by elements, so there every
 * memory access must give all lanes alike (vl a multiple of L) and all share
 * one EEW. The golden corpus and tests/sim/timing/identical-lanes.test.ts
 * check that this gives the very trace of the full run.
 */
import type { Machine } from '../../schemas/machine'
import type { DynamicStream, VectorOp } from '../exec/stream'
import type { StallSpans, UsageSpans } from '../trace/types'
import { LANE_FIELD_COUNT } from '../trace/types'
import { UNIT_COUNT } from './config'
import type { Ctx } from './context'
import { isMemoryOp } from './op-class'

export interface LanePlan {
  /** Timed lane j stands for the lanes first[j] .. first[j] + size[j] - 1 of the machine. */
  first: Int32Array
  size: Int32Array
  stream: DynamicStream
  machine: Machine
}

function groupableOp(op: VectorOp, m: Machine, L: number): boolean {
  if (op.isConfig) return true
  if (op.masked || op.active || op.scalarResult) return false
  if (isMemoryOp(op)) {
    const mem = op.memory
    if (!mem || (mem.pattern !== 'unit' && mem.pattern !== 'mask')) return false
    // A segment's fields share the bus rows, so lanes get their elements in different cycles.
    if ((op.nf ?? 1) > 1) return false
    const perCycle = (mem.isStore ? m.storeBusBits : m.loadBusBits) / op.eew
    return Number.isInteger(perCycle) && perCycle % L === 0
  }
  return op.shape === 'elementwise' || op.shape === 'mask'
}

/** The plan timing one lane per class of alike lanes, or null when every lane must be timed (or no two are alike). */
export function lanePlan(stream: DynamicStream, m: Machine): LanePlan | null {
  const L = m.lanes
  if (L <= 1) return null
  // cut[b] = 1: a class starts at lane b.
  const cut = new Uint8Array(L + 1)
  cut[0] = 1
  let raggedMemory = false
  const eews = new Set<number>()
  for (const op of stream.ops) {
    if (!groupableOp(op, m, L)) return null
    if (op.isConfig) continue
    const r = op.vl % L
    cut[r] = 1
    if (isMemoryOp(op)) {
      eews.add(op.eew)
      if (r !== 0) raggedMemory = true
    }
  }
  // Accesses overlapping on a shared bus split each cycle's bits: alike lanes only if every access is whole rows of one EEW.
  if (m.memoryPorts > 1 && (raggedMemory || eews.size > 1)) return null
  const first: number[] = []
  // below[r]: classes that start below lane r, i.e. the timed lanes holding q + 1 elements when vl mod L = r.
  const below = new Int32Array(L + 1)
  for (let b = 0; b < L; b++) {
    below[b] = first.length
    if (cut[b] === 1) first.push(b)
  }
  const K = first.length
  if (K === L) return null
  const size = Int32Array.from(first, (b, j) => (first[j + 1] ?? L) - b)
  const ops = stream.ops.map((op) => (op.isConfig ? op : { ...op, vl: Math.floor(op.vl / L) * K + (below[op.vl % L] ?? 0) }))
  const machine: Machine = {
    ...m,
    lanes: K,
    vlen: Math.ceil(m.vlen / 64 / L) * 64 * K,
    loadBusBits: (m.loadBusBits * K) / L,
    storeBusBits: (m.storeBusBits * K) / L,
  }
  return { first: Int32Array.from(first), size, stream: { ...stream, ops }, machine }
}

/**
 * The timed context's resources as ids of the full context: a lane resource
 * (unit, bank) of timed lane j becomes `base[r] + l * perLane` in each lane l
 * of class j (the full context declares each lane's units and banks in turn);
 * a bus keeps its one id (`lane[r]` -1). Ring links are never used by a
 * planned run (`lane[r]` -2: nothing to copy).
 */
function resourceMap(one: Ctx, full: Ctx): { base: Int32Array; lane: Int32Array; perLane: number } {
  const n = one.rec.resources.length
  const base = new Int32Array(n)
  const lane = new Int32Array(n).fill(-2)
  const perLane = (full.unitRes[UNIT_COUNT] ?? 0) - (full.unitRes[0] ?? 0)
  const banks = full.d.banks
  for (let j = 0; j < one.L; j++) {
    for (let u = 0; u < UNIT_COUNT; u++) {
      const r = one.unitRes[j * UNIT_COUNT + u] ?? 0
      base[r] = full.unitRes[u] ?? 0
      lane[r] = j
    }
    for (let b = 0; b < banks; b++) {
      const r = one.bankRes[j * banks + b] ?? 0
      base[r] = full.bankRes[b] ?? 0
      lane[r] = j
    }
  }
  base[one.loadBusRes] = full.loadBusRes
  lane[one.loadBusRes] = -1
  base[one.storeBusRes] = full.storeBusRes
  lane[one.storeBusRes] = -1
  return { base, lane, perLane }
}

/**
 * Spreads the timed run's totals (resource uses, stall cycles) over the full
 * context: all its metrics need. Stall totals and bus amounts were weighted by
 * class size when recorded.
 */
export function spreadTotals(one: Ctx, full: Ctx, plan: Pick<LanePlan, 'first' | 'size'>): void {
  const { first, size } = plan
  const { base, lane, perLane } = resourceMap(one, full)
  const tot = one.rec.totals
  for (let r = 0; r < base.length; r++) {
    const j = lane[r] ?? -2
    if (j === -1) full.rec.totals[base[r] ?? 0] = tot[r] ?? 0
    else if (j >= 0) {
      const f = first[j] ?? 0
      for (let l = f; l < f + (size[j] ?? 0); l++) full.rec.totals[(base[r] ?? 0) + l * perLane] = tot[r] ?? 0
    }
  }
  full.rec.stallTotals.set(one.rec.stallTotals)
}

/**
 * The timed run's stall spans and phase times for every lane of each class
 * (after spreadTotals), and its usage spans with each row standing for its
 * class's lanes. Spans stay sorted by start.
 */
export function replicate(
  one: Ctx,
  full: Ctx,
  spans: { stalls: StallSpans; usage: UsageSpans },
  plan: Pick<LanePlan, 'first' | 'size'>,
): { stalls: StallSpans; usage: UsageSpans; laneTimes: Int32Array } {
  const L = full.L
  const K = one.L
  const { first, size } = plan
  const { base, lane, perLane } = resourceMap(one, full)
  const s = spans.stalls
  let sn = 0
  for (let i = 0; i < s.count; i++) sn += size[s.lane[i] ?? 0] ?? 0
  const stalls: StallSpans = {
    count: sn,
    lane: new Uint16Array(sn),
    start: new Int32Array(sn),
    length: new Int32Array(sn),
    reason: new Uint8Array(sn),
    instruction: new Int32Array(sn),
  }
  const sLane = stalls.lane
  const sStart = stalls.start
  const sLength = stalls.length
  const sReason = stalls.reason
  const sInst = stalls.instruction
  for (let i = 0, o = 0; i < s.count; i++) {
    const st = s.start[i] ?? 0
    const len = s.length[i] ?? 0
    const why = s.reason[i] ?? 0
    const inst = s.instruction[i] ?? 0
    const j = s.lane[i] ?? 0
    const f = first[j] ?? 0
    const e = f + (size[j] ?? 0)
    for (let l = f; l < e; l++, o++) {
      sLane[o] = l
      sStart[o] = st
      sLength[o] = len
      sReason[o] = why
      sInst[o] = inst
    }
  }
  // A row of a lane resource stands for the same resource in each lane of its class (UsageSpans.copies): no row is copied.
  const u = spans.usage
  const copiesOf = new Uint16Array(base.length)
  const firstId = new Int32Array(base.length)
  for (let r = 0; r < base.length; r++) {
    const j = lane[r] as number
    copiesOf[r] = j >= 0 ? (size[j] as number) : 1
    firstId[r] = (base[r] as number) + (j >= 0 ? (first[j] as number) * perLane : 0)
  }
  const resource = new Uint32Array(u.count)
  const copies = new Uint16Array(u.count)
  for (let i = 0; i < u.count; i++) {
    const r = u.resource[i] as number
    resource[i] = firstId[r] as number
    copies[i] = copiesOf[r] as number
  }
  const usage: UsageSpans = { ...u, resource, copies, copyStride: perLane }
  const t1 = one.laneTimes
  const ops = t1.length / (K * LANE_FIELD_COUNT)
  const laneTimes = new Int32Array(ops * L * LANE_FIELD_COUNT)
  const F = LANE_FIELD_COUNT
  // Element by element: a subarray per row and class was a typed-array object each, thousands per run.
  for (let k = 0; k < ops; k++) {
    for (let j = 0; j < K; j++) {
      const at = (k * K + j) * F
      const f = first[j] ?? 0
      for (let l = f; l < f + (size[j] ?? 0); l++) {
        const to = (k * L + l) * F
        for (let x = 0; x < F; x++) laneTimes[to + x] = t1[at + x] as number
      }
    }
  }
  return { stalls, usage, laneTimes }
}
