/**
 * Evaluates a scenario's expectations against one run: each claim gives pass
 * or fail, the measured value and, where the trace has one, the cycle, lane
 * and instruction that decide it (the Bench moves its cursor there). Pure: the
 * Bench calls it on the Worker's results, the CLI on runPipeline's.
 *
 * @example
 *   const r = runPipeline({ program, machine })
 *   evaluateExpectations([{ kind: 'metric', metric: 'cycles', op: '<=', value: 120 }], r)[0].pass
 */
import type { ComparisonOp, DecidingPoint, Expectation, ExpectationMetric, ExpectationResult, MemoryClaim, RegisterClaim } from '../schemas/expectation'
import type { Program } from '../sim/isa/types'
import type { FunctionalResult, RunError } from '../sim/run'
import { LANE_FIELD_COUNT, LANE_FIELDS, NO_CYCLE, STALL_REASONS, laneTiming, type TimingTrace } from '../sim/trace/types'
import { describeExpectation, valueList } from './describe'
import { ELEMENT_BYTES, elementMatches, elementText, expectedBits, readBits } from './elements'

/** What evaluation reads of a run; a RunResult of shared/sim/run.ts is one. */
export type ExpectationRun =
  | { ok: true; trace: TimingTrace; functional: Pick<FunctionalResult, 'v' | 'memory' | 'dataBase'>; program: Pick<Program, 'symbols'> }
  | { ok: false; error: Pick<RunError, 'stage' | 'code' | 'message'> }

type Verdict = Pick<ExpectationResult, 'pass' | 'measured' | 'note' | 'at'>

export function compare(measured: number, op: ComparisonOp, value: number): boolean {
  switch (op) {
    case '==': return measured === value
    case '!=': return measured !== value
    case '<': return measured < value
    case '<=': return measured <= value
    case '>': return measured > value
    case '>=': return measured >= value
  }
}

export function metricValue(trace: TimingTrace, metric: ExpectationMetric): number {
  const m = trace.metrics
  switch (metric) {
    case 'cycles': return m.cycles
    case 'flops': return m.flops
    case 'flopsPerCycle': return m.flopsPerCycle
    case 'peakFlopsPerCycle': return m.peakFlopsPerCycle
    case 'fractionOfPeak': return m.peakFlopsPerCycle > 0 ? m.flopsPerCycle / m.peakFlopsPerCycle : 0
    case 'meanLaneBusy': return m.laneBusy.length ? m.laneBusy.reduce((a, b) => a + b, 0) / m.laneBusy.length : 0
    case 'loadBusUtilization': return m.busUtilization.load
    case 'storeBusUtilization': return m.busUtilization.store
    case 'ringUtilization': return m.ringUtilization
    case 'stallCycles': return STALL_REASONS.reduce((a, r) => a + m.stallCycles[r], 0)
  }
}

/** The last busy cycle, with a lane and instruction active in it: what decides `cycles`. */
function lastCycle(trace: TimingTrace): DecidingPoint | null {
  const last = trace.cycles - 1
  if (last < 0) return null
  const L = trace.laneCount
  const t = trace.laneTimes
  for (let pos = trace.instructions.length - 1; pos >= 0; pos--) {
    for (let lane = 0; lane < L; lane++) {
      const base = (pos * L + lane) * LANE_FIELD_COUNT
      for (let k = 2; k < LANE_FIELD_COUNT; k++) if (t[base + k] === last) return { cycle: last, lane, instruction: trace.instructions[pos]?.index ?? null }
    }
  }
  // A run that ends in the front end (a trailing vset) has no lane in its last cycle.
  const ins = trace.instructions.find((i) => i.complete === last)
  return { cycle: last, lane: null, instruction: ins?.index ?? null }
}

/** The first stall span (of `reason`, or of any): the first cycle that counted toward the figure. */
function firstStall(trace: TimingTrace, reason: number | null): DecidingPoint | null {
  const s = trace.stalls
  for (let i = 0; i < s.count; i++) {
    if (reason === null || s.reason[i] === reason) return { cycle: s.start[i] ?? 0, lane: s.lane[i] ?? null, instruction: s.instruction[i] ?? null }
  }
  return null
}

/** Where instruction `instruction` (its `#`) sits in the trace's list, or -1 when the run has none. */
export function position(trace: TimingTrace, instruction: number): number {
  const direct = trace.instructions[instruction]
  return direct?.index === instruction ? instruction : trace.instructions.findIndex((i) => i.index === instruction)
}

function noInstruction(trace: TimingTrace, instruction: number): Verdict {
  const n = trace.instructions.length
  return { pass: false, measured: null, note: `the run has no instruction ${instruction} (it has ${n ? `0 to ${n - 1}` : 'none'})`, at: null }
}

function show(v: number): string {
  return String(v)
}

function elementsVerdict(claim: RegisterClaim | MemoryClaim, bytes: Uint8Array, offset: number, where: string): Verdict {
  const size = ELEMENT_BYTES[claim.type]
  const count = claim.values.length
  if (offset < 0 || offset + count * size > bytes.length) {
    return { pass: false, measured: null, note: `${count} ${claim.type} values (${count * size} bytes) run past ${where} (${Math.max(0, bytes.length - offset)} bytes)`, at: null }
  }
  const got = readBits(bytes, offset, count, claim.type)
  const measured = valueList(got.map((b) => elementText(b, claim.type)))
  for (let i = 0; i < count; i++) {
    const expected = expectedBits(claim.values[i] ?? '', claim.type)
    if (typeof expected === 'string') return { pass: false, measured, note: `value ${i + 1}: ${expected}`, at: null }
    const m = elementMatches(got[i] ?? 0n, expected, claim.type, claim.toleranceUlps ?? 0)
    if (!m.match) {
      const off = m.ulps === null ? '' : ` (${m.ulps} ulp${m.ulps === 1n ? '' : 's'} apart)`
      return { pass: false, measured, note: `element ${i}: expected ${elementText(expected, claim.type)}, got ${elementText(got[i] ?? 0n, claim.type)}${off}`, at: null }
    }
  }
  return { pass: true, measured, note: null, at: null }
}

function evaluateOne(e: Expectation, run: ExpectationRun): Verdict {
  if (e.kind === 'fails') {
    if (run.ok) return { pass: false, measured: 'the run succeeded', note: null, at: null }
    const measured = `fails at stage ${run.error.stage} (${run.error.code})`
    const pass = run.error.stage === e.stage && (e.code === undefined || e.code === run.error.code)
    return { pass, measured, note: pass ? null : run.error.message, at: null }
  }
  if (!run.ok) return { pass: false, measured: null, note: `the run failed at stage ${run.error.stage}: ${run.error.message}`, at: null }
  const { trace } = run
  switch (e.kind) {
    case 'metric': {
      const v = metricValue(trace, e.metric)
      const at = e.metric === 'cycles' ? lastCycle(trace) : e.metric === 'stallCycles' ? firstStall(trace, null) : null
      return { pass: compare(v, e.op, e.value), measured: show(v), note: null, at }
    }
    case 'stall': {
      const v = trace.metrics.stallCycles[e.reason]
      return { pass: compare(v, e.op, e.value), measured: show(v), note: null, at: firstStall(trace, STALL_REASONS.indexOf(e.reason)) }
    }
    case 'phase': {
      if (e.lane >= trace.laneCount) return { pass: false, measured: null, note: `the machine has ${trace.laneCount} lanes (0 to ${trace.laneCount - 1})`, at: null }
      const pos = position(trace, e.instruction)
      if (pos < 0) return noInstruction(trace, e.instruction)
      const v = laneTiming(trace, pos, e.lane)[e.field]
      if (v === null) return { pass: false, measured: null, note: `lane ${e.lane} has no active element in instruction ${e.instruction}`, at: null }
      return { pass: compare(v, e.op, e.value), measured: show(v), note: null, at: { cycle: v, lane: e.lane, instruction: e.instruction } }
    }
    case 'latency': {
      const pos = position(trace, e.instruction)
      if (pos < 0) return noInstruction(trace, e.instruction)
      const ins = trace.instructions[pos]
      if (!ins || ins.latency === null || ins.complete === null) return { pass: false, measured: null, note: `instruction ${e.instruction} did not finish`, at: null }
      return { pass: compare(ins.latency, e.op, e.value), measured: show(ins.latency), note: null, at: { cycle: ins.complete, lane: laneEndingAt(trace, pos, ins.complete), instruction: e.instruction } }
    }
    case 'register': {
      const regs = run.functional.v.slice(e.register)
      const bytes = new Uint8Array(regs.reduce((n, r) => n + r.length, 0))
      let at = 0
      for (const r of regs) {
        bytes.set(r, at)
        at += r.length
      }
      return elementsVerdict(e, bytes, 0, `v${e.register}..v31`)
    }
    case 'memory': {
      const address = run.program.symbols[e.label]
      if (address === undefined) return { pass: false, measured: null, note: `no label ${e.label} in the program`, at: null }
      return elementsVerdict(e, run.functional.memory, address - run.functional.dataBase, 'the data segment')
    }
  }
}

/** A lane whose last activity in instruction `pos` is `cycle` (what sets its completion). */
function laneEndingAt(trace: TimingTrace, pos: number, cycle: number): number | null {
  for (let lane = 0; lane < trace.laneCount; lane++) {
    const base = (pos * trace.laneCount + lane) * LANE_FIELD_COUNT
    for (let k = 2; k < LANE_FIELDS.length; k++) {
      const v = trace.laneTimes[base + k] ?? NO_CYCLE
      if (v === cycle) return lane
    }
  }
  return null
}

export function evaluateExpectations(expectations: readonly Expectation[], run: ExpectationRun): ExpectationResult[] {
  return expectations.map((expectation, index) => ({ index, expectation, text: describeExpectation(expectation), ...evaluateOne(expectation, run) }))
}
