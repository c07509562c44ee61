import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { laneElements } from '../../../shared/sim/timing/config'
import { simulate } from '../../../shared/sim/timing/simulate'
import { laneTiming } from '../../../shared/sim/trace/types'
import { ampleMachine, buildOp, buildStream } from './factories'

describe('data layout and the single-instruction closed form (handbook sections 1 and 5)', () => {
  it('gives lane l max(0, ceil((vl - l) / L)) elements, summing to vl', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 4096 }), fc.integer({ min: 1, max: 64 }), (vl, L) => {
        let sum = 0
        for (let l = 0; l < L; l++) {
          const n = laneElements(vl, l, L)
          expect(n).toBe(Math.max(0, Math.ceil((vl - l) / L)))
          sum += n
        }
        expect(sum).toBe(vl)
      }),
    )
  })

  it('times one vfadd.vv as reads 1..b, beats 2..b+1, writes 2+D..b+1+D and cycles = b + D + 2, ports ample', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 16 }), fc.integer({ min: 1, max: 32 }), fc.integer({ min: 1, max: 1024 }), (lanes, D, vlRaw) => {
        const vlen = 4096 * Math.max(1, 2 ** Math.ceil(Math.log2(lanes)))
        const vl = Math.min(vlRaw, vlen / 64)
        const m = ampleMachine({ lanes, vlen, units: { fpu: { latency: D } } })
        const { trace, error } = simulate(buildStream([buildOp({ vl })]), m)
        expect(error).toBeUndefined()
        const b = Math.ceil(vl / lanes)
        expect(trace.cycles).toBe(b + D + 2)
        const busiest = laneTiming(trace, 0, 0)
        expect(busiest).toMatchObject({ elements: b, beats: b, readStart: 1, readEnd: b, execStart: 2, execEnd: b + D, writeStart: 2 + D, writeEnd: b + 1 + D })
        for (let l = 0; l < lanes; l++) {
          const t = laneTiming(trace, 0, l)
          expect(t.elements).toBe(laneElements(vl, l, lanes))
          if (t.elements === 0) expect(t.readStart).toBeNull()
        }
      }),
      { numRuns: 60 },
    )
  })
})
