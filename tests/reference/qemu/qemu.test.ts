/**
 * Reference check 2 (handbook): Chimeline's functional results against QEMU
 * user mode. Every corpus program ends by writing its result region (vl values
 * included) to stdout; Chimeline's `output` must equal QEMU's stdout byte for
 * byte at VLEN 128, 256 and 1024.
 */
import { beforeAll, describe, expect, it } from 'vitest'
import { assemble } from '../../../shared/sim/isa/assembler'
import { execute } from '../../../shared/sim/exec/execute'
import { missingTools } from '../tools'
import { corpus, type QemuRun, referenceOutputs, TOOLS, VLENS } from './harness'

const programs = corpus()
const missing = missingTools(TOOLS)
const inCi = process.env.CI === 'true'
if (missing.length > 0) {
  console.warn(`\n!!! QEMU reference check SKIPPED: missing ${missing.join(', ')} (run: bash scripts/ensure-tools.sh riscv)\n`)
}

function firstDifference(a: Uint8Array, b: Uint8Array): string {
  const n = Math.min(a.length, b.length)
  for (let i = 0; i < n; i++) if (a[i] !== b[i]) return `first difference at byte ${i}: Chimeline 0x${a[i]!.toString(16)}, QEMU 0x${b[i]!.toString(16)}`
  return `lengths differ: Chimeline ${a.length} bytes, QEMU ${b.length} bytes`
}

describe.runIf(missing.length > 0 && inCi)('QEMU reference tools under CI', () => {
  it('are installed (binutils-riscv64-linux-gnu, qemu-user)', () => {
    expect(missing).toEqual([])
  })
})

describe.skipIf(missing.length > 0)('functional results match QEMU (qemu-riscv64 user mode, -cpu rv64,v=true,vext_spec=v1.0)', () => {
  let reference: Map<string, QemuRun>
  beforeAll(async () => {
    reference = await referenceOutputs(programs)
  }, 120_000)

  it('the corpus has at least 25 programs of our own', () => {
    expect(programs.length).toBeGreaterThanOrEqual(25)
  })

  const cases = programs.flatMap((p) => VLENS.map((vlen) => ({ name: p.name, source: p.source, vlen })))
  it.each(cases)('$name at VLEN $vlen prints the same bytes as QEMU', ({ name, source, vlen }) => {
    const qemu = reference.get(`${name}@${vlen}`)!
    expect(qemu.stdout.length, 'QEMU printed nothing: the program does not reach its write').toBeGreaterThan(0)
    const asm = assemble(source)
    if (!asm.ok) throw new Error(`assembly failed: ${JSON.stringify(asm.errors[0])}`)
    const run = execute(asm.program, { vlen, recordStream: false })
    if (!run.ok) throw new Error(`execution failed: ${JSON.stringify(run.error)}`)
    const same = Buffer.from(run.output).equals(qemu.stdout)
    expect(same, same ? '' : firstDifference(run.output, qemu.stdout)).toBe(true)
    expect(run.exitCode).toBe(qemu.exitCode)
  })
})
