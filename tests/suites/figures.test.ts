/**
 * The characterisation's verdict rules (README "Characterisation report") on
 * kernels whose bound is known by construction, with bounds on their figures
 * derived by hand from the model's resources (docs/model.md: one FPU beat a
 * lane a cycle, single-port banks, one 512-bit load bus), and the report's
 * geometric mean, ratio and CSV.
 */
import { parse } from 'csv-parse/sync'
import { describe, expect, it } from 'vitest'
import { kernelFigures, topStalls } from '../../shared/characterise/figures'
import { buildReport, geometricMean, reportCsv } from '../../shared/characterise/report'
import { parseMachine, type MachineInput } from '../../shared/schemas/machine'
import type { KernelFigures, SuiteRunEntry } from '../../shared/schemas/suite'
import { runPipeline } from '../../shared/sim/run'
import { emptyStallCounts } from '../../shared/sim/trace/types'
import { CHAIN, COMPUTE, LOADS, ORDERED } from './bounds.programs'

function figures(program: string, m: MachineInput = {}): KernelFigures {
  const machine = parseMachine(m)
  const r = runPipeline({ program, machine })
  if (!r.ok) throw new Error(r.error.message)
  return kernelFigures(r.trace.metrics, machine)
}

describe('the bound of a kernel', () => {
  it('compute: 8 independent FMAs on register data', () => {
    // 8 FMAs x 16 iterations x 128 elements / 8 lanes = 2048 FPU beats a lane, one a cycle at most.
    const f = figures(COMPUTE)
    expect(f.cycles).toBeGreaterThanOrEqual(2048)
    expect(f.bound).toBe('compute')
    expect(f.verdict).toMatch(/^compute-bound: FPU busy \d+% of lane-cycles$/)
  })

  it('bank ports: the same FMAs on one single-port bank a lane', () => {
    // Each FMA beat reads 3 words and writes 1: 4 uses of the one port, so at most 1 beat in 4 cycles (2048 x 4 = 8192).
    const f = figures(COMPUTE, { rfBanks: 1 })
    expect(f.cycles).toBeGreaterThanOrEqual(8192)
    // FPU beats: those 2048 plus 32 of the set-up's vfcvt and vfadd, over at least 8192 cycles: at most 2080 / 8192.
    expect(f.unitUtilization.fpu).toBeLessThanOrEqual(2080 / 8192)
    expect(f.bound).toBe('bank ports')
    expect(f.topStalls[0]?.reason).toBe('bank')
  })

  it('memory bus: sixteen 1 KiB loads nobody reads, four memory ports on one bus', () => {
    // 16 KiB over a 64-byte-a-cycle load bus: at least 256 cycles, never more than 64 bytes a cycle.
    const f = figures(LOADS, { memoryPorts: 4 })
    expect(f.cycles).toBeGreaterThanOrEqual(256)
    expect(f.bytesPerCycle).toBeLessThanOrEqual(64)
    expect(f.bytesPerCycle).toBeCloseTo((16 * 1024) / f.cycles, 6)
    expect(f.bound).toBe('memory bus')
  })

  it('dependences: a chain of 64 dependent adds', () => {
    // Each add waits for the one before: at least 64 x FPU latency 4 = 256 cycles.
    const f = figures(CHAIN)
    expect(f.cycles).toBeGreaterThanOrEqual(256)
    expect(f.bound).toBe('dependences')
    expect(f.topStalls[0]?.reason).toBe('raw')
  })

  it('ring: ordered sums walking 256 elements from lane to lane', () => {
    // One ordered sum: 256 adds in element order, each an FPU latency (4) plus a ring hop (1): at least 1280 cycles.
    const f = figures(ORDERED)
    expect(f.cycles).toBeGreaterThanOrEqual(1280)
    expect(f.bound).toBe('ring')
    expect(f.verdict).toContain('other than full queues')
  })

  it('names the two largest stall reasons with their share', () => {
    const stalls = { ...emptyStallCounts(), raw: 30, bank: 50, ring: 20 }
    expect(topStalls(stalls)).toEqual([
      { reason: 'bank', share: 0.5 },
      { reason: 'raw', share: 0.3 },
    ])
    expect(topStalls(emptyStallCounts())).toEqual([])
  })
})

describe('the report', () => {
  const fig = (cycles: number, flops: number, peak: number): KernelFigures => ({
    ...figures(CHAIN),
    cycles,
    flops,
    flopsPerCycle: flops / cycles,
    peakFlopsPerCycle: peak,
    fractionOfPeak: flops / cycles / peak,
  })
  const entry = (id: string, f: KernelFigures | null): SuiteRunEntry => ({ scenarioId: id, title: `kernel, "${id}"`, version: 1, status: f ? 'ok' : 'failed', error: null, results: [], figures: f })

  it('takes the geometric mean of the fraction of peak over FP kernels, and the ratio of cycles per kernel', () => {
    // Fractions 0.5 and 0.125: geometric mean sqrt(0.5 x 0.125) = 0.25; the integer kernel is left out.
    const a = [entry('a', fig(100, 800, 16)), entry('b', fig(400, 800, 16)), entry('c', fig(50, 0, 16))]
    const b = [entry('a', fig(50, 800, 32)), entry('b', fig(100, 800, 32)), entry('c', null)]
    const r = buildReport([{ label: 'A', entries: a }, { label: 'B', entries: b }])
    expect(r.geomeanFractionOfPeak[0]).toBeCloseTo(0.25, 12)
    expect(r.geomeanKernels).toEqual([2, 2])
    expect(r.rows.map((x) => x.ratio)).toEqual([2, 4, null])
    expect(geometricMean([])).toBeNull()
  })

  it('writes CSV that an RFC 4180 reader reads back (csv-parse)', () => {
    const r = buildReport([{ label: 'A', entries: [entry('a', fig(100, 800, 16))] }, { label: 'B', entries: [entry('a', fig(50, 800, 16))] }])
    const rows = parse(reportCsv(r), { record_delimiter: '\r\n' }) as string[][]
    expect(rows[0]?.[0]).toBe('kernel')
    expect(rows[1]?.[0]).toBe('kernel, "a"')
    expect(rows[1]?.[1]).toBe('100')
    expect(rows[1]?.at(-1)).toBe('2.00')
    expect(rows.at(-1)?.[0]).toBe('geometric mean of fraction of peak')
    expect(new Set(rows.map((x) => x.length)).size).toBe(1)
  })
})
