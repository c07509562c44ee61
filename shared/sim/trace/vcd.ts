/**
 * Value change dump export (IEEE 1364-2005 section 18, the four-state VCD
 * format), so that any standard waveform reader can open a run.
 *
 * Layout, one time unit per cycle (`$timescale 1 ns`, read "1 cycle"):
 *   module chimeline
 *     module lane<l>           one per lane
 *       read, exec, write      the instruction (dynamic index) in that phase,
 *                              x while the phase is idle
 *       read_1, exec_1, ...    further slots, present only when some lane has
 *                              two instructions in the same phase in one cycle
 *                              (pipelined units overlap); an instruction keeps
 *                              the lowest slot free when its phase starts
 *       stall                  4-bit stall reason code, 0 when not stalled
 *       stall_instr            the instruction the lane waits to advance, x when not stalled
 * The stall code table (STALL_CODES) is also written into the header as a $comment.
 *
 * @example
 *   const text = toVcd(trace, { date: new Date() })
 */
import { LANE_FIELD_COUNT, NO_CYCLE, STALL_REASONS, type TimingTrace } from './types'

/** Stall code 0 means no stall; code k (1..9) is STALL_REASONS[k - 1]. */
export const STALL_CODES: readonly string[] = ['none', ...STALL_REASONS]
export const STALL_CODE_BITS = 4
export const PHASES = ['read', 'exec', 'write'] as const
export type Phase = (typeof PHASES)[number]

export interface VcdOptions {
  /** Written into $date (default: now). */
  date?: Date
  /** Written into $version after the product name. */
  version?: string
}

const IDLE = -1

/**
 * Identifier codes: printable ASCII '!'..'~' (IEEE 1364-2005 18.2.1), leaving
 * out '$' so that no code can be taken for a keyword such as $end.
 */
const ID_CHARS = Array.from({ length: 94 }, (_, i) => String.fromCharCode(33 + i)).filter((c) => c !== '$')
function identifier(n: number): string {
  let s = ''
  let k = n
  do {
    s += ID_CHARS[k % ID_CHARS.length]
    k = Math.floor(k / ID_CHARS.length)
  } while (k > 0)
  return s
}

const bitsFor = (maxValue: number) => Math.max(1, Math.ceil(Math.log2(maxValue + 1)))

interface Signal {
  id: string
  name: string
  width: number
  lane: number
  /** Value at time 0 before any interval. */
  idle: number
  /** Non-overlapping [start, end] intervals in time order, with their values. */
  starts: number[]
  ends: number[]
  values: number[]
}

/** Lowest-free-slot assignment of one lane's phase intervals; returns intervals per slot. */
function assignSlots(intervals: { start: number; end: number; value: number }[]): { start: number; end: number; value: number }[][] {
  intervals.sort((a, b) => a.start - b.start || a.value - b.value)
  const slotEnd: number[] = []
  const slots: { start: number; end: number; value: number }[][] = []
  for (const iv of intervals) {
    let s = slotEnd.findIndex((end) => end < iv.start)
    if (s < 0) {
      s = slotEnd.length
      slots.push([])
    }
    slotEnd[s] = iv.end
    slots[s]!.push(iv)
  }
  return slots
}

export function toVcd(trace: TimingTrace, options: VcdOptions = {}): string {
  const lanes = trace.laneCount
  const n = trace.instructions.length
  const indexWidth = bitsFor(Math.max(1, n - 1))
  const t = trace.laneTimes

  // Phase intervals per lane, then slots per phase (as many as the busiest lane needs).
  const perLane: { start: number; end: number; value: number }[][][][] = [] // lane -> phase -> slot -> intervals
  const slotCount = PHASES.map(() => 1)
  for (let lane = 0; lane < lanes; lane++) {
    const phases = PHASES.map((phase, p) => {
      const list: { start: number; end: number; value: number }[] = []
      for (let i = 0; i < n; i++) {
        const base = (i * lanes + lane) * LANE_FIELD_COUNT + 2 + 2 * p
        const start = t[base] ?? NO_CYCLE
        const end = t[base + 1] ?? NO_CYCLE
        if (start === NO_CYCLE || end === NO_CYCLE) continue
        if (end < start) throw new Error(`trace: instruction ${i} lane ${lane} ends its ${phase} phase before it starts`)
        list.push({ start, end, value: trace.instructions[i]!.index })
      }
      const slots = assignSlots(list)
      slotCount[p] = Math.max(slotCount[p]!, slots.length)
      return slots
    })
    perLane.push(phases)
  }

  const signals: Signal[] = []
  const add = (lane: number, name: string, width: number, idle: number, intervals: { start: number; end: number; value: number }[]) => {
    signals.push({
      id: identifier(signals.length),
      name,
      width,
      lane,
      idle,
      starts: intervals.map((iv) => iv.start),
      ends: intervals.map((iv) => iv.end),
      values: intervals.map((iv) => iv.value),
    })
  }
  const s = trace.stalls
  for (let lane = 0; lane < lanes; lane++) {
    PHASES.forEach((phase, p) => {
      for (let slot = 0; slot < slotCount[p]!; slot++) {
        add(lane, slot === 0 ? phase : `${phase}_${slot}`, indexWidth, IDLE, perLane[lane]![p]![slot] ?? [])
      }
    })
    const spans: { start: number; end: number; reason: number; instruction: number }[] = []
    for (let k = 0; k < s.count; k++) {
      if (s.lane[k] !== lane) continue
      const start = s.start[k]!
      spans.push({ start, end: start + s.length[k]! - 1, reason: s.reason[k]! + 1, instruction: s.instruction[k]! })
    }
    spans.sort((a, b) => a.start - b.start)
    add(lane, 'stall', STALL_CODE_BITS, 0, spans.map((x) => ({ start: x.start, end: x.end, value: x.reason })))
    add(lane, 'stall_instr', indexWidth, IDLE, spans.map((x) => ({ start: x.start, end: x.end, value: x.instruction })))
  }

  // Value changes: to the value at each interval start, back to idle after
  // its end unless the next interval of the same signal starts right there;
  // then bucketed by time (a counting sort, linear in changes and cycles).
  const changeTime: number[] = []
  const changeSignal: number[] = []
  const changeValue: number[] = []
  const initial = signals.map((g) => g.idle)
  let lastTime = trace.cycles
  const change = (time: number, gi: number, v: number) => {
    changeTime.push(time)
    changeSignal.push(gi)
    changeValue.push(v)
    if (time > lastTime) lastTime = time
  }
  signals.forEach((g, gi) => {
    for (let k = 0; k < g.starts.length; k++) {
      const start = g.starts[k]!
      if (start === 0) initial[gi] = g.values[k]!
      else change(start, gi, g.values[k]!)
      const after = g.ends[k]! + 1
      if (g.starts[k + 1] !== after) change(after, gi, g.idle)
    }
  })
  const firstAt = new Int32Array(lastTime + 2)
  for (const time of changeTime) firstAt[time + 1]!++
  for (let time = 1; time < firstAt.length; time++) firstAt[time]! += firstAt[time - 1]!
  const order = new Int32Array(changeTime.length)
  const fill = firstAt.slice(0, lastTime + 1)
  changeTime.forEach((time, c) => {
    order[fill[time]!++] = c
  })

  const value = (gi: number, v: number) => `${v === IDLE ? 'bx' : `b${v.toString(2)}`} ${signals[gi]!.id}`
  const out: string[] = []
  out.push(`$date ${(options.date ?? new Date()).toISOString()} $end`)
  out.push(`$version Chimeline trace exporter${options.version ? ` ${options.version}` : ''} $end`)
  out.push(
    '$comment Chimeline timing trace (model estimates). One time unit is one cycle. ' +
      'Per lane: read, exec, write = dynamic instruction index in that phase (x when idle), ' +
      'extra slots read_1, exec_1, ... when instructions overlap in a phase; ' +
      `stall = reason code (${STALL_CODES.map((r, i) => `${i} ${r}`).join(', ')}); ` +
      'stall_instr = instruction the lane waits to advance (x when not stalled). $end',
  )
  out.push('$timescale 1 ns $end')
  out.push('$scope module chimeline $end')
  for (let lane = 0; lane < lanes; lane++) {
    out.push(`$scope module lane${lane} $end`)
    for (const g of signals) if (g.lane === lane) out.push(`$var wire ${g.width} ${g.id} ${g.name} $end`)
    out.push('$upscope $end')
  }
  out.push('$upscope $end')
  out.push('$enddefinitions $end')
  out.push('#0')
  out.push('$dumpvars')
  initial.forEach((v, gi) => out.push(value(gi, v)))
  out.push('$end')
  for (let time = 1; time <= lastTime; time++) {
    const from = firstAt[time]!
    const to = firstAt[time + 1]!
    // The last time is written even without changes: it marks the end of the run.
    if (from === to && time !== lastTime) continue
    out.push(`#${time}`)
    for (let k = from; k < to; k++) out.push(value(changeSignal[order[k]!]!, changeValue[order[k]!]!))
  }
  return out.join('\n') + '\n'
}
