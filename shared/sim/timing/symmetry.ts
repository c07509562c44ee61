/**
 * Identical lanes, timed once. When every instruction of a run gives every
 * lane the same work (vl a multiple of the lane count, no masks, only
 * element-wise, mask and unit-stride memory instructions whose bus moves a
 * multiple of the lane count each cycle, all of one EEW when several memory
 * ports share the buses), every lane holds the same elements
 * in the same banks and goes through the same history, cycle for cycle: the
 * bank of word w of physical register p, (p + w) mod rfBanks, does not depend
 * on the lane. Such a run is timed on one lane (a machine with lanes = 1, the
 * same words per register, and buses 1/L as wide) and the result replicated
 * to every lane: phase times, stalls, usage spans of lane resources, totals;
 * bus amounts are scaled by L. The golden corpus checks that this gives the
 * very trace of the full run.
 */
import type { Machine } from '../../schemas/machine'
import type { DynamicStream, VectorOp } from '../exec/stream'
import type { StallSpans, UsageSpans } from '../trace/types'
import { LANE_FIELD_COUNT } from '../trace/types'
import { UNIT_COUNT } from './config'
import type { Ctx } from './context'

export interface LanePlan {
  /** Lanes each timed lane stands for. */
  factor: number
  stream: DynamicStream
  machine: Machine
}

function symmetricOp(op: VectorOp, m: Machine, L: number): boolean {
  if (op.isConfig) return true
  if (op.vl % L !== 0 || op.masked || op.active || op.scalarResult) return false
  const memoryUnit = op.unit === 'load' || op.unit === 'store'
  if (op.memory || memoryUnit) {
    const mem = op.memory
    if (!mem || (mem.pattern !== 'unit' && mem.pattern !== 'mask')) return false
    const perCycle = (mem.isStore ? m.storeBusBits : m.loadBusBits) / op.eew
    return Number.isInteger(perCycle) && perCycle % L === 0
  }
  return op.shape === 'elementwise' || op.shape === 'mask'
}

/** The one-lane plan of a run whose lanes all do the same, or null. */
export function lanePlan(stream: DynamicStream, m: Machine): LanePlan | null {
  const L = m.lanes
  if (L <= 1) return null
  for (const op of stream.ops) if (!symmetricOp(op, m, L)) return null
  // Accesses overlapping on a shared bus split each cycle's bits: whole elements for every lane only if they share an EEW.
  if (m.memoryPorts > 1 && new Set(stream.ops.filter((op) => !!op.memory || op.unit === 'load' || op.unit === 'store').map((op) => op.eew)).size > 1) return null
  const ops = stream.ops.map((op) => (op.isConfig ? op : { ...op, vl: op.vl / L }))
  const machine: Machine = {
    ...m,
    lanes: 1,
    vlen: Math.ceil(m.vlen / 64 / L) * 64,
    loadBusBits: m.loadBusBits / L,
    storeBusBits: m.storeBusBits / L,
  }
  return { factor: L, stream: { ...stream, ops }, machine }
}

/**
 * Lane 0's resource r in the one-lane context as ids of the full context: a
 * lane resource (unit, bank) becomes `base[r] + l * stride` in lane l (the full
 * context declares each lane's units and banks in turn); a bus keeps one id
 * (`stride[r]` 0) and its amount is scaled by L.
 */
function resourceMap(one: Ctx, full: Ctx): { base: Int32Array; stride: Int32Array } {
  const n = one.rec.resources.length
  const base = new Int32Array(n)
  const stride = new Int32Array(n)
  const perLane = (full.unitRes[UNIT_COUNT] ?? 0) - (full.unitRes[0] ?? 0)
  for (let u = 0; u < UNIT_COUNT; u++) {
    base[one.unitRes[u] ?? 0] = full.unitRes[u] ?? 0
    stride[one.unitRes[u] ?? 0] = perLane
  }
  for (let b = 0; b < full.d.banks; b++) {
    base[one.bankRes[b] ?? 0] = full.bankRes[b] ?? 0
    stride[one.bankRes[b] ?? 0] = perLane
  }
  base[one.loadBusRes] = full.loadBusRes
  base[one.storeBusRes] = full.storeBusRes
  return { base, stride }
}

/** Spreads the one-lane run's figures over the full context (totals) and returns its spans, per lane, sorted by start as before. */
export function replicate(
  one: Ctx,
  full: Ctx,
  spans: { stalls: StallSpans; usage: UsageSpans },
): { stalls: StallSpans; usage: UsageSpans; laneTimes: Int32Array } {
  const L = full.L
  const { base, stride } = resourceMap(one, full)
  const tot = one.rec.totals
  for (let r = 0; r < base.length; r++) {
    const st = stride[r] ?? 0
    if (st === 0) full.rec.totals[base[r] ?? 0] = (tot[r] ?? 0) * L
    else for (let l = 0; l < L; l++) full.rec.totals[(base[r] ?? 0) + l * st] = tot[r] ?? 0
  }
  one.rec.stallTotals.forEach((v, k) => (full.rec.stallTotals[k] = v * L))
  const s = spans.stalls
  const sn = s.count * L
  const stalls: StallSpans = {
    count: sn,
    lane: new Uint16Array(sn),
    start: new Int32Array(sn),
    length: new Int32Array(sn),
    reason: new Uint8Array(sn),
    instruction: new Int32Array(sn),
  }
  for (let i = 0, o = 0; i < s.count; i++) {
    const st = s.start[i] ?? 0
    const len = s.length[i] ?? 0
    const why = s.reason[i] ?? 0
    const inst = s.instruction[i] ?? 0
    for (let l = 0; l < L; l++, o++) {
      stalls.lane[o] = l
      stalls.start[o] = st
      stalls.length[o] = len
      stalls.reason[o] = why
      stalls.instruction[o] = inst
    }
  }
  const u = spans.usage
  let n = 0
  for (let i = 0; i < u.count; i++) n += (stride[u.resource[i] ?? 0] ?? 0) === 0 ? 1 : L
  const resource = new Uint32Array(n)
  const start = new Int32Array(n)
  const length = new Int32Array(n)
  const amount = new Uint16Array(n)
  const instruction = new Int32Array(n)
  const writes = new Uint32Array(n)
  const w1 = u.writes
  for (let i = 0, o = 0; i < u.count; i++) {
    const r = u.resource[i] ?? 0
    const st = stride[r] ?? 0
    const copies = st === 0 ? 1 : L
    const id = base[r] ?? 0
    const a = (u.amount[i] ?? 0) * (st === 0 ? L : 1)
    const c0 = u.start[i] ?? 0
    const len = u.length[i] ?? 0
    const inst = u.instruction[i] ?? 0
    const wr = w1 ? (w1[i] ?? 0) : 0
    for (let l = 0; l < copies; l++, o++) {
      resource[o] = id + l * st
      start[o] = c0
      length[o] = len
      amount[o] = a
      instruction[o] = inst
      writes[o] = wr
    }
  }
  const usage: UsageSpans = { count: n, resource, start, length, amount, instruction, writes }
  const t1 = one.laneTimes
  const ops = t1.length / LANE_FIELD_COUNT
  const laneTimes = new Int32Array(ops * L * LANE_FIELD_COUNT)
  for (let k = 0; k < ops; k++) {
    const row = t1.subarray(k * LANE_FIELD_COUNT, (k + 1) * LANE_FIELD_COUNT)
    for (let l = 0; l < L; l++) laneTimes.set(row, (k * L + l) * LANE_FIELD_COUNT)
  }
  return { stalls, usage, laneTimes }
}
