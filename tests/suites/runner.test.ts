/**
 * A suite run's verdicts (server/services/suite-runner.ts) when one timing
 * rule changes. The "test build" changes one rule through the run's machine
 * (SuiteRunOptions.adjustMachine: the FPU latency 4 -> 8) rather than by
 * editing the engine: the latency is a machine field the timing model reads
 * for every FP instruction, so this is the same change a rebuilt engine with
 * another constant would make, and it needs no second copy of the engine.
 *
 * Closed forms (handbook timing-model.md section 5, as in
 * tests/cli/check.test.ts): one vfadd.vv of 64 e64 elements on 8 lanes is
 * c0 + b + D + 2 = 2 + 8 + 4 + 2 = 16 cycles, 20 with D = 8; the integer
 * vadd.vv the same with the ALU's latency 2: 14 cycles whatever the FPU does.
 */
import { describe, expect, it } from 'vitest'
import type { Machine } from '../../shared/schemas/machine'
import { scenarioContentSchema } from '../../shared/schemas/scenario'
import { runSuiteScenarios, type SuiteScenario } from '../../server/services/suite-runner'

const VFADD = '  li a0, 64\n  vsetvli t0, a0, e64, m1, ta, ma\n  vfadd.vv v3, v1, v2\n'
const VADD = '  li a0, 64\n  vsetvli t0, a0, e64, m1, ta, ma\n  vadd.vv v3, v1, v2\n'

const scenario = (id: string, program: string, expectations: unknown[]): SuiteScenario => ({
  id,
  found: { title: id, version: 1, content: scenarioContentSchema.parse({ title: id, program, expectations }) },
})

const suite = [
  scenario('fp add', VFADD, [
    { kind: 'metric', metric: 'cycles', op: '<=', value: 16 },
    { kind: 'stall', reason: 'bank', op: '==', value: 0 },
    { kind: 'metric', metric: 'flops', op: '==', value: 64 },
  ]),
  scenario('int add', VADD, [{ kind: 'metric', metric: 'cycles', op: '<=', value: 14 }, { kind: 'metric', metric: 'flops', op: '==', value: 0 }]),
  scenario('negative case', 'vfoo.vv v1, v2, v3\n', [{ kind: 'fails', stage: 'assemble' }]),
]

const verdicts = (o: ReturnType<typeof runSuiteScenarios>) => o.entries.flatMap((e) => e.results.map((r) => `${e.title} › ${r.text}: ${r.pass ? 'pass' : 'FAIL'}`))

describe('a suite run', () => {
  it('is green on the default machine', () => {
    const o = runSuiteScenarios(suite, null)
    expect(o.red).toBe(false)
    expect(o.failed).toBe(0)
    expect(o.passed).toBe(6)
  })

  it('turns exactly the claim that depends on the FPU latency red when that one rule changes', () => {
    const slowFpu = (m: Machine): Machine => ({ ...m, units: { ...m.units, fpu: { latency: 8 } } })
    const before = verdicts(runSuiteScenarios(suite, null))
    const o = runSuiteScenarios(suite, null, { adjustMachine: slowFpu })
    const after = verdicts(o)
    const changed = after.filter((v, i) => v !== before[i])
    expect(changed).toEqual(['fp add › cycles <= 16: FAIL'])
    expect(o.entries[0]?.results[0]?.measured).toBe('20')
    expect(o.red).toBe(true)
  })

  it('runs every scenario on the preset when the suite names one', () => {
    // 4 lanes: 64 elements are 16 beats a lane, c0 + b + D + 2 = 2 + 16 + 4 + 2 = 24 cycles.
    const o = runSuiteScenarios(suite, 'starter-4')
    expect(o.entries[0]?.results[0]).toMatchObject({ pass: false, measured: '24' })
  })

  it('is red when a scenario was deleted, and says which', () => {
    const o = runSuiteScenarios([...suite, { id: 'gone', found: null }], null)
    expect(o.red).toBe(true)
    expect(o.failed).toBe(0)
    expect(o.entries.at(-1)).toMatchObject({ status: 'missing', error: { message: 'the scenario was deleted' } })
  })
})
