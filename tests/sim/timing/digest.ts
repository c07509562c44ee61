/**
 * Digests of everything a timing run computes, for the golden corpus, in two
 * parts: `timing` (cycles, phase times, instruction records without their
 * stalls, resources, resource use, metrics without the stall totals) and
 * `stalls` (the stall spans, every instruction's stalls by reason, the stall
 * totals). The stall rule can then change while a check still proves that no
 * phase time or cycle moved.
 *
 * Spans enter a digest through what they mean, not how they are cut: resource
 * use as the function (resource, cycle, instruction) -> amount, stalls as
 * (lane, cycle) -> (reason, instruction), each folded into order-independent
 * sums that are linear in the amount. So merging or splitting spans keeps the
 * digest, and so does a row standing for alike lanes (UsageSpans.copies, taken
 * one span a row); moving a single use, stall or phase time by one cycle
 * changes it.
 */
import { createHash } from 'node:crypto'
import type { TimingResult } from '../../../shared/sim/trace/types'
import { expandUsage } from '../../../shared/sim/trace/types'

/** murmur3's 32-bit finaliser (public domain): a fast, well-mixed integer hash. */
function fmix(h: number): number {
  h ^= h >>> 16
  h = Math.imul(h, 0x85ebca6b)
  h ^= h >>> 13
  h = Math.imul(h, 0xc2b2ae35)
  h ^= h >>> 16
  return h >>> 0
}

function mix(a: number, b: number, c: number, d: number, seed: number): number {
  return fmix(fmix(fmix(fmix(seed ^ a) ^ b) ^ c) ^ d)
}

function usageSums(result: TimingResult): [number, number] {
  let u1 = 0
  let u2 = 0
  const u = expandUsage(result.trace.usage)
  for (let i = 0; i < u.count; i++) {
    const r = u.resource[i]!
    const inst = u.instruction[i]!
    const amt = u.amount[i]!
    for (let c = u.start[i]!; c < u.start[i]! + u.length[i]!; c++) {
      u1 = (u1 + Math.imul(amt, mix(r, c, inst, 0, 0x2545f491))) >>> 0
      u2 = (u2 + Math.imul(amt, mix(r, c, inst, 0, 0x68e31da4))) >>> 0
    }
  }
  return [u1, u2]
}

function stallSums(result: TimingResult): [number, number] {
  let s1 = 0
  let s2 = 0
  const s = result.trace.stalls
  for (let i = 0; i < s.count; i++) {
    for (let c = s.start[i]!; c < s.start[i]! + s.length[i]!; c++) {
      s1 = (s1 + mix(s.lane[i]!, c, s.reason[i]!, s.instruction[i]!, 0x1b873593)) >>> 0
      s2 = (s2 + mix(s.lane[i]!, c, s.reason[i]!, s.instruction[i]!, 0x3c6ef372)) >>> 0
    }
  }
  return [s1, s2]
}

export interface RunDigest {
  timing: string
  stalls: string
}

export function digestRun(result: TimingResult): RunDigest {
  const t = result.trace
  // The per-width flops and peaks follow from the instructions' flops and SEW and from the machine, all digested
  // here; leaving them out kept the digests of runs without FP32 or FP16 work when they were added.
  const { stallCycles, flopsBySew: _f, peakFlopsPerCycleBySew: _p, ...timingMetrics } = t.metrics
  const h = createHash('sha256')
  h.update(JSON.stringify({ error: result.error ?? null, cycles: t.cycles, instructions: t.instructions.map(({ stalls: _, ...rest }) => rest), resources: t.resources, metrics: timingMetrics }))
  h.update(new Uint8Array(t.laneTimes.buffer, t.laneTimes.byteOffset, t.laneTimes.byteLength))
  h.update(JSON.stringify(usageSums(result)))
  const s = createHash('sha256')
  s.update(JSON.stringify({ stallCycles, instructions: t.instructions.map((i) => i.stalls) }))
  s.update(JSON.stringify(stallSums(result)))
  return { timing: h.digest('hex').slice(0, 24), stalls: s.digest('hex').slice(0, 24) }
}
