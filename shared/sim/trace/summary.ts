/**
 * The summary form printed by `npm run -s sim` (the default format): the run's
 * cycles and metrics, and per instruction its lanes' phase times.
 *
 * @example
 *   JSON.stringify(summarize(result.trace, { error: result.error }))
 */
import { laneTiming, type LaneTiming, type Metrics, type StallCounts, type TimingTrace } from './types'
import type { Sew } from '../isa/types'

export const ESTIMATE_NOTE = 'Model estimates from the Chimeline reference timing model; not sign-off for silicon.'

export interface SummaryInstruction {
  index: number
  text: string
  vl: number
  sew: Sew
  latency: number | null
  stalls: StallCounts
  lanes: LaneTiming[]
}

export interface Summary {
  cycles: number
  metrics: Metrics
  instructions: SummaryInstruction[]
  /** Present when the run was cut short: the trace above is partial. */
  error?: SummaryError
  note: string
}

/** Why a run was cut short, e.g. a TimingError ('cycle-limit', 'trace-limit'). */
export interface SummaryError {
  code: string
  message: string
}

export interface SummaryOptions {
  /** The error of a run that was cut short. */
  error?: SummaryError
}

export function summarize(trace: TimingTrace, options: SummaryOptions = {}): Summary {
  const instructions = trace.instructions.map((ins, i): SummaryInstruction => ({
    index: ins.index,
    text: ins.text,
    vl: ins.vl,
    sew: ins.sew,
    latency: ins.latency,
    stalls: ins.stalls,
    lanes: Array.from({ length: trace.laneCount }, (_, lane) => laneTiming(trace, i, lane)),
  }))
  return {
    cycles: trace.cycles,
    metrics: trace.metrics,
    instructions,
    ...(options.error ? { error: options.error } : {}),
    note: ESTIMATE_NOTE,
  }
}
