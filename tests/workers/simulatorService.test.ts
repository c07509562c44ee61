/**
 * The Worker's service, called directly (no Worker thread): it reports
 * progress between batches, can be cancelled, supersedes a run in progress,
 * returns structured errors as values, and hands back the compact trace.
 */
import { readFileSync } from 'node:fs'
import { join } from 'node:path'
import * as Comlink from 'comlink'
import { describe, expect, it } from 'vitest'
import { defaultMachine } from '../../shared/schemas/machine'
import { runPipeline } from '../../shared/sim/run'
import { decodeTrace } from '../../shared/sim/trace/compact'
import { readDump } from '../../shared/sim/exec/dump'
import { execute } from '../../shared/sim/exec/execute'
import { registerGroupsOf } from '../../shared/sim/registerGroups'
import { assemble } from '../../shared/sim/isa/assembler'
import { createSimulatorService, type SimulatorService } from '../../src/workers/simulatorService'
import { elementSum, machine as fpMachine, machineSum, program as fpProgram } from '../sim/fpOrderFixture'

const longStream = readFileSync(join(import.meta.dirname, '..', '..', 'examples', 'long-stream.s'), 'utf8')
const saxpy = readFileSync(join(import.meta.dirname, '..', '..', 'examples', 'saxpy.s'), 'utf8')
// Yield after every batch, so that the tests see every pause.
const eager = () => createSimulatorService({ sliceMs: 0 })

describe('the simulator Worker service', () => {
  it('returns the same trace as the pipeline run directly, in compact form', async () => {
    const r = await eager().simulate(saxpy, defaultMachine)
    expect(r.ok).toBe(true)
    const direct = runPipeline({ program: saxpy, machine: defaultMachine })
    if (!r.ok || !direct.ok) throw new Error('run failed')
    const back = decodeTrace(r.trace)
    expect(back.cycles).toBe(direct.trace.cycles)
    expect(back.instructions).toEqual(direct.trace.instructions)
    expect(back.laneTimes).toEqual(direct.trace.laneTimes)
    expect(r.functional.output).toEqual(direct.functional.output)
  })

  it('reports progress with cycles that grow, up to the whole stream', async () => {
    const seen: { cycle: number; total: number; stage: string }[] = []
    const r = await eager().simulate(longStream, { ...defaultMachine, lanes: 1 }, { batchCycles: 10_000 }, (p) => seen.push(p))
    expect(r.ok).toBe(true)
    const timing = seen.filter((p) => p.stage === 'simulate' && p.cycle > 0)
    expect(timing.length).toBeGreaterThan(5)
    expect(timing.every((p, i) => i === 0 || p.cycle > timing[i - 1]!.cycle)).toBe(true)
    expect(timing[0]!.total).toBe(1000)
  })

  it('stops at the next pause after cancel() with a cancelled error', async () => {
    const service = eager()
    let pauses = 0
    const run = service.simulate(longStream, { ...defaultMachine, lanes: 1 }, { batchCycles: 1000 }, () => {
      if (++pauses === 3) service.cancel()
    })
    const r = await run
    expect(r).toMatchObject({ ok: false, error: { code: 'cancelled', stage: 'simulate' } })
    expect(pauses).toBe(3)
  })

  it('cancels a run in progress when a new one starts', async () => {
    const service = eager()
    const first = service.simulate(longStream, { ...defaultMachine, lanes: 1 }, { batchCycles: 1000 })
    const second = service.simulate(saxpy, defaultMachine)
    expect(await first).toMatchObject({ ok: false, error: { code: 'cancelled' } })
    expect((await second).ok).toBe(true)
  })

  it.each([
    ['an assembly error, with line and column', 'vfadd.vv v1\n', defaultMachine, 'assemble'],
    ['a machine field out of range', saxpy, { ...defaultMachine, lanes: 0 }, 'machine'],
  ])('returns %s as a value', async (_what, program, machine, stage) => {
    const r = await eager().simulate(program, machine)
    expect(r.ok).toBe(false)
    if (r.ok) return
    expect(r.error.stage).toBe(stage)
    if (stage === 'assemble') expect(r.error.diagnostics?.[0]).toMatchObject({ line: 1 })
    if (stage === 'machine') expect(r.error.fields?.[0]?.field).toBe('lanes')
  })

  it.each([
    ['element order by default (as QEMU)', {}, elementSum],
    ["the machine's order with fpReductionOrder 'machine'", { fpReductionOrder: 'machine' as const }, machineSum],
  ])('sums vfredusum in %s (binary32 sums from tests/sim/fpOrderFixture.ts)', async (_what, options, expected) => {
    const r = await eager().simulate(fpProgram, fpMachine, options)
    if (!r.ok) throw new Error(r.error.message)
    const asm = assemble(fpProgram)
    if (!asm.ok) throw new Error('fixture does not assemble')
    expect(readDump(asm.program, r.functional.memory, { label: 'sum', count: 1, type: 'f32' })).toEqual({ ok: true, values: [expected] })
  })

  it('returns each dynamic instruction\'s registers, equal to those of the dynamic stream, across a real message channel', async () => {
    // Comlink over a MessageChannel, as the page talks to the Worker: the typed arrays must survive structured cloning or transfer.
    const { port1, port2 } = new MessageChannel()
    Comlink.expose(eager(), port1)
    const remote = Comlink.wrap<SimulatorService>(port2)
    try {
      const r = await remote.simulate(saxpy, defaultMachine)
      if (!r.ok) throw new Error(r.error.message)
      const asm = assemble(saxpy)
      if (!asm.ok) throw new Error('saxpy does not assemble')
      const run = execute(asm.program, { vlen: defaultMachine.vlen })
      if (!run.ok) throw new Error(run.error.message)
      const expected = registerGroupsOf(run.stream)
      expect(r.registers.count).toBe(r.trace.instructions.count)
      expect(r.registers.writes).toBeInstanceOf(Uint32Array)
      expect(r.registers).toEqual(expected)
    } finally {
      port1.close()
      port2.close()
    }
  })

  it('returns the register use with a partial trace cut short by the cycle limit', async () => {
    const r = await eager().simulate(longStream, defaultMachine, { timing: { cycleLimit: 50 } })
    expect(r).toMatchObject({ ok: false, error: { code: 'cycle-limit' } })
    if (r.ok) return
    expect(r.trace).toBeDefined()
    expect(r.registers?.count).toBe(r.trace?.instructions.count)
  })
})
