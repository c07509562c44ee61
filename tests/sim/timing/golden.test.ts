/**
 * The golden corpus: a regression check of the timing engine against itself.
 *
 * The expected digests in golden.json were recorded from the engine as it was
 * before its speed work (commit 7906528), whose closed forms, textbook and
 * common-practice checks (closed-form, references, invariants tests) already
 * passed. Every optimisation since must leave every cycle of every run here
 * unchanged. Each case has two digests (see digest.ts): `timing` covers the
 * cycles, the per-lane phase times, every instruction's record, the metrics and
 * every resource-use span; `stalls` covers the stall spans, the stall totals
 * and every instruction's stalls by reason. They cover every shipped example
 * and a set of random streams on many machines (each preset, chaining on and
 * off, each issue policy, single-port and ample banks).
 *
 * The timing digests are those of 7906528 still: when the stall rule changed
 * (stalls of lanes that also made progress, docs/model.md "Stalls"; later,
 * `slot` in every lockstep lane without a free slot), only the stall digests
 * were re-recorded, with this check of every timing digest on and every lane
 * timed (`identicalLanes` off); the one exception is the run cut by the span
 * limit, which stops earlier since it holds more stall spans. The corpus then
 * passes with identical lanes timed once. bank-conflicts.s was added later
 * (GOLDEN_WRITE=add).
 *
 * A deliberate change of the stall rule re-records only the stall digests (and
 * fails if any timing digest moved):
 *   GOLDEN_WRITE=stalls npx vitest run tests/sim/timing/golden.test.ts
 * A new example adds its cases (every recorded case still checked in full):
 *   GOLDEN_WRITE=add npx vitest run tests/sim/timing/golden.test.ts
 * A deliberate model change re-records both, with a reason in the commit:
 *   GOLDEN_WRITE=1 npx vitest run tests/sim/timing/golden.test.ts
 */
import fc from 'fast-check'
import { existsSync, readFileSync, readdirSync, writeFileSync } from 'node:fs'
import { afterAll, describe, expect, it } from 'vitest'
import { parseMachine, type Machine, type MachineInput } from '../../../shared/schemas/machine'
import { execute } from '../../../shared/sim/exec/execute'
import type { DynamicStream } from '../../../shared/sim/exec/stream'
import { assemble } from '../../../shared/sim/isa/assembler'
import { PRESETS } from '../../../shared/sim/presets'
import { simulate } from '../../../shared/sim/timing/simulate'
import type { SimulateOptions } from '../../../shared/sim/trace/types'
import { caseArb, machineOf } from './arbitraries'
import { buildStream } from './factories'
import { digestRun, type RunDigest } from './digest'

const GOLDEN = new URL('./golden.json', import.meta.url)
const mode = process.env.GOLDEN_WRITE
const writing = mode === '1' || mode === 'stalls' || mode === 'add'
const expected: Record<string, RunDigest> = existsSync(GOLDEN) ? (JSON.parse(readFileSync(GOLDEN, 'utf8')) as Record<string, RunDigest>) : {}
const recorded: Record<string, RunDigest> = {}

/** Machines every example runs on: the presets, and the defaults under each policy, chaining on/off, single-port and ample banks. */
const MACHINES: [string, MachineInput][] = [
  ...PRESETS.map((p): [string, MachineInput] => [p.id, p.machine]),
  ...(['serial', 'lockstep', 'staggered'] as const).flatMap((issue) =>
    [true, false].flatMap((chaining) =>
      [
        ['single-port', { rfBanks: 6, rfPortsPerBank: 1 }],
        ['ample', { rfBanks: 16, rfPortsPerBank: 4 }],
      ].map(([banks, rf]): [string, MachineInput] => [`${issue}/${chaining ? 'chain' : 'nochain'}/${banks as string}`, { issue, chaining, ...(rf as MachineInput) }]),
    ),
  ),
]

function streamOf(text: string, machine: Machine): DynamicStream {
  const asm = assemble(text)
  if (!asm.ok) throw new Error(asm.errors[0]?.message)
  const ex = execute(asm.program, { vlen: machine.vlen })
  if (!ex.ok) throw new Error(ex.error.message)
  return ex.stream
}

function check(key: string, stream: DynamicStream, machine: Machine, options?: SimulateOptions): void {
  const d = digestRun(simulate(stream, machine, options))
  recorded[key] = d
  if (mode === 'add' && !expected[key]) return
  if (mode !== '1') expect(d.timing, `golden timing digest of ${key}`).toBe(expected[key]?.timing)
  if (!writing || mode === 'add') expect(d.stalls, `golden stall digest of ${key}`).toBe(expected[key]?.stalls)
}

const examples = readdirSync('examples').filter((f) => f.endsWith('.s')).sort()

describe('golden corpus: every cycle the engine computed before its speed work', () => {
  it('has a recorded timing and stall digest for every case', () => {
    if (!writing) expect(Object.keys(expected).length).toBeGreaterThan(500)
  })

  it.each(examples)('times the example %s exactly as recorded on every machine', (file) => {
    const text = readFileSync(`examples/${file}`, 'utf8')
    for (const [name, input] of MACHINES) {
      const machine = parseMachine(input)
      check(`example ${file} on ${name}`, streamOf(text, machine), machine)
    }
    // Every preset times the long stream in full: minutes on a loaded 2-core machine, seconds on a quiet one.
  }, 300_000)

  it('times a 1,600-instruction strip-mined run, with and without usage spans, and runs cut short by each limit, as recorded', () => {
    const machine = parseMachine({})
    const stream = streamOf(readFileSync(new URL('./fixtures/strip-mined-1600.s', import.meta.url), 'utf8'), machine)
    check('strip-mined 1600', stream, machine)
    check('strip-mined 1600 without usage', stream, machine, { recordUsage: false })
    check('strip-mined 1600 cycle limit 5000', stream, machine, { cycleLimit: 5000 })
    check('strip-mined 1600 trace limit 20000', stream, machine, { traceLimit: 20000 })
  })

  // Fixed seed: the same streams every run (fast-check is pinned in package-lock.json).
  const cases = fc.sample(caseArb, { seed: 20261202, numRuns: 200 })

  it('times 200 random streams on their own machines as recorded', () => {
    cases.forEach(({ c, ops }, i) => check(`random ${i} on its machine`, buildStream(ops), machineOf(c)))
  })

  it('times 40 random streams on every preset and on single-port and ample banks as recorded', () => {
    cases.slice(0, 40).forEach(({ c, ops }, i) => {
      const stream = buildStream(ops)
      for (const p of PRESETS) check(`random ${i} on ${p.id}`, stream, parseMachine(p.machine))
      for (const [banks, rfBanks, rfPortsPerBank] of [['single-port', 6, 1], ['ample', 16, 4]] as const) {
        check(`random ${i} on ${banks} banks`, stream, parseMachine({ ...machineOf(c), rfBanks, rfPortsPerBank }))
      }
    })
  })

  afterAll(() => {
    if (!writing) return
    const keys = Object.keys(recorded).sort()
    writeFileSync(GOLDEN, '{\n' + keys.map((k) => ` ${JSON.stringify(k)}: ${JSON.stringify(recorded[k])}`).join(',\n') + '\n}\n')
  })
})
