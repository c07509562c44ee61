/**
 * A small trace written by hand (a test stub typed by the trace types, never
 * used by shipped code): 2 lanes, 3 instructions, chosen so that the exports
 * meet the awkward cases: a config instruction with no lane activity, a lane
 * with no active element (nulls), two instructions in the exec phase of one
 * lane at once (a pipelined unit), adjacent stall spans with different reasons.
 */
import { defaultMachine } from '../../../shared/schemas/machine'
import {
  emptyStallCounts,
  LANE_FIELD_COUNT,
  NO_CYCLE,
  STALL_REASONS,
  type InstructionTrace,
  type TimingTrace,
} from '../../../shared/sim/trace/types'

const N = NO_CYCLE

function instruction(index: number, over: Partial<InstructionTrace>): InstructionTrace {
  return {
    index, staticIndex: index, op: 'vfadd.vv', text: 'vfadd.vv v8, v8, v16', vl: 3, sew: 64, lmul: 1,
    unit: 'fpu', shape: 'elementwise', masked: false, isConfig: false, dispatch: index, complete: null,
    latency: null, flops: 3, stalls: emptyStallCounts(), ...over,
  }
}

export function handTrace(): TimingTrace {
  const machine = { ...defaultMachine, lanes: 2, vlen: 128 }
  const instructions = [
    instruction(0, { op: 'vsetvli', text: 'vsetvli t0, a0, e64, m1, ta, ma', unit: 'none', isConfig: true, flops: 0, dispatch: 0, complete: 0, latency: 1 }),
    instruction(1, { dispatch: 1, complete: 9, latency: 9, stalls: { ...emptyStallCounts(), bank: 1 } }),
    instruction(2, { op: 'vfmacc.vf', text: 'vfmacc.vf v16, fa0, v8', vl: 1, masked: true, dispatch: 2, complete: 12, latency: 11, flops: 2, stalls: { ...emptyStallCounts(), raw: 1, queue: 1 } }),
  ]
  // per instruction, per lane: elements, beats, readStart, readEnd, execStart, execEnd, writeStart, writeEnd
  const rows = [
    [0, 0, N, N, N, N, N, N], [0, 0, N, N, N, N, N, N],
    [2, 2, 2, 4, 3, 8, 7, 9], [1, 1, 2, 2, 3, 6, 7, 7],
    [1, 1, 5, 5, 6, 10, 11, 11], [0, 0, N, N, N, N, N, N],
  ]
  const laneTimes = new Int32Array(rows.flat())
  if (laneTimes.length !== instructions.length * 2 * LANE_FIELD_COUNT) throw new Error('hand trace: wrong shape')
  // Lane 0: bank stall in cycle 3 for instruction 1, then raw 4 and queue 5 for instruction 2 (adjacent spans).
  const stall = [
    [0, 3, 1, STALL_REASONS.indexOf('bank'), 1],
    [0, 4, 1, STALL_REASONS.indexOf('raw'), 2],
    [0, 5, 1, STALL_REASONS.indexOf('queue'), 2],
  ]
  return {
    formatVersion: 1,
    machine,
    laneCount: 2,
    cycles: 12,
    instructions,
    laneTimes,
    stalls: {
      count: stall.length,
      lane: new Uint16Array(stall.map((s) => s[0]!)),
      start: new Int32Array(stall.map((s) => s[1]!)),
      length: new Int32Array(stall.map((s) => s[2]!)),
      reason: new Uint8Array(stall.map((s) => s[3]!)),
      instruction: new Int32Array(stall.map((s) => s[4]!)),
    },
    resources: [{ id: 0, kind: 'unit', name: 'lane 0 fpu', lane: 0, capacity: 1 }],
    // Grown buffers: capacity 4, count 2, as an engine that doubles its arrays keeps them.
    usage: {
      count: 2,
      resource: new Uint32Array([0, 0, 0, 0]),
      start: new Int32Array([3, 6, 0, 0]),
      length: new Int32Array([2, 1, 0, 0]),
      amount: new Uint16Array([1, 1, 0, 0]),
      instruction: new Int32Array([1, 2, 0, 0]),
    },
    metrics: {
      cycles: 12, flops: 5, flopsPerCycle: 5 / 12, peakFlopsPerCycle: 4, laneBusy: [0.75, 0.5],
      unitUtilization: { alu: 0, mul: 0, fpu: 0.125, div: 0 }, bankUtilization: [0.1, 0.1, 0, 0, 0, 0],
      busUtilization: { load: 0, store: 0 }, ringUtilization: 0,
      stallCycles: { ...emptyStallCounts(), bank: 1, raw: 1, queue: 1 },
    },
  }
}
