/**
 * The register file's banks, to see why a bank count helps or hurts. Word w
 * of physical register p of a lane sits in bank (p + w) mod banks (docs/model.md;
 * the handbook's register-file layout), so an instruction reading two
 * operands whose words fall in one bank in the same cycle needs two ports
 * there. From the trace: each bank's port use over the cycles in view (the
 * usage spans of its `bank` resources, summed over lanes), the lanes' bank
 * stalls (denials) in the same buckets, and for one instruction where it was
 * refused a bank and who held the ports of that lane's banks then.
 *
 * @example
 *   bankOfWord(8, 3, 5) // 1: word 3 of v8 is in bank (8 + 3) mod 5
 */
import { STALL_REASONS, usageCopies, type TimingTrace } from '@shared/sim/trace/types'
import type { CycleWindow } from '@/lib/lanechart/window'

export function bankOfWord(register: number, word: number, banks: number): number {
  return (register + word) % banks
}

/** Words of one vector register held by one lane: VLEN / 64 / lanes, at least one. */
export function wordsPerLane(trace: TimingTrace): number {
  return Math.max(1, Math.floor(trace.machine.vlen / 64 / trace.laneCount))
}

interface BankResource {
  id: number
  lane: number
  bank: number
  capacity: number
}

function bankResources(trace: TimingTrace): BankResource[] {
  return trace.resources.flatMap((r) => {
    const m = r.kind === 'bank' ? /bank (\d+)$/.exec(r.name) : null
    return m && r.lane !== null ? [{ id: r.id, lane: r.lane, bank: Number(m[1]), capacity: r.capacity }] : []
  })
}

export interface BankHeat {
  banks: number
  buckets: number
  /** Cycles per bucket. */
  width: number
  /** use[bank * buckets + k]: port-cycles used over port-cycles available in bucket k (all lanes), 0..1. */
  use: Float32Array
  /** denied[k]: lane-cycles of bank stalls in bucket k. */
  denied: Float32Array
  /** The busiest share of any bank (for the caption). */
  peak: number
}

/** Port use per bank and bank denials over `window`, in `buckets` columns. */
export function bankHeat(trace: TimingTrace, window: CycleWindow, buckets: number): BankHeat {
  const banks = trace.machine.rfBanks
  const start = Math.floor(window.start)
  const end = Math.max(start + 1, Math.ceil(window.end))
  const n = Math.max(1, Math.min(buckets, end - start))
  const width = (end - start) / n
  const use = new Float32Array(banks * n)
  const denied = new Float32Array(n)
  const res = new Map(bankResources(trace).map((r) => [r.id, r]))
  // Adds `amount` per cycle over [s, e) into the buckets it covers.
  const spread = (s: number, e: number, amount: number, into: Float32Array, row: number) => {
    const a = Math.max(s, start)
    const b = Math.min(e, end)
    for (let c = a; c < b; ) {
      const k = Math.min(n - 1, Math.floor((c - start) / width))
      const next = Math.min(b, start + (k + 1) * width)
      const span = Math.max(1e-9, next - c)
      into[row * n + k]! += amount * span
      c = next > c ? next : c + 1
    }
  }
  const u = trace.usage
  for (let i = 0; i < u.count; i++) {
    const r = res.get(u.resource[i]!)
    // A row standing for alike lanes (UsageSpans.copies) uses the same bank in each of them.
    if (r) spread(u.start[i]!, u.start[i]! + u.length[i]!, u.amount[i]! * usageCopies(u, i), use, r.bank)
  }
  const lanes = trace.laneCount
  const ports = trace.machine.rfPortsPerBank
  for (let i = 0; i < use.length; i++) use[i] = Math.min(1, use[i]! / (ports * lanes * width))
  const bankReason = STALL_REASONS.indexOf('bank')
  const st = trace.stalls
  for (let i = 0; i < st.count; i++) if (st.reason[i] === bankReason) spread(st.start[i]!, st.start[i]! + st.length[i]!, 1, denied, 0)
  return { banks, buckets: n, width, use, denied, peak: use.reduce((a, v) => Math.max(a, v), 0) }
}

export interface Collision {
  lane: number
  start: number
  length: number
  /** Other instructions holding ports of this lane's banks then, with the banks they held. */
  holders: { instruction: number; banks: number[] }[]
}

/** Where instruction `index` was refused a bank, and who held that lane's bank ports at the time. */
export function collisionsOf(trace: TimingTrace, index: number, limit = 12): Collision[] {
  const bankReason = STALL_REASONS.indexOf('bank')
  const res = new Map(bankResources(trace).map((r) => [r.id, r]))
  const st = trace.stalls
  const u = trace.usage
  const out: Collision[] = []
  for (let i = 0; i < st.count && out.length < limit; i++) {
    if (st.reason[i] !== bankReason || st.instruction[i] !== index) continue
    const lane = st.lane[i]!
    const s = st.start[i]!
    const e = s + st.length[i]!
    const holders = new Map<number, Set<number>>()
    for (let j = 0; j < u.count; j++) {
      const r = res.get(u.resource[j]!)
      // A row standing for alike lanes covers lanes r.lane .. r.lane + copies - 1 (UsageSpans.copies).
      if (!r || lane < r.lane || lane >= r.lane + usageCopies(u, j) || u.instruction[j] === index) continue
      if (u.start[j]! < e && u.start[j]! + u.length[j]! > s) {
        const set = holders.get(u.instruction[j]!) ?? new Set<number>()
        set.add(r.bank)
        holders.set(u.instruction[j]!, set)
      }
    }
    out.push({ lane, start: s, length: st.length[i]!, holders: [...holders].map(([instruction, b]) => ({ instruction, banks: [...b].sort((x, y) => x - y) })) })
  }
  return out
}
