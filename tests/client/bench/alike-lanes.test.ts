/**
 * A run that timed alike lanes once keeps one usage row for the same unit or
 * bank in each lane of a class (UsageSpans.copies). The Bench's lookups must
 * read such rows as they read the same run with every lane timed, one span a
 * row: the busy resources of a cycle, a unit's beats per lane, the bank heat
 * and the bank collisions. The reference is the engine with
 * `identicalLanes: false` (every lane timed and recorded on its own).
 */
import { describe, expect, it } from 'vitest'
import { parseMachine } from '@shared/schemas/machine'
import { execute } from '@shared/sim/exec/execute'
import { assemble } from '@shared/sim/isa/assembler'
import { decodeTrace, encodeTrace } from '@shared/sim/trace/compact'
import { expandUsage, type TimingTrace } from '@shared/sim/trace/types'
import { simulate } from '@shared/sim/timing/simulate'
import { bankHeat, collisionsOf } from '@/lib/bench/bankView'
import { busyResources, execBeats, indexTrace } from '@/lib/bench/inspector'
import longStream from '../../../examples/long-stream.s?raw'

/** The shipped long stream at vl 250 on 8 lanes: classes of 2 and 6 lanes (a ragged tail), on 4 single-port banks so that lanes collide. */
function runs(): { alike: TimingTrace; every: TimingTrace } {
  const text = longStream.replace('.equ    AVL, 256\n', '.equ    AVL, 250\n')
  const asm = assemble(text)
  if (!asm.ok) throw new Error(asm.errors[0]?.message)
  const ex = execute(asm.program, { vlen: 8192 })
  if (!ex.ok) throw new Error(ex.error.message)
  const machine = parseMachine({ rfBanks: 4 })
  return { alike: simulate(ex.stream, machine).trace, every: simulate(ex.stream, machine, { identicalLanes: false }).trace }
}

const { alike, every } = runs()
const byIndex = <T extends { index: number; amount: number }>(xs: T[]) => [...xs].sort((a, b) => a.index - b.index || a.amount - b.amount)

describe('usage rows standing for alike lanes', () => {
  it('are what the planned run keeps: fewer rows than spans, the same spans once expanded', () => {
    expect(alike.usage.copies).toBeDefined()
    expect(alike.usage.count).toBeLessThan(every.usage.count)
    expect(expandUsage(alike.usage).count).toBe(every.usage.count)
  })

  it('give the same busy resources in every cycle (resource, use, users)', () => {
    const a = indexTrace(alike)
    const e = indexTrace(every)
    for (let c = 0; c < alike.cycles; c += 97) {
      const got = busyResources(a, c).map((r) => ({ ...r, users: byIndex(r.users) }))
      const want = busyResources(e, c).map((r) => ({ ...r, users: byIndex(r.users) }))
      expect(got).toEqual(want)
    }
  })

  it("give each lane's unit the same beats up to any cycle", () => {
    const a = indexTrace(alike)
    const e = indexTrace(every)
    for (const ins of alike.instructions.slice(0, 40)) {
      for (let lane = 0; lane < alike.laneCount; lane++) {
        for (const c of [ins.dispatch ?? 0, (ins.dispatch ?? 0) + 20, ins.complete ?? 0]) expect(execBeats(a, ins.index, lane, c)).toBe(execBeats(e, ins.index, lane, c))
      }
    }
  })

  it('give the same bank heat and the same collisions', () => {
    const window = { start: 0, end: alike.cycles }
    expect(Array.from(bankHeat(alike, window, 64).use)).toEqual(Array.from(bankHeat(every, window, 64).use))
    const refused = alike.instructions.filter((i) => i.stalls.bank > 0).slice(0, 5)
    expect(refused.length).toBeGreaterThan(0)
    for (const ins of refused) expect(collisionsOf(alike, ins.index)).toEqual(collisionsOf(every, ins.index))
  })

  it('cross the Worker boundary with their copies', () => {
    const back = decodeTrace(encodeTrace(alike))
    expect(back.usage.copyStride).toBe(alike.usage.copyStride)
    expect(Array.from(back.usage.copies ?? [])).toEqual(Array.from(alike.usage.copies ?? []))
  })
})
