/**
 * examples/bank-conflicts.s: what its header promises a user who changes the
 * register file, and its output against QEMU user mode (handbook reference
 * check 2: GNU as/ld, qemu-riscv64 -cpu rv64,v=true,vlen=N,vext_spec=v1.0).
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { afterAll, describe, expect, it } from 'vitest'
import { parseMachine, type MachineInput } from '../../../shared/schemas/machine'
import { execute } from '../../../shared/sim/exec/execute'
import { assemble } from '../../../shared/sim/isa/assembler'
import { simulate } from '../../../shared/sim/timing/simulate'
import { missingTools } from '../../reference/tools'
import { build, runQemu, TOOLS, VLENS } from '../../reference/qemu/harness'

const PATH = 'examples/bank-conflicts.s'
const source = readFileSync(PATH, 'utf8')

function run(input: MachineInput) {
  const machine = parseMachine(input)
  const asm = assemble(source)
  if (!asm.ok) throw new Error(asm.errors[0]?.message)
  const ex = execute(asm.program, { vlen: machine.vlen })
  if (!ex.ok) throw new Error(ex.error.message)
  const { trace, error } = simulate(ex.stream, machine)
  expect(error).toBeUndefined()
  return { trace, stalls: trace.metrics.stallCycles, output: ex.output }
}

describe('the bank-conflict demo (examples/bank-conflicts.s)', () => {
  const base = run({})

  it('shows bank stalls on the default machine (6 single-port banks), in every lane', () => {
    expect(base.stalls.bank).toBeGreaterThan(0.1 * base.trace.cycles * base.trace.laneCount)
    const lanes = new Set<number>()
    for (let i = 0; i < base.trace.stalls.count; i++) if (base.trace.stalls.reason[i] === 1) lanes.add(base.trace.stalls.lane[i]!)
    expect(lanes.size).toBe(base.trace.laneCount)
  })

  it('has about three times the bank stalls and a fifth more cycles with 4 banks, as its header says', () => {
    const four = run({ rfBanks: 4 })
    expect(four.stalls.bank).toBeGreaterThan(2.5 * base.stalls.bank)
    expect(four.trace.cycles / base.trace.cycles).toBeGreaterThan(1.15)
  })

  it('all but loses them with 2 ports per bank, and has none with 8 banks of 2 ports', () => {
    expect(run({ rfPortsPerBank: 2 }).stalls.bank).toBeLessThan(0.05 * base.stalls.bank)
    expect(run({ rfBanks: 8, rfPortsPerBank: 2 }).stalls.bank).toBe(0)
  })

  it('prints acc = 32 i^2 for i < vl (the closed form of its arithmetic)', () => {
    const out = new Float64Array(new Uint8Array(base.output).buffer)
    expect(out.length).toBe(128)
    out.forEach((v, i) => expect(v).toBe(32 * i * i))
  })
})

const missing = missingTools(TOOLS)
describe.skipIf(missing.length > 0)('examples/bank-conflicts.s against QEMU user mode', () => {
  const dir = mkdtempSync(join(tmpdir(), 'chimeline-bank-'))
  afterAll(() => rmSync(dir, { recursive: true, force: true }))

  it.each(VLENS)('prints the same bytes as qemu-riscv64 at VLEN %i', async (vlen) => {
    const exe = await build({ name: 'bank-conflicts', path: PATH, source }, dir)
    const qemu = await runQemu(exe, vlen)
    const asm = assemble(source)
    if (!asm.ok) throw new Error(asm.errors[0]?.message)
    const ex = execute(asm.program, { vlen, recordStream: false })
    if (!ex.ok) throw new Error(ex.error.message)
    expect(qemu.stdout.length).toBeGreaterThan(0)
    expect(Buffer.from(ex.output).equals(qemu.stdout)).toBe(true)
    expect(ex.exitCode).toBe(qemu.exitCode)
  })
})
