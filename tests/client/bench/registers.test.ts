import { describe, expect, it } from 'vitest'
import { registersIn } from '@shared/sim/registerGroups'
import { elementWriteStates, formatElements, halfToNumber, writesFloat } from '@/lib/bench/registerValues'
import { dependenciesOf, firstWritten, lastWriter, writtenRegisters } from '@/lib/bench/registerUse'
import { instructionRows, lmulText } from '@/lib/bench/instructionRows'
import { run, singleAdd } from './fixtures'

const bytes = (...b: number[]) => Uint8Array.from(b)

describe('formatElements', () => {
  it('shows FP32 as decimal with the IEEE 754 bits in hex (1.5 = 0x3fc00000, IEEE 754-2019 binary32)', () => {
    expect(formatElements(bytes(0, 0, 0xc0, 0x3f, 0, 0, 0x80, 0xbf), { sew: 32, float: true })).toEqual([
      { text: '1.5', hex: '0x3fc00000' },
      { text: '-1', hex: '0xbf800000' },
    ])
  })

  it('shows integers signed, little-endian (RISC-V memory order)', () => {
    expect(formatElements(bytes(0xff, 0xff, 0x02, 0x00), { sew: 16, float: false })).toEqual([
      { text: '-1', hex: '0xffff' },
      { text: '2', hex: '0x0002' },
    ])
  })

  it('shows FP64 and stops at the count asked for', () => {
    const b = new Uint8Array(16)
    new DataView(b.buffer).setFloat64(0, 0.1, true)
    expect(formatElements(b, { sew: 64, float: true, count: 1 })).toEqual([{ text: '0.1', hex: '0x3fb999999999999a' }])
  })

  it.each([
    // IEEE 754 binary16 patterns (from memory, checkable with numpy.float16): 0x3c00 = 1, 0xc000 = -2, 0x7c00 = inf, 0x0001 = 2^-24.
    [0x3c00, 1],
    [0xc000, -2],
    [0x7c00, Infinity],
    [0x0001, 2 ** -24],
  ])('decodes binary16 %s as %s', (bits, value) => {
    expect(halfToNumber(bits)).toBe(value)
  })

  it.each([
    ['vfadd.vv', true],
    ['vfmacc.vf', true],
    ['vfcvt.x.f.v', false],
    ['vfirst.m', false],
    ['vadd.vv', false],
    ['vle32.v', false],
  ])('%s writes FP: %s', (op, fp) => {
    expect(writesFloat(op)).toBe(fp)
  })
})

describe('elementWriteStates', () => {
  it('marks the elements written by the cursor: one word a cycle from writeStart (handbook section 5)', () => {
    const r = singleAdd(16, { lanes: 1 })
    const pos = r.trace.instructions.findIndex((i) => i.op === 'vfadd.vv')
    const ws = r.trace.laneTimes[pos * 8 + 6]!
    const states = elementWriteStates(r.trace, pos, ws + 2)
    expect(states.filter((s) => s === 'written').length).toBe(3)
    expect(states.slice(3).every((s) => s === 'pending')).toBe(true)
  })
})

describe('register use and dependencies from the dynamic stream', () => {
  const src = `    la a1, d
    li a0, 8
    vsetvli t0, a0, e64, m1, ta, ma
    vle64.v v8, (a1)
    vfadd.vv v4, v8, v8
    vfmacc.vv v4, v8, v8
    vse64.v v4, (a1)
    .data
d: .zero 64
`
  const r = run(src)
  const g = r.registers
  const use = (i: number) => [registersIn(g.writes[i]!), Array.from(g.sources.subarray(g.sourceStart[i], g.sourceStart[i + 1]), registersIn)]

  it('reads vd for multiply-accumulate and stores, writes it otherwise (RISC-V V 1.0 sections 7, 13.6)', () => {
    expect([0, 1, 2, 3, 4].map(use)).toEqual([
      [[], []],
      [[8], []],
      [[4], [[8], [8]]],
      [[4], [[8], [8], [4]]],
      [[], [[4]]],
    ])
  })

  it('links producers and consumers of the selected instruction through registers', () => {
    expect(dependenciesOf(g, 3)).toEqual([
      { from: 1, to: 3 },
      { from: 2, to: 3 },
      { from: 3, to: 4 },
    ])
  })

  it('finds the last writer of a register, the registers written and an instruction\'s first destination', () => {
    expect(lastWriter(g, 4)).toBe(3)
    expect(lastWriter(g, 30)).toBe(-1)
    expect(writtenRegisters(g)).toEqual([4, 8])
    expect(firstWritten(g, 1)).toBe(8)
    expect(firstWritten(g, 4)).toBeNull()
  })

  it('gives table rows with first read, last write and the vtype', () => {
    const rows = instructionRows(r.trace)
    expect(rows[3]).toMatchObject({ index: 3, vtype: 'e64/m1', vl: 8 })
    expect(rows[3]!.firstRead).toBeLessThanOrEqual(rows[3]!.lastWrite!)
    expect(rows[0]).toMatchObject({ firstRead: null, lastWrite: null })
  })

  // Register groups: with LMUL = 2, v8 names the group v8..v9 (RISC-V V 1.0 section 3.4.2).
  const grouped = run(`    li a0, 4
    vsetvli t0, a0, e64, m2, ta, ma
    vid.v v8
    vsetvli t0, a0, e64, m1, ta, ma
    vid.v v9
    vsetvli t0, a0, e64, m2, ta, ma
    vadd.vv v12, v8, v8
    vadd.vv v8, v10, v10
    vadd.vv v14, v8, v8
`).registers

  it('takes as producer of a group the last instruction that wrote any of its registers (the m1 write of v9, not the m2 write of v8..v9)', () => {
    expect(registersIn(grouped.writes[1]!)).toEqual([8, 9])
    expect(dependenciesOf(grouped, 5)).toEqual([{ from: 3, to: 5 }])
    expect(dependenciesOf(grouped, 1)).toEqual([])
  })

  it('stops linking consumers once every register the instruction wrote was written again', () => {
    expect(dependenciesOf(grouped, 3)).toEqual([{ from: 3, to: 5 }])
    expect(dependenciesOf(grouped, 6)).toEqual([{ from: 6, to: 7 }])
  })

  // A masked instruction reads v0 as its mask (RISC-V V 1.0 section 5.3).
  const masked = run(`    li a0, 4
    vsetvli t0, a0, e64, m1, ta, mu
    vid.v v4
    vmsgt.vi v0, v4, 1
    vadd.vv v8, v4, v4, v0.t
`).registers

  it('counts the mask as a source group {v0}', () => {
    expect(dependenciesOf(masked, 3)).toEqual([
      { from: 1, to: 3 },
      { from: 2, to: 3 },
    ])
    expect(dependenciesOf(masked, 2)).toEqual([{ from: 1, to: 2 }, { from: 2, to: 3 }])
  })

  it.each([[-1], [99], [1.5]])('has no dependencies for an instruction %s outside the run', (i) => {
    expect(dependenciesOf(g, i)).toEqual([])
    expect(dependenciesOf(null, 0)).toEqual([])
  })
})

describe('lmulText', () => {
  it.each([[1, 'm1'], [8, 'm8'], [0.5, 'mf2'], [0.125, 'mf8']])('writes LMUL %s as %s (RISC-V V 1.0 vsetvli syntax)', (l, t) => {
    expect(lmulText(l)).toBe(t)
  })
})

describe('exportFile', async () => {
  const { exportFile, fileBase } = await import('@/lib/bench/exports')
  const r = singleAdd(16, { lanes: 2 })

  it('writes CSV with one row per instruction and lane under the header (RFC 4180 line ends)', () => {
    const f = exportFile('csv', { trace: r.trace, source: '', name: 'one add' })
    expect(f.name).toBe('one-add.csv')
    const lines = f.text.trimEnd().split('\r\n')
    expect(lines.length).toBe(1 + r.trace.instructions.length * 2)
  })

  it('writes JSON with the machine, the cycles and the model-estimate note', () => {
    const j = JSON.parse(exportFile('json', { trace: r.trace, source: '', name: 'x' }).text)
    expect(j.machine.lanes).toBe(2)
    expect(j.cycles).toBe(r.trace.cycles)
    expect(j.note).toMatch(/not sign-off for silicon/)
  })

  it('writes a VCD that starts with the IEEE 1364-2005 header sections', () => {
    const f = exportFile('vcd', { trace: r.trace, source: '', name: 'x', date: new Date(0) })
    expect(f.text).toMatch(/^\$date/)
    expect(f.text).toContain('$enddefinitions $end')
  })

  it('writes the program text ending in a newline, and needs no run for it', () => {
    expect(exportFile('s', { trace: null, source: 'nop', name: 'p' })).toEqual({ name: 'p.s', type: 'text/plain', text: 'nop\n' })
  })

  it('refuses to export a trace before a run', () => {
    expect(() => exportFile('csv', { trace: null, source: '', name: 'p' })).toThrow(/run the program first/)
  })

  it.each([['../etc/passwd', 'etc-passwd'], ['', 'chimeline'], ['saxpy', 'saxpy']])('makes a file name of %j: %j', (n, b) => {
    expect(fileBase(n)).toBe(b)
  })
})
