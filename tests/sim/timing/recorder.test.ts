/**
 * The span recorder's storage (shared/sim/timing/recorder.ts) against a plain
 * list of rows kept beside it: spans past the first chunk (65,536 rows) and
 * across the first chunk's growth come back whole, in order of their start,
 * with uses opened ahead of time (ring bookings) sorted stably among the
 * others, and stalls cut at the run's last cycle. The expected rows are built
 * by the test itself, one per call, not by the recorder.
 */
import { describe, expect, it } from 'vitest'
import { SpanRecorder } from '../../../shared/sim/timing/recorder'

interface UseRow { start: number; length: number; instruction: number; amount: number; resource: number }

function recorder(resources: number, lanes = 1): SpanRecorder {
  const rec = new SpanRecorder(lanes, true)
  for (let r = 0; r < resources; r++) rec.addResource({ kind: 'unit', name: `unit ${r}`, lane: 0, capacity: 1 })
  rec.seal()
  return rec
}

describe('span recorder storage', () => {
  it('returns every span of a long run, past the first chunk, in order of its start', () => {
    const rec = recorder(3)
    const rows: UseRow[] = []
    // A new instruction every cycle: no use merges with the one before, so each call is one span of one cycle.
    const cycles = 150_000
    for (let c = 0; c < cycles; c++) {
      rec.use(c % 3, c, 1, c)
      rows.push({ start: c, length: 1, instruction: c, amount: 1, resource: c % 3 })
    }
    const { usage } = rec.finish(cycles)
    expect(usage.count).toBe(rows.length)
    for (const i of [0, 255, 256, 511, 65_535, 65_536, 131_072, cycles - 1]) {
      const want = rows[i] as UseRow
      expect([usage.start[i], usage.length[i], usage.instruction[i], usage.amount[i], usage.resource[i]]).toEqual([want.start, want.length, want.instruction, want.amount, want.resource])
    }
    expect(usage.start.every((s, i) => s === i)).toBe(true)
  })

  it('sorts uses opened ahead of time among the others, stably', () => {
    const rec = recorder(2)
    // Resource 1 is booked at cycle 70,000 before the run gets there (as the ring is); resource 0 is used every cycle.
    rec.use(1, 70_000, 1, 9)
    for (let c = 0; c < 70_002; c++) rec.use(0, c, 1, c)
    const { usage } = rec.finish(70_002)
    expect(usage.count).toBe(70_003)
    // Rows starting at 70,000: resource 1's booking came first, so it stays first.
    const at = [...usage.start].indexOf(70_000)
    expect([usage.resource[at], usage.instruction[at]]).toEqual([1, 9])
    expect([usage.resource[at + 1], usage.instruction[at + 1]]).toEqual([0, 70_000])
    for (let i = 1; i < usage.count; i++) expect(usage.start[i]! >= usage.start[i - 1]!).toBe(true)
  })

  it('keeps stall spans of several lanes and cuts them at the run end', () => {
    const rec = recorder(1, 2)
    // Lane 0 stalls on a new instruction each cycle (a span each); lane 1 one long span that runs past the end.
    for (let c = 0; c < 80_000; c++) {
      rec.stallAt(0, c, 2, c)
      rec.stallAt(1, c, 4, 7)
    }
    const { stalls } = rec.finish(79_990)
    // 79,990 one-cycle spans of lane 0, and lane 1's span cut to 79,990 cycles.
    expect(stalls.count).toBe(79_991)
    const long = [...stalls.lane].indexOf(1)
    expect([stalls.start[long], stalls.length[long], stalls.reason[long], stalls.instruction[long]]).toEqual([0, 79_990, 4, 7])
    expect(rec.stallTotals[2]).toBe(79_990)
    expect(rec.stallTotals[4]).toBe(79_990)
  })
})
