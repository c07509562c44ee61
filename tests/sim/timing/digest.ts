/**
 * A digest of everything a timing run computes, for the golden corpus. Spans
 * enter it through what they mean, not how they are cut: resource use as the
 * function (resource, cycle, instruction) -> amount, stalls as (lane, cycle) ->
 * (reason, instruction), each folded into order-independent sums that are
 * linear in the amount. So merging or splitting spans keeps the digest; moving
 * a single use, stall or phase time by one cycle changes it.
 */
import { createHash } from 'node:crypto'
import type { TimingResult } from '../../../shared/sim/trace/types'

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

export function digestRun(result: TimingResult): string {
  const t = result.trace
  let u1 = 0
  let u2 = 0
  const u = t.usage
  for (let i = 0; i < u.count; i++) {
    const r = u.resource[i]!
    const inst = u.instruction[i]!
    const amt = u.amount[i]!
    for (let c = u.start[i]!; c < u.start[i]! + u.length[i]!; c++) {
      u1 = (u1 + Math.imul(amt, mix(r, c, inst, 0, 0x2545f491))) >>> 0
      u2 = (u2 + Math.imul(amt, mix(r, c, inst, 0, 0x68e31da4))) >>> 0
    }
  }
  let s1 = 0
  let s2 = 0
  const s = t.stalls
  for (let i = 0; i < s.count; i++) {
    for (let c = s.start[i]!; c < s.start[i]! + s.length[i]!; c++) {
      s1 = (s1 + mix(s.lane[i]!, c, s.reason[i]!, s.instruction[i]!, 0x1b873593)) >>> 0
      s2 = (s2 + mix(s.lane[i]!, c, s.reason[i]!, s.instruction[i]!, 0x3c6ef372)) >>> 0
    }
  }
  const h = createHash('sha256')
  h.update(JSON.stringify({ error: result.error ?? null, cycles: t.cycles, instructions: t.instructions, resources: t.resources, metrics: t.metrics }))
  h.update(new Uint8Array(t.laneTimes.buffer, t.laneTimes.byteOffset, t.laneTimes.byteLength))
  h.update(JSON.stringify([u1, u2, s1, s2]))
  return h.digest('hex').slice(0, 24)
}
