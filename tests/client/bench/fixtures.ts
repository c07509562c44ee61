/**
 * Traces for the Bench tests: real runs of the reference timing model on
 * small programs (the closed forms of the handbook's section 5 hold for them),
 * and a hand-made trace builder for cases a program cannot easily provoke.
 */
import { runPipeline } from '@shared/sim/run'
import { defaultMachine, parseMachine, type MachineInput } from '@shared/schemas/machine'
import { LANE_FIELD_COUNT, emptyStallCounts, type InstructionTrace, type TimingTrace } from '@shared/sim/trace/types'

export function run(program: string, machine: MachineInput = {}) {
  const r = runPipeline({ program, machine })
  if (!r.ok) throw new Error(`fixture did not run: ${r.error.message}`)
  return r
}

/** One vfadd.vv of `vl` FP64 elements on a register file with ports to spare, so no bank conflict can occur. */
export function singleAdd(vl: number, machine: MachineInput = {}) {
  return run(`    li a0, ${vl}\n    vsetvli t0, a0, e64, m8, ta, ma\n    vfadd.vv v8, v16, v24\n`, {
    rfBanks: 16, rfPortsPerBank: 4, vlen: 16384, ...machine,
  })
}

type Times = [elements: number, beats: number, rs: number, re: number, es: number, ee: number, ws: number, we: number]

export interface HandInstruction {
  text: string
  lanes: Times[]
}

export interface HandStall {
  lane: number
  start: number
  length: number
  reason: number
  instruction: number
}

/** A trace written by hand: phase times per lane, stall spans; no usage spans. */
export function handTrace(instructions: HandInstruction[], stalls: HandStall[] = [], machine: MachineInput = {}): TimingTrace {
  const m = parseMachine({ ...machine, lanes: instructions[0]?.lanes.length ?? 1 })
  const L = m.lanes
  const laneTimes = new Int32Array(instructions.length * L * LANE_FIELD_COUNT)
  instructions.forEach((ins, i) => ins.lanes.forEach((t, l) => laneTimes.set(t, (i * L + l) * LANE_FIELD_COUNT)))
  const sorted = [...stalls].sort((a, b) => a.start - b.start)
  const counts = emptyStallCounts()
  const infos: InstructionTrace[] = instructions.map((ins, index) => ({
    index, staticIndex: index, op: ins.text.split(' ')[0] ?? '', text: ins.text, vl: 8, sew: 64, lmul: 1, unit: 'fpu', shape: 'elementwise',
    masked: false, isConfig: false, dispatch: 0, complete: 10, latency: 11, flops: 0, stalls: emptyStallCounts(),
  }))
  const cycles = Math.max(1, ...instructions.flatMap((i) => i.lanes.map((t) => t[7] + 1)))
  return {
    formatVersion: 1,
    machine: m ?? defaultMachine,
    laneCount: L,
    cycles,
    instructions: infos,
    laneTimes,
    stalls: {
      count: sorted.length,
      lane: Uint16Array.from(sorted.map((s) => s.lane)),
      start: Int32Array.from(sorted.map((s) => s.start)),
      length: Int32Array.from(sorted.map((s) => s.length)),
      reason: Uint8Array.from(sorted.map((s) => s.reason)),
      instruction: Int32Array.from(sorted.map((s) => s.instruction)),
    },
    resources: [],
    usage: { count: 0, resource: new Uint32Array(), start: new Int32Array(), length: new Int32Array(), amount: new Uint16Array(), instruction: new Int32Array() },
    metrics: {
      cycles, flops: 0, flopsPerCycle: 0, peakFlopsPerCycle: 2 * L, laneBusy: Array(L).fill(0),
      unitUtilization: { alu: 0, mul: 0, fpu: 0, div: 0 }, bankUtilization: [], busUtilization: { load: 0, store: 0 }, ringUtilization: 0, stallCycles: counts,
    },
  }
}
