/**
 * Small timing traces written by hand as inputs for the chart's pure logic
 * (test input only: shipped code never sees them). Each instruction lists,
 * per lane, `[elements, beats, readStart, readEnd, execStart, execEnd,
 * writeStart, writeEnd]` with null for "no cycle", or null for a lane with no
 * active element.
 */
import { defaultMachine } from '@shared/schemas/machine'
import { emptyStallCounts, NO_CYCLE, STALL_REASONS, type InstructionTrace, type StallReason, type TimingTrace } from '@shared/sim/trace/types'

export type LaneRow = [number, number, number | null, number | null, number | null, number | null, number | null, number | null] | null

export interface HandInstruction {
  text?: string
  staticIndex?: number
  isConfig?: boolean
  lanes: LaneRow[]
}

export interface HandTrace {
  lanes: number
  cycles: number
  instructions: HandInstruction[]
  /** [lane, start, length, reason, instruction index]. */
  stalls?: [number, number, number, StallReason, number][]
}

export function buildTrace(spec: HandTrace): TimingTrace {
  const instructions: InstructionTrace[] = spec.instructions.map((ins, index) => ({
    index, staticIndex: ins.staticIndex ?? index, op: (ins.text ?? 'vfadd.vv').split(' ')[0]!, text: ins.text ?? `vfadd.vv v${index % 32}, v1, v2`,
    vl: 8, sew: 64, lmul: 1, unit: 'fpu', shape: 'elementwise', masked: false, isConfig: ins.isConfig ?? false,
    dispatch: index, complete: null, latency: null, flops: 0, stalls: emptyStallCounts(),
  }))
  const laneTimes = new Int32Array(spec.instructions.length * spec.lanes * 8).fill(0)
  spec.instructions.forEach((ins, i) => {
    for (let lane = 0; lane < spec.lanes; lane++) {
      const row = ins.lanes[lane] ?? null
      const values = row ?? [0, 0, null, null, null, null, null, null]
      values.forEach((v, f) => (laneTimes[(i * spec.lanes + lane) * 8 + f] = v === null ? NO_CYCLE : v))
    }
  })
  const stalls = spec.stalls ?? []
  return {
    formatVersion: 1,
    machine: { ...defaultMachine, lanes: spec.lanes },
    laneCount: spec.lanes,
    cycles: spec.cycles,
    instructions,
    laneTimes,
    stalls: {
      count: stalls.length,
      lane: Uint16Array.from(stalls.map((s) => s[0])),
      start: Int32Array.from(stalls.map((s) => s[1])),
      length: Int32Array.from(stalls.map((s) => s[2])),
      reason: Uint8Array.from(stalls.map((s) => STALL_REASONS.indexOf(s[3]))),
      instruction: Int32Array.from(stalls.map((s) => s[4])),
    },
    resources: [],
    usage: { count: 0, resource: new Uint32Array(0), start: new Int32Array(0), length: new Int32Array(0), amount: new Uint16Array(0), instruction: new Int32Array(0) },
    metrics: {
      cycles: spec.cycles, flops: 0, flopsPerCycle: 0, peakFlopsPerCycle: 1, laneBusy: Array.from({ length: spec.lanes }, () => 0),
      unitUtilization: { alu: 0, mul: 0, fpu: 0, div: 0 }, bankUtilization: [], busUtilization: { load: 0, store: 0 }, ringUtilization: 0,
      stallCycles: emptyStallCounts(),
    },
  }
}

/**
 * Two lanes, four instructions:
 * 0 vsetvli (no lane activity), 1 in both lanes, 2 overlapping 1 in lane 0
 * (two in flight: two tracks) and absent from lane 1, 3 after both.
 * Lane 0 stalls on `bank` in cycle 3 for instruction 1 and on `raw` in
 * cycles 4-5 for instruction 2, before its first read.
 */
export function twoLaneTrace(): TimingTrace {
  return buildTrace({
    lanes: 2,
    cycles: 20,
    instructions: [
      { text: 'vsetvli t0, a0, e64, m1, ta, ma', isConfig: true, lanes: [null, null] },
      { text: 'vfadd.vv v8, v8, v16', lanes: [[2, 2, 2, 4, 3, 8, 7, 9], [1, 1, 2, 2, 3, 6, 7, 7]] },
      { text: 'vfmacc.vf v16, fa0, v8', lanes: [[1, 1, 6, 6, 7, 10, 11, 11], null] },
      { text: 'vse64.v v16, (a1)', lanes: [[2, 2, 12, 13, 14, 15, null, null], [1, 1, 12, 12, 13, 13, null, null]] },
    ],
    stalls: [
      [0, 3, 1, 'bank', 1],
      [0, 4, 2, 'raw', 2],
    ],
  })
}
