/**
 * The one-line explanation under the Lane chart: the most common stall of the
 * run, said plainly. The reason with the most stall cycles over all lanes
 * wins; within it, the lane and instruction that waited longest are named.
 *
 * @example
 *   explainStalls(trace)?.sentence // 'lane 0 waits 31 cycles on bank conflicts in vfmacc.vv v4, v8, v12 (#3); 62 of 80 stall cycles are bank conflicts.'
 */
import { STALL_REASONS, type StallReason, type TimingTrace } from '@shared/sim/trace/types'

/** How a sentence says each reason: "lane 2 waits 8 cycles <phrase> in ...". */
export const STALL_PHRASES: Record<StallReason, string> = {
  raw: 'for an operand still being produced',
  bank: 'on bank conflicts',
  queue: 'on a full queue',
  slot: 'for a free lane slot',
  barrier: 'for the other lanes (issue policy)',
  rename: 'for a free physical register',
  memory: 'on memory',
  ring: 'for the ring',
  frontend: 'for the front end',
}

/** Short names of the reasons for sentences that sum them up ("of 80 stall cycles are bank conflicts"). */
export const STALL_NOUNS: Record<StallReason, string> = {
  raw: 'operand waits (read after write)',
  bank: 'bank conflicts',
  queue: 'full-queue waits',
  slot: 'lane-slot waits',
  barrier: 'issue-policy waits',
  rename: 'rename waits',
  memory: 'memory waits',
  ring: 'ring waits',
  frontend: 'front-end waits',
}

export interface StallExplanation {
  reason: StallReason
  lane: number
  /** InstructionTrace.index */
  instruction: number
  text: string
  /** Cycles that lane waited on that instruction for that reason. */
  cycles: number
  /** Cycles of this reason over all lanes. */
  reasonCycles: number
  /** Stall cycles of every reason over all lanes. */
  totalCycles: number
  sentence: string
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`

/** The explanation of the most common stall, or null when no lane ever waited. */
export function explainStalls(trace: TimingTrace): StallExplanation | null {
  const s = trace.stalls
  const byReason = new Float64Array(STALL_REASONS.length)
  // (reason, lane, instruction) -> cycles
  const groups = new Map<string, number>()
  for (let i = 0; i < s.count; i++) {
    const reason = s.reason[i] ?? 0
    const len = s.length[i] ?? 0
    byReason[reason] = (byReason[reason] ?? 0) + len
    const key = `${reason}:${s.lane[i] ?? 0}:${s.instruction[i] ?? 0}`
    groups.set(key, (groups.get(key) ?? 0) + len)
  }
  let best = -1
  byReason.forEach((v, r) => {
    if (v > 0 && (best < 0 || v > (byReason[best] ?? 0))) best = r
  })
  if (best < 0) return null
  let top: { lane: number; instruction: number; cycles: number } | null = null
  for (const [key, cycles] of groups) {
    const [r, lane, instruction] = key.split(':').map(Number) as [number, number, number]
    if (r !== best) continue
    // Ties go to the lower lane, then the earlier instruction, so the sentence is stable.
    if (!top || cycles > top.cycles || (cycles === top.cycles && (lane < top.lane || (lane === top.lane && instruction < top.instruction)))) {
      top = { lane, instruction, cycles }
    }
  }
  if (!top) return null
  const reason = STALL_REASONS[best] as StallReason
  const ins = trace.instructions.find((x) => x.index === top.instruction)
  const text = ins?.text ?? `instruction ${top.instruction}`
  const reasonCycles = byReason[best] ?? 0
  const totalCycles = byReason.reduce((a, b) => a + b, 0)
  const sentence =
    `lane ${top.lane} waits ${plural(top.cycles, 'cycle')} ${STALL_PHRASES[reason]} in ${text} (#${top.instruction}); ` +
    `${reasonCycles} of ${plural(totalCycles, 'stall cycle')} over all lanes are ${STALL_NOUNS[reason]}.`
  return { reason, lane: top.lane, instruction: top.instruction, text, cycles: top.cycles, reasonCycles, totalCycles, sentence }
}
