import { describe, expect, it } from 'vitest'
import { assemble } from '@shared/sim/isa'
import { elementWriteStates, formatElements, halfToNumber, writesFloat } from '@/lib/bench/registerValues'
import { dependenciesOf, lastWriter, registerUse, writtenRegisters } from '@/lib/bench/registerUse'
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

describe('registerUse and dependencies', () => {
  const src = `    li a0, 8
    vsetvli t0, a0, e64, m1, ta, ma
    vle64.v v8, (a1)
    vfadd.vv v4, v8, v8
    vfmacc.vv v4, v8, v8
    vse64.v v4, (a1)
`
  const r = run(src.replace('vle64.v v8, (a1)', 'la a1, d\n    vle64.v v8, (a1)') + '    .data\nd: .zero 64\n')
  const a = assemble(src.replace('vle64.v v8, (a1)', 'la a1, d\n    vle64.v v8, (a1)') + '    .data\nd: .zero 64\n')
  if (!a.ok) throw new Error('fixture does not assemble')
  const uses = registerUse(r.trace, a.program)

  it('reads vd for multiply-accumulate and stores, writes it otherwise (RISC-V V 1.0 sections 7, 13.6)', () => {
    expect(uses.map((u) => [u.writes, u.reads])).toEqual([
      [[], []],
      [[8], []],
      [[4], [8]],
      [[4], [4, 8]],
      [[], [4]],
    ])
  })

  it('links producers and consumers of the selected instruction through registers', () => {
    expect(dependenciesOf(uses, 3)).toEqual([
      { from: 2, to: 3 },
      { from: 1, to: 3 },
      { from: 3, to: 4 },
    ])
  })

  it('finds the last writer of a register and the registers written', () => {
    expect(lastWriter(uses, 4)).toBe(3)
    expect(lastWriter(uses, 30)).toBe(-1)
    expect(writtenRegisters(uses)).toEqual([4, 8])
  })

  it('gives table rows with first read, last write and the vtype', () => {
    const rows = instructionRows(r.trace)
    expect(rows[3]).toMatchObject({ index: 3, vtype: 'e64/m1', vl: 8 })
    expect(rows[3]!.firstRead).toBeLessThanOrEqual(rows[3]!.lastWrite!)
    expect(rows[0]).toMatchObject({ firstRead: null, lastWrite: null })
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
