import { describe, expect, it } from 'vitest'
import { reductionFloor } from '../../scripts/bench/reduction-floor'
import { parseMachine, type MachineInput } from '../../shared/schemas/machine'
import { prepareRun } from '../../shared/sim/run'
import { simulate } from '../../shared/sim/timing/simulate'
import { STALL_REASONS } from '../../shared/sim/trace/types'

/**
 * n reductions as the floor times them: `li` and `vsetvli` first (2 front-end
 * cycles, the floor's `lead`), then rounds of 8 `vfredusum.vs` into v8, v10,
 * ..., v22, with the loop's 2 scalar instructions between rounds.
 */
function program(n: number): string {
  const lines = ['    li a0, 256', '    vsetvli t0, a0, e64, m2, ta, ma']
  for (let i = 0; i < n; i++) {
    lines.push(`    vfredusum.vs v${8 + 2 * (i % 8)}, v2, v4`)
    if (i % 8 === 7 && i < n - 1) lines.push('    addi t1, t1, -1', '    bnez t1, 1f', '1:')
  }
  lines.push('    li a7, 93', '    ecall')
  return lines.join('\n') + '\n'
}

function engineRun(n: number, input: MachineInput) {
  const machine = parseMachine(input)
  const p = prepareRun({ program: program(n) }, { vlen: machine.vlen })
  if (!p.ok) throw new Error(p.error.message)
  const r = simulate(p.prepared.stream, machine)
  if (r.error) throw new Error(r.error.message)
  return r.trace
}

const MACHINES: [string, MachineInput][] = [
  ['the defaults (8 lanes, 6 banks, 4 accumulators)', {}],
  ['4 lanes, 4 banks, 2 accumulators', { lanes: 4, rfBanks: 4, reductionAccumulators: 2 }],
  ['16 lanes, FPU latency 6, 8 accumulators, 2 lane slots, 40 registers, 2-cycle hops', { lanes: 16, units: { fpu: { latency: 6 } }, reductionAccumulators: 8, laneSlots: 2, physRegs: 40, ringHopLatency: 2 }],
]

describe('the least model of the reductions (scripts/bench/reduction-floor.ts)', () => {
  // A cross-check against the engine, not an outside reference: it shows the bench's floor does the
  // engine's work on this stream, so that its speed is a fair floor for the engine's.
  for (const [name, input] of MACHINES) {
    it(`gives the engine's cycles, usage rows and stall cycles on ${name}`, () => {
      const machine = parseMachine(input)
      for (const n of [1, 8, 80]) {
        const trace = engineRun(n, input)
        const floor = reductionFloor(machine, n, true, 2)
        expect(floor.cycles, `${n} reductions`).toBe(trace.cycles)
        expect(floor.usageRows, `${n} reductions`).toBe(trace.usage.count)
        expect(Object.fromEntries(STALL_REASONS.map((r, i) => [r, floor.stallCycles[i]]))).toEqual(trace.metrics.stallCycles)
        // The engine's front-end stall spans of the first cycles name the vset (op 0), then the first reduction:
        // one more span a lane than the floor, which has no vset.
        expect(floor.stallRows + machine.lanes, `${n} reductions`).toBe(trace.stalls.count)
      }
    })
  }

  it('is bound by lane 0 taking one FPU operation a cycle (worked by hand)', () => {
    // docs/model.md "Unordered reductions", default machine: lane 0 holds 256 / 8 = 32 FP64 elements, one a
    // beat (fpuElementsPerCycle 64 = 1); then A - 1 = 3 combines of its 4 accumulators, the add of the value
    // arriving over the ring, and vs1[0]: 37 operations of one cycle each on its one pipelined FPU, every
    // one a busy cycle of lane 0. So n reductions take at least 37 n cycles.
    const n = 80
    const floor = reductionFloor(parseMachine({}), n, false)
    expect(floor.cycles).toBeGreaterThanOrEqual(37 * n)
    expect(floor.busy[0]).toBeGreaterThanOrEqual(37 * n)
  })

  it('records nothing without usage spans, and times the same', () => {
    const machine = parseMachine({})
    const withSpans = reductionFloor(machine, 16, true)
    const without = reductionFloor(machine, 16, false)
    expect(without.usageRows).toBe(0)
    expect(without.cycles).toBe(withSpans.cycles)
    expect(Array.from(without.stallCycles)).toEqual(Array.from(withSpans.stallCycles))
  })

  it('refuses a machine it is not written for', () => {
    expect(() => reductionFloor(parseMachine({ issue: 'lockstep' }), 8, true)).toThrow(/written for staggered issue/)
    expect(() => reductionFloor(parseMachine({ interLane: 'tree' }), 8, true)).toThrow(/written for/)
    expect(() => reductionFloor(parseMachine({ lanes: 3 }), 8, true)).toThrow(/vl 256 a multiple of the lanes/)
  })
})
