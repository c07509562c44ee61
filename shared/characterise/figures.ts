/**
 * A kernel's characterisation figures: the sweep figures of its run plus the
 * bytes it moves a cycle, its two largest stall reasons and a one-line verdict
 * of what bounds it. The rules of the verdict (README "Characterisation
 * report") are written so a reader can apply them by hand to the figures:
 *
 * 1. A resource busy at least BUSY_BOUND of the time bounds the kernel: the
 *    busiest of the execution units (compute), the load or store bus
 *    (memory bus) and the ring links (ring). A kernel that keeps a resource
 *    that busy cannot go much faster without more of it.
 * 2. Otherwise the largest stall reason names what the lanes waited for:
 *    raw -> dependences, bank -> bank ports, memory -> memory bus,
 *    ring and barrier -> ring, frontend -> front end, queue, slot and rename
 *    -> issue resources; when stalls are at least STALLED_BOUND of the
 *    lane-cycles. A full operand queue (queue) only says a unit is behind,
 *    so it names the bound only when no other reason stalled. Waiting for a
 *    load's data is a raw stall: a kernel whose loads feed their consumers at
 *    once is dependence-bound on memory latency, not on the bus's width.
 * 3. Otherwise nothing is busy and little waits: the run is too short to fill
 *    the pipelines (start-up: memory latency and pipeline depth dominate).
 *
 * Bank-port use is not a rule-1 resource: a lane that reads three words a
 * beat keeps its banks busy without being bound by them; only denied ports
 * (bank stalls) say the ports limit it.
 */
import type { Machine } from '../schemas/machine'
import type { Bound, KernelFigures } from '../schemas/suite'
import { figuresOf } from '../sweep/figures'
import { STALL_REASONS, type Metrics, type StallReason } from '../sim/trace/types'

/** A resource this busy (fraction of its capacity over the run) bounds the kernel. Common practice for "saturated": well past half. */
export const BUSY_BOUND = 0.6
/** Stall lane-cycles at least this fraction of all lane-cycles make the top stall reason the bound. */
export const STALLED_BOUND = 0.1

const STALL_BOUND: Record<StallReason, Bound> = {
  raw: 'dependences',
  bank: 'bank ports',
  memory: 'memory bus',
  ring: 'ring',
  barrier: 'ring',
  frontend: 'front end',
  queue: 'issue resources',
  slot: 'issue resources',
  rename: 'issue resources',
}

const pct = (x: number) => `${Math.round(x * 100)}%`

/** The two largest stall reasons with their share of all stall cycles, largest first (ties in STALL_REASONS order). */
export function topStalls(stalls: Record<StallReason, number>): KernelFigures['topStalls'] {
  const total = STALL_REASONS.reduce((n, r) => n + stalls[r], 0)
  if (total <= 0) return []
  return STALL_REASONS.filter((r) => stalls[r] > 0)
    .map((reason) => ({ reason, share: stalls[reason] / total }))
    .sort((a, b) => b.share - a.share)
    .slice(0, 2)
}

/** The bound and its verdict line from the figures (rules in the module comment). */
export function boundOf(f: Omit<KernelFigures, 'bound' | 'verdict'>, lanes: number): { bound: Bound; verdict: string } {
  const units = Object.entries(f.unitUtilization) as [string, number][]
  const [unit, unitBusy] = units.reduce((a, b) => (b[1] > a[1] ? b : a))
  const bus = f.busUtilization.load >= f.busUtilization.store ? (['load', f.busUtilization.load] as const) : (['store', f.busUtilization.store] as const)
  const busy: [Bound, number, string][] = [
    ['compute', unitBusy, `${unit.toUpperCase()} busy ${pct(unitBusy)} of lane-cycles`],
    ['memory bus', bus[1], `${bus[0]} bus busy ${pct(bus[1])} of cycles`],
    ['ring', f.ringUtilization, `ring links busy ${pct(f.ringUtilization)} of cycles`],
  ]
  const top = busy.reduce((a, b) => (b[1] > a[1] ? b : a))
  if (top[1] >= BUSY_BOUND) return { bound: top[0], verdict: `${top[0]}-bound: ${top[2]}` }
  const stalled = STALL_REASONS.reduce((n, r) => n + f.stalls[r], 0)
  const causes = STALL_REASONS.filter((r) => r !== 'queue' && f.stalls[r] > 0)
  const reason = causes.length ? causes.reduce((a, b) => (f.stalls[b] > f.stalls[a] ? b : a)) : f.stalls.queue > 0 ? 'queue' : null
  const laneCycles = Math.max(1, f.cycles * lanes)
  if (reason && stalled / laneCycles >= STALLED_BOUND) {
    const b = STALL_BOUND[reason]
    const among = reason === 'queue' ? stalled : stalled - f.stalls.queue
    const which = reason === 'queue' || f.stalls.queue === 0 ? 'stall cycles' : 'stall cycles other than full queues'
    return { bound: b, verdict: `${b}-bound: ${reason} stalls are ${pct(f.stalls[reason] / among)} of ${which} (${pct(stalled / laneCycles)} of lane-cycles stalled)` }
  }
  return { bound: 'start-up', verdict: `start-up-bound: nothing over ${pct(BUSY_BOUND)} busy (most: ${top[2]}) and ${pct(stalled / laneCycles)} of lane-cycles stalled` }
}

/** Everything the characterisation table shows of one run. */
export function kernelFigures(metrics: Metrics, machine: Pick<Machine, 'lanes' | 'loadBusBits' | 'storeBusBits'>): KernelFigures {
  const base = figuresOf(metrics)
  // busUtilization is bits moved / (cycles x bus width): back to bytes a cycle over both buses.
  const bytesPerCycle = (base.busUtilization.load * machine.loadBusBits + base.busUtilization.store * machine.storeBusBits) / 8
  const partial = { ...base, bytesPerCycle: base.cycles > 0 ? bytesPerCycle : 0, topStalls: topStalls(base.stalls) }
  return { ...partial, ...boundOf(partial, machine.lanes) }
}
