import { describe, expect, it } from 'vitest'
import { sweepDefinitionSchema, SWEEP_FIGURE_COLUMNS } from '../../shared/schemas/sweep'
import { parseSpec } from '../../shared/sweep/spec'
import { pointValues, resolveSweep } from '../../shared/sweep/resolve'
import { symbolDefinitions, withSymbols } from '../../shared/sweep/symbols'
import { sweepCsvHeader } from '../../shared/sweep/csv'
import { chunkPrograms, largestFirst, programGroups, programOrder } from '../../shared/sweep/order'
import { threadChunkSize } from '../../server/cli/sweepThreads'
import { serverChunkSize } from '../../server/services/sweeps-queue'
import { runSweep } from '../../shared/sweep/runSweep'
import { runPipeline } from '../../shared/sim/run'
import { figuresOf } from '../../shared/sweep/figures'
import { FMA_CURVE } from './programs'

const resolve = (input: Parameters<typeof sweepDefinitionSchema.parse>[0]) => resolveSweep(sweepDefinitionSchema.parse(input))

describe('sweep SPECs', () => {
  it('expands A..B inclusive, A..B:STEP and comma lists', () => {
    expect(parseSpec('1..4', 100)).toEqual({ ok: true, values: [1, 2, 3, 4] })
    expect(parseSpec('8..32:8', 100)).toEqual({ ok: true, values: [8, 16, 24, 32] })
    expect(parseSpec('1..10:4', 100)).toEqual({ ok: true, values: [1, 5, 9] })
    expect(parseSpec('serial, staggered', 100)).toEqual({ ok: true, values: ['serial', 'staggered'] })
    expect(parseSpec('true,false', 100)).toEqual({ ok: true, values: [true, false] })
    expect(parseSpec('1,2,4,8', 100)).toEqual({ ok: true, values: [1, 2, 4, 8] })
  })

  it('names what is wrong with a bad SPEC', () => {
    expect(parseSpec('5..1', 100)).toMatchObject({ ok: false, message: expect.stringContaining('ends (1) before it starts (5)') })
    expect(parseSpec('1..8:0', 100)).toMatchObject({ ok: false, message: expect.stringContaining('step must be at least 1') })
    expect(parseSpec('1.5..4', 100)).toMatchObject({ ok: false, message: expect.stringContaining('not a range') })
    expect(parseSpec('1,,2', 100)).toMatchObject({ ok: false, message: expect.stringContaining('value 2 of the list is empty') })
    expect(parseSpec('1,2,1', 100)).toMatchObject({ ok: false, message: expect.stringContaining('listed twice') })
    expect(parseSpec('1..1000', 100)).toMatchObject({ ok: false, message: expect.stringContaining('1000 values, more than the limit of 100') })
  })
})

describe('program symbols', () => {
  const text = 'loop:\n    .equ AVL, 256   # elements\n  .set  N,4\n    li a0, AVL\n'
  it('finds .equ and .set definitions and rewrites only the swept one', () => {
    expect(symbolDefinitions(text)).toEqual([
      { name: 'AVL', line: 1, value: '256' },
      { name: 'N', line: 2, value: '4' },
    ])
    expect(withSymbols(text, new Map([['AVL', 17]]))).toBe('loop:\n    .equ AVL, 17   # elements\n  .set  N,4\n    li a0, AVL\n')
  })
})

describe('resolving a sweep', () => {
  it('numbers points with the first parameter varying slowest', () => {
    const r = resolve({ program: FMA_CURVE, parameters: [{ path: 'issue', spec: 'serial,staggered' }, { path: 'AVL', spec: '1..3' }] })
    if (!r.ok) throw new Error(JSON.stringify(r.issues))
    expect(r.sweep.count).toBe(6)
    expect(r.sweep.parameters.map((p) => p.kind)).toEqual(['machine', 'symbol'])
    expect(Array.from({ length: 6 }, (_, i) => pointValues(r.sweep, i))).toEqual([
      ['serial', 1],
      ['serial', 2],
      ['serial', 3],
      ['staggered', 1],
      ['staggered', 2],
      ['staggered', 3],
    ])
  })

  it('names the field, the value and the range of a bad machine value', () => {
    const r = resolve({ program: FMA_CURVE, parameters: [{ path: 'lanes', spec: '60..70:5' }] })
    expect(r).toEqual({ ok: false, issues: [{ field: 'parameters.0.spec', message: 'lanes=65: 65 is outside the range 1..64' }] })
    const e = resolve({ program: FMA_CURVE, parameters: [{ path: 'issue', spec: 'serial,eager' }] })
    expect(e).toMatchObject({ ok: false, issues: [{ message: expect.stringMatching(/^issue=eager: "eager" is not one of serial, lockstep, staggered/) }] })
  })

  it('names an unknown parameter, a symbol defined twice, and a bad base machine field', () => {
    expect(resolve({ program: FMA_CURVE, parameters: [{ path: 'units.fpu.lat', spec: '1' }] })).toMatchObject({ ok: false, issues: [{ field: 'parameters.0.path', message: expect.stringContaining('"units.fpu.lat" is not a machine field') }] })
    expect(resolve({ program: FMA_CURVE, parameters: [{ path: 'VL', spec: '1' }] })).toMatchObject({ ok: false, issues: [{ message: expect.stringContaining('the program defines no symbol VL') }] })
    expect(resolve({ program: '.set N, 1\n.set N, 2\n', parameters: [{ path: 'N', spec: '1' }] })).toMatchObject({ ok: false, issues: [{ message: expect.stringContaining('N is defined 2 times (lines 1, 2)') }] })
    expect(resolve({ program: FMA_CURVE, parameters: [{ path: 'AVL', spec: 'serial' }] })).toMatchObject({ ok: false, issues: [{ message: 'AVL=serial: a program symbol takes whole numbers' }] })
    expect(resolve({ program: FMA_CURVE, machine: { rfBanks: 99 }, parameters: [{ path: 'lanes', spec: '4' }] })).toMatchObject({ ok: false, issues: [{ field: 'machine.rfBanks', message: expect.stringContaining('99 is outside the range 1..16') }] })
  })

  it('refuses a parameter swept twice and more than three parameters (schema)', () => {
    expect(sweepDefinitionSchema.safeParse({ program: 'x', parameters: [{ path: 'lanes', spec: '1' }, { path: 'lanes', spec: '2' }] }).success).toBe(false)
    const four = ['lanes', 'issue', 'rfBanks', 'chaining'].map((path) => ({ path, spec: '1' }))
    expect(sweepDefinitionSchema.safeParse({ program: 'x', parameters: four }).success).toBe(false)
  })
})

describe('running a sweep', () => {
  it('gives each point the figures of a single run of the same program and machine', () => {
    const r = resolve({ program: FMA_CURVE, parameters: [{ path: 'AVL', spec: '5,16' }, { path: 'lanes', spec: '4' }] })
    if (!r.ok) throw new Error('unresolved')
    const { points } = runSweep(r.sweep)
    const single = runPipeline({ program: FMA_CURVE.replace('.equ    AVL, 256', '.equ    AVL, 16'), machine: { lanes: 4 } })
    if (!single.ok) throw new Error(single.error.message)
    expect(points[1]?.figures).toEqual(figuresOf(single.trace.metrics))
    expect(points[1]?.values).toEqual([16, 4])
  })

  it('keeps a failed point as a result with its stage and message', () => {
    // A cross-field rule of the machine schema (vlen >= 64 x lanes) fails only some points.
    const r = resolve({ program: FMA_CURVE, machine: { vlen: 256 }, parameters: [{ path: 'lanes', spec: '4,8' }, { path: 'AVL', spec: '4' }] })
    if (!r.ok) throw new Error(JSON.stringify(r.issues))
    const { points, stopped } = runSweep(r.sweep)
    expect(stopped).toBeNull()
    expect(points.map((p) => p.status)).toEqual(['ok', 'failed'])
    expect(points[1]?.error).toMatchObject({ stage: 'machine', message: expect.stringContaining('vlen must be at least 64 x lanes = 512') })
  })

  it('fails a point over the cycle limit and goes on', () => {
    const r = resolve({ program: FMA_CURVE, limits: { cycleLimit: 200 }, parameters: [{ path: 'AVL', spec: '1,256' }] })
    if (!r.ok) throw new Error('unresolved')
    const { points } = runSweep(r.sweep)
    expect(points.map((p) => [p.status, p.error?.code])).toEqual([['ok', undefined], ['failed', 'cycle-limit']])
  })

  it('stops at the points limit and at the time limit, keeping the points done', () => {
    const r = resolve({ program: FMA_CURVE, limits: { maxPoints: 3 }, parameters: [{ path: 'AVL', spec: '1..5' }] })
    if (!r.ok) throw new Error('unresolved')
    const o = runSweep(r.sweep)
    expect(o.points.map((p) => p.values[0])).toEqual([1, 2, 3])
    expect(o.stopped).toBe('the grid has 5 points, over the limit of 3 points a sweep; the first 3 were run')
    const t = resolve({ program: FMA_CURVE, limits: { timeLimitMs: 10 }, parameters: [{ path: 'AVL', spec: '1..5' }] })
    if (!t.ok) throw new Error('unresolved')
    let clock = 0
    // A fake clock: each reading is 4 ms later, so the limit passes during the third point.
    const timed = runSweep(t.sweep, { now: () => (clock += 4) })
    expect(timed.points).toHaveLength(2)
    expect(timed.stopped).toBe('the sweep reached its time limit of 0.01 s after 2 of 5 points; the points done are kept')
  })

  it('writes the CSV header the CLI promises', () => {
    expect(SWEEP_FIGURE_COLUMNS.length).toBe(16)
    expect(sweepCsvHeader(['AVL', 'issue'])).toBe(
      'AVL,issue,cycles,flops,flopsPerCycle,peakFlopsPerCycle,fractionOfPeak,laneBusyMean,laneBusyMin,stall.raw,stall.bank,stall.queue,stall.slot,stall.barrier,stall.rename,stall.memory,stall.ring,stall.frontend,status,error',
    )
  })
})

describe('program order (shared/sweep/order.ts)', () => {
  it("takes one program's points together, index order inside, and every index once", () => {
    const r = resolveSweep(sweepDefinitionSchema.parse({ program: FMA_CURVE, parameters: [{ path: 'issue', spec: 'serial,staggered' }, { path: 'AVL', spec: '1..3' }] }))
    if (!r.ok) throw new Error('unresolved')
    // Indexes: 0-2 serial AVL 1-3, 3-5 staggered AVL 1-3 (first parameter slowest).
    expect(programOrder(r.sweep, 6)).toEqual([0, 3, 1, 4, 2, 5])
    const m = resolveSweep(sweepDefinitionSchema.parse({ program: FMA_CURVE, parameters: [{ path: 'issue', spec: 'serial,staggered' }, { path: 'lanes', spec: '2,4' }] }))
    if (!m.ok) throw new Error('unresolved')
    expect(programOrder(m.sweep, 4)).toEqual([0, 1, 2, 3])
    expect(programGroups(m.sweep, 4)).toEqual([[0, 1, 2, 3]])
  })

  it('chunks keep each program whole, and cut only a program of more than 32 points (the CLI threads and the server queue)', () => {
    // The heavy grid's shape: 32 programs (AVL) of 3 points (issue); two CLI threads want chunks of ceil(96 / 64) = 2 points.
    const groups = Array.from({ length: 32 }, (_, a) => [a, a + 32, a + 64])
    expect(threadChunkSize(96, 2)).toBe(2)
    expect(chunkPrograms(groups, 2)).toEqual(groups)
    // The server's queue: ceil(96 / 16) = 6 points a chunk, two programs each.
    expect(serverChunkSize(96)).toBe(6)
    expect(chunkPrograms(groups, serverChunkSize(96))).toEqual(Array.from({ length: 16 }, (_, k) => [...(groups[2 * k] ?? []), ...(groups[2 * k + 1] ?? [])]))
    // 130 programs of one point, chunks of 3: the last one short.
    const single = chunkPrograms(Array.from({ length: 130 }, (_, i) => [i]), 3)
    expect(single.slice(0, 2)).toEqual([[0, 1, 2], [3, 4, 5]])
    expect(single).toHaveLength(44)
    expect(single.at(-1)).toEqual([129])
    // One program of 100 points (a machine field swept alone), chunks of 2: cut.
    const one = chunkPrograms([Array.from({ length: 100 }, (_, i) => i)], 2)
    expect(one).toHaveLength(50)
    expect(one.flat()).toEqual(Array.from({ length: 100 }, (_, i) => i))
    // Runners take the last chunks (the largest vector lengths of an increasing sweep) first.
    expect(largestFirst(chunkPrograms(groups, 2)).slice(0, 2)).toEqual([groups[31], groups[30]])
    // The server's chunk size: a 16th of the sweep, 1 to 16 points.
    expect([serverChunkSize(10), serverChunkSize(100), serverChunkSize(512), serverChunkSize(200_000)]).toEqual([1, 7, 16, 16])
  })
})
