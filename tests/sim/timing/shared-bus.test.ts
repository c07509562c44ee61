/**
 * The load and store buses are shared by every memory port (timing model
 * section 7; docs/model.md "Memory"): more ports overlap accesses and hide
 * latency, they never multiply bandwidth. Bounds derived by hand.
 */
import { describe, expect, it } from 'vitest'
import { parseMachine } from '../../../shared/schemas/machine'
import { simulate } from '../../../shared/sim/timing/simulate'
import { buildStream, unitLoad, unitStore } from './factories'

// 256 FP64 elements fill a group of two registers at the default VLEN 8192 (LMUL 2).
const load256 = (vd: number) => unitLoad(vd, 256, 0x1000, 64, { lmul: 2, dstRegs: [vd, vd + 1] })
const store256 = (vs: number, base: number) => ({ ...unitStore(vs, 256, base), lmul: 2 as const, srcRegs: [[vs, vs + 1]] })

describe('shared load and store buses', () => {
  it('moves 8 unit-stride loads of 256 FP64 elements in at least 256 cycles on a 512-bit bus with 2 memory ports', () => {
    // 8 x 256 elements x 64 bits = 131,072 bits over one 512-bit load bus: at least 131,072 / 512 = 256 cycles
    // of bus transfer, whatever the number of ports (before: each port had its own bus and it took 198).
    const loads = Array.from({ length: 8 }, (_, k) => load256(8 + 2 * k))
    const m = parseMachine({ memoryPorts: 2, loadBusBits: 512 })
    for (const identicalLanes of [true, false]) {
      const { trace, error } = simulate(buildStream(loads), m, { identicalLanes })
      expect(error).toBeUndefined()
      expect(trace.cycles).toBeGreaterThanOrEqual(256)
      // The bus is the bottleneck: at most 256 + memLatency + the few cycles of dispatch, start and write-back.
      expect(trace.cycles).toBeLessThanOrEqual(256 + m.memLatency + 8)
      expect(trace.resources.filter((r) => r.kind === 'bus')).toHaveLength(2)
    }
  })

  it('overlaps a second port with the first only to hide latency: 2 ports beat 1 by at most the latency per access', () => {
    // With one port a load holds it until its last element arrived (memLatency after its last request), so
    // n loads of B bus cycles take about n x (B + memLatency); with two, the bus stays busy: about n x B + memLatency.
    const loads = Array.from({ length: 4 }, (_, k) => unitLoad(8 + 2 * k, 128))
    const one = simulate(buildStream(loads), parseMachine({ memoryPorts: 1 })).trace.cycles
    const two = simulate(buildStream(loads), parseMachine({ memoryPorts: 2 })).trace.cycles
    const B = (128 * 64) / 512
    expect(two).toBeGreaterThanOrEqual(4 * B)
    expect(one).toBeGreaterThanOrEqual(4 * (B + 16))
    expect(two).toBeLessThan(one)
  })

  it('shares the store bus too: 4 stores of 256 FP64 elements take at least 4 x 256 x 64 / 512 = 128 cycles with 4 ports', () => {
    const stores = Array.from({ length: 4 }, (_, k) => store256(8 + 2 * k, 0x10000 * (k + 1)))
    const { trace } = simulate(buildStream(stores), parseMachine({ memoryPorts: 4 }))
    expect(trace.cycles).toBeGreaterThanOrEqual(128)
    expect(trace.metrics.busUtilization.store).toBeLessThanOrEqual(1)
  })
})
