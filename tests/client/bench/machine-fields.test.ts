import { describe, expect, it } from 'vitest'
import { GROUPS, changedFields, getField, issuesByField, machineFields, machineSummary, matchingPreset, setField } from '@/lib/bench/machineFields'
import { checkMachine, defaultMachine, parseMachine } from '@shared/schemas/machine'
import { PRESETS } from '@shared/sim/presets'

describe('machineFields', () => {
  const fields = machineFields()

  it('has one field per leaf of the schema, each in a named group (none left in Other)', () => {
    expect(fields.length).toBe(28)
    expect(fields.filter((f) => f.group === 'other')).toEqual([])
    for (const f of fields) expect(GROUPS.map((g) => g.id)).toContain(f.group)
  })

  it.each([
    // Ranges and defaults of the handbook's configuration table (timing model section 0).
    ['lanes', 1, 64, 8],
    ['vlen', 64, 65536, 8192],
    ['physRegs', 32, 256, 48],
    ['units.div.cyclesPerBeat', 1, 128, 20],
    ['memLatency', 0, 1000, 16],
  ])('takes %s: %i..%i, default %i, from the schema', (path, min, max, def) => {
    expect(fields.find((f) => f.path === path)).toMatchObject({ kind: 'integer', min, max, default: def })
  })

  it('knows which fields take only powers of two', () => {
    expect(fields.filter((f) => f.powerOfTwo).map((f) => f.path)).toEqual(['vlen', 'loadBusBits', 'storeBusBits'])
  })

  it('offers the three issue policies and carries the schema help text', () => {
    const issue = fields.find((f) => f.path === 'issue')!
    expect(issue.options).toEqual(['serial', 'lockstep', 'staggered'])
    expect(issue.help).toMatch(/next arithmetic instruction/)
    expect(fields.every((f) => f.help.length > 0)).toBe(true)
  })

  it('every field path reads a value of the default machine', () => {
    for (const f of fields) expect(getField(defaultMachine, f.path)).toBe(f.default)
  })
})

describe('setField', () => {
  it('sets a nested field without changing the input', () => {
    const m = setField(defaultMachine, 'units.fpu.latency', 6)
    expect(m.units.fpu.latency).toBe(6)
    expect(defaultMachine.units.fpu.latency).toBe(4)
    expect(changedFields(defaultMachine, m)).toEqual(['units.fpu.latency'])
  })

  it('works on a reactive proxy, which structuredClone cannot copy', async () => {
    const { reactive } = await import('vue')
    const m = setField(reactive(structuredClone(defaultMachine)), 'lanes', 4)
    expect(m.lanes).toBe(4)
    expect(m.units.fpu.latency).toBe(4)
  })
})

describe('validation messages by field', () => {
  it('names the field, the value and the range', () => {
    const r = checkMachine(setField(defaultMachine, 'lanes', 99))
    expect(r.ok).toBe(false)
    if (r.ok) return
    expect(issuesByField(r.issues).lanes).toBe('99 is outside the range 1..64')
  })
})

describe('machineSummary', () => {
  it.each([
    [{ lanes: 8, vlen: 16384, rfBanks: 5 }, '8 lanes, VLEN 16384, staggered, 5x1 banks'],
    [{ lanes: 1, vlen: 4096, issue: 'serial' as const, chaining: false, rfPortsPerBank: 2 }, '1 lane, VLEN 4096, serial, 6x2 banks, no chaining'],
  ])('summarises %j', (input, expected) => {
    expect(machineSummary(parseMachine(input))).toBe(expected)
  })
})

describe('matchingPreset', () => {
  it.each(PRESETS.map((p) => [p.name, p] as const))('finds %s from its machine, whatever the order of its fields', (_name, p) => {
    const m = parseMachine(p.machine)
    const reordered = Object.fromEntries(Object.entries(m).reverse()) as typeof m
    expect(matchingPreset(reordered, PRESETS)?.id).toBe(p.id)
  })

  it('finds none for a machine of the user\'s own (one field changed), nor for an invalid draft', () => {
    const p = PRESETS[1]!
    expect(matchingPreset(setField(parseMachine(p.machine), 'units.fpu.latency', 7), PRESETS)).toBeNull()
    expect(matchingPreset(null, PRESETS)).toBeNull()
  })
})
