import { describe, expect, it } from 'vitest'
import { checkMachine, defaultMachine, MachineConfigError, parseMachine } from '../../../shared/schemas/machine'
import { DEFAULT_PRESET_ID, findPreset, PRESETS } from '../../../shared/sim/presets'

describe('the machine configuration schema', () => {
  it('fills in the reference model defaults', () => {
    expect(defaultMachine).toMatchObject({
      lanes: 8, vlen: 8192, fpuElementsPerCycle: { 64: 1, 32: 2, 16: 4 }, dispatchWidth: 1, arithQueueDepth: 8, memQueueDepth: 8,
      physRegs: 48, laneSlots: 3, issue: 'staggered', chaining: true, rfBanks: 6, rfPortsPerBank: 1, operandQueueDepth: 4,
      units: { alu: { latency: 2 }, mul: { latency: 3 }, fpu: { latency: 4 }, div: { cyclesPerBeat: 20 } },
      memoryPorts: 1, memLatency: 16, loadBusBits: 512, storeBusBits: 512, gatherElementsPerCycle: 1,
      reductionAccumulators: 4, interLane: 'ring', ringHopLatency: 1, ringBidirectional: false,
    })
  })

  it.each([
    [{ lanes: 65 }, 'lanes', '65 is outside the range 1..64'],
    [{ lanes: 0 }, 'lanes', '0 is outside the range 1..64'],
    [{ vlen: 100 }, 'vlen', '100 is outside the range 64..65536 (powers of two)'],
    [{ lanes: 64, vlen: 2048 }, 'vlen', 'at least 64 x lanes = 4096'],
    [{ units: { fpu: { latency: 33 } } }, 'units.fpu.latency', '33 is outside the range 1..32'],
    [{ physRegs: 31 }, 'physRegs', '31 is outside the range 32..256'],
    [{ loadBusBits: 500 }, 'loadBusBits', '500 is outside the range 64..4096 (powers of two)'],
    [{ issue: 'eager' }, 'issue', '"eager" is not one of serial, lockstep, staggered'],
    [{ fpuElementsPerCycle: { 64: 9 } }, 'fpuElementsPerCycle.64', '9 is outside the range 1..8'],
    [{ laneSlots: 2.5 }, 'laneSlots', 'not an integer'],
    [{ colour: 'red' }, 'colour', 'unknown field'],
  ])('rejects %j naming the field %s, the value and the range', (input, field, message) => {
    const r = checkMachine(input)
    expect(r.ok).toBe(false)
    if (r.ok) return
    const issue = r.issues.find((i) => i.field === field)
    expect(issue?.message).toContain(message)
    expect(() => parseMachine(input)).toThrow(MachineConfigError)
  })

  it.each(PRESETS.map((p) => [p.name, p]))('accepts the preset %s', (_name, preset) => {
    expect(checkMachine(preset.machine).ok).toBe(true)
  })

  it('has one default machine: the default preset is the schema defaults (handbook section 0: 8 lanes, VLEN 8192, 6 banks)', () => {
    const preset = findPreset(DEFAULT_PRESET_ID)
    expect(preset).toBeDefined()
    expect(parseMachine(preset!.machine)).toEqual(defaultMachine)
    expect(defaultMachine).toMatchObject({ lanes: 8, vlen: 8192, rfBanks: 6, rfPortsPerBank: 1 })
  })

  it('ships the five presets the product names', () => {
    expect(PRESETS.map((p) => p.name)).toEqual(['Default 8-lane', 'Starter 4-lane', 'Long-vector 8-lane', 'Wide 16-lane', 'Textbook single lane'])
    const textbook = parseMachine(PRESETS[4]!.machine)
    expect(textbook).toMatchObject({ lanes: 1, chaining: true, memoryPorts: 1 })
  })
})
