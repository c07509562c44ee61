import { describe, expect, it } from 'vitest'
import { parse } from 'csv-parse/sync'
import { decodeTrace, encodeTrace, transferablesOf } from '../../../shared/sim/trace/compact'
import { CSV_COLUMNS, toCsv } from '../../../shared/sim/trace/csv'
import { ESTIMATE_NOTE, summarize } from '../../../shared/sim/trace/summary'
import { STALL_CODES, toVcd } from '../../../shared/sim/trace/vcd'
import { LANE_FIELDS, STALL_REASONS } from '../../../shared/sim/trace/types'
import { handTrace } from './handTrace'
import { vcdMismatches } from './vcdCheck'
import { parseVcd } from './vcdReader'

describe('the VCD export (IEEE 1364-2005 section 18)', () => {
  const date = new Date('2024-01-02T03:04:05Z')

  it('reads back with the grammar-based reader and agrees with the trace in every cycle', () => {
    const trace = handTrace()
    expect(vcdMismatches(toVcd(trace, { date }), trace)).toEqual([])
  })

  it('is reported by the check when the dump and the trace disagree by one cycle', () => {
    const trace = handTrace()
    const text = toVcd(trace, { date })
    trace.laneTimes[2 * 8 + 5] = 7 // instruction 1, lane 0: execEnd 8 -> 7
    expect(vcdMismatches(text, trace)).toEqual(['lane 0 exec cycle 8: dump [1,2] trace [2]'])
  })

  it('declares one time unit per cycle, a scope per lane and the header commands', () => {
    const f = parseVcd(toVcd(handTrace(), { date, version: '0.1.0' }))
    expect(f.timescale).toEqual({ number: 1, unit: 'ns' })
    expect(f.date).toBe('2024-01-02T03:04:05.000Z')
    expect(f.version).toBe('Chimeline trace exporter 0.1.0')
    expect([...new Set(f.vars.map((v) => v.scope.join('.')))]).toEqual(['chimeline.lane0', 'chimeline.lane1'])
    // Instructions 1 and 2 overlap in lane 0's exec phase (cycles 6..8): a second exec slot.
    expect(f.vars.filter((v) => v.scope[1] === 'lane0').map((v) => v.reference)).toEqual(['read', 'exec', 'exec_1', 'write', 'stall', 'stall_instr'])
    expect(f.times[f.times.length - 1]).toBe(12)
  })

  it('writes the stall code table into the header, 0 for no stall and 1..9 in the order of the reasons', () => {
    const f = parseVcd(toVcd(handTrace(), { date }))
    expect(STALL_CODES).toEqual(['none', ...STALL_REASONS])
    const table = STALL_CODES.map((r, i) => `${i} ${r}`).join(', ')
    expect(f.comments.some((c) => c.includes(table))).toBe(true)
  })

  it('sizes the instruction signals to hold the largest instruction index', () => {
    const trace = handTrace()
    const f = parseVcd(toVcd(trace, { date }))
    expect(f.vars.find((v) => v.reference === 'read')!.size).toBe(2) // indices 0..2
    expect(f.vars.find((v) => v.reference === 'stall')!.size).toBe(4) // codes 0..9
  })

  it('refuses a trace whose phase ends before it starts', () => {
    const trace = handTrace()
    trace.laneTimes[2 * 8 + 3] = 1 // instruction 1, lane 0: readEnd 1 < readStart 2
    expect(() => toVcd(trace)).toThrow(/instruction 1 lane 0 ends its read phase before it starts/)
  })
})

describe('the compact transferable form', () => {
  it('decodes to the trace it encoded, with grown span buffers trimmed to their count', () => {
    const trace = handTrace()
    const back = decodeTrace(encodeTrace(trace))
    expect(back.instructions).toEqual(trace.instructions)
    expect(back.laneTimes).toEqual(trace.laneTimes)
    expect(back.stalls).toEqual(trace.stalls)
    expect(back.usage.count).toBe(2)
    expect([...back.usage.start]).toEqual([3, 6])
    expect({ ...back, usage: null }).toEqual({ ...trace, usage: null })
  })

  it('keeps each string once however many instructions use it', () => {
    const trace = handTrace()
    trace.instructions.push({ ...trace.instructions[1]!, index: 3 })
    const c = encodeTrace(trace)
    expect(c.strings.filter((s) => s === 'vfadd.vv v8, v8, v16')).toHaveLength(1)
  })

  it('moves its buffers on transfer instead of copying them (HTML structured clone)', () => {
    const c = encodeTrace(handTrace())
    const buffers = transferablesOf(c)
    expect(new Set(buffers).size).toBe(buffers.length)
    const moved = structuredClone(c, { transfer: buffers })
    expect(c.laneTimes.byteLength).toBe(0) // detached: the data went with the message
    expect(decodeTrace(moved).instructions[2]!.text).toBe('vfmacc.vf v16, fa0, v8')
  })

  it('rejects an unknown version or code', () => {
    const c = encodeTrace(handTrace())
    expect(() => decodeTrace({ ...c, compactVersion: 2 as 1 })).toThrow(/unknown version 2/)
    c.instructions.unit[1] = 99
    expect(() => decodeTrace(c)).toThrow(/unknown unit code 99/)
  })
})

describe('the CSV export (RFC 4180)', () => {
  const rows = (text: string): string[][] => parse(text, { relax_column_count: false })

  it('has a header and one row per instruction and lane', () => {
    const trace = handTrace()
    const r = rows(toCsv(trace))
    expect(r[0]).toEqual([...CSV_COLUMNS])
    expect(r).toHaveLength(1 + trace.instructions.length * trace.laneCount)
    expect(CSV_COLUMNS.slice(6)).toEqual([...LANE_FIELDS])
  })

  it('quotes texts with commas and leaves null cycles empty', () => {
    const r = rows(toCsv(handTrace()))
    expect(r[1]).toEqual(['0', 'vsetvli t0, a0, e64, m1, ta, ma', '3', '64', '1', '0', '0', '0', '', '', '', '', '', ''])
    expect(r[4]).toEqual(['1', 'vfadd.vv v8, v8, v16', '3', '64', '1', '1', '1', '1', '2', '2', '3', '6', '7', '7'])
  })

  it('ends every record with CRLF', () => {
    const text = toCsv(handTrace())
    expect(text.endsWith('\r\n')).toBe(true)
    expect(text.split('\r\n')).toHaveLength(1 + 6 + 1)
  })
})

describe('the summary form', () => {
  it('has the fields the CLI promises, per instruction and lane', () => {
    const s = summarize(handTrace())
    expect(Object.keys(s)).toEqual(['cycles', 'metrics', 'instructions', 'note'])
    expect(s.note).toBe(ESTIMATE_NOTE)
    expect(s.instructions[2]).toMatchObject({ index: 2, text: 'vfmacc.vf v16, fa0, v8', vl: 1, sew: 64, latency: 11 })
    expect(s.instructions[2]!.lanes[1]).toEqual({ lane: 1, elements: 0, beats: 0, readStart: null, readEnd: null, execStart: null, execEnd: null, writeStart: null, writeEnd: null })
    expect(Object.keys(s.instructions[1]!.lanes[0]!)).toEqual(['lane', ...LANE_FIELDS])
  })

  it('carries the error of a run that was cut short', () => {
    const s = summarize(handTrace(), { error: { code: 'cycle-limit', message: 'stopped after 12 cycles' } })
    expect(s.error).toEqual({ code: 'cycle-limit', message: 'stopped after 12 cycles' })
  })
})
