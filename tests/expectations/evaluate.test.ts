/**
 * Expectations evaluated against runs whose figures are worked out by hand from
 * the timing model (docs/model.md "The cycle", handbook timing-model.md
 * sections 2, 5, 6 and 10) and from IEEE 754 arithmetic, never taken from the
 * engine's own output.
 */
import { describe, expect, it } from 'vitest'
import { readFileSync } from 'node:fs'
import { join } from 'node:path'
import { evaluateExpectations } from '../../shared/expectations/evaluate'
import { expectationSchema, type Expectation } from '../../shared/schemas/expectation'
import { runPipeline } from '../../shared/sim/run'

const claims = (list: unknown[]): Expectation[] => list.map((c) => expectationSchema.parse(c))

// One vfadd.vv at vl 64 on the default machine (8 lanes, FPU latency D = 4, 6 single-port banks).
// Front end (handbook section 2): `li` executes in cycle 0, `vsetvli` in cycle 1, and the vfadd is
// dispatched in cycle c0 = 2. Lane 3 holds b = 64 / 8 = 8 elements, one FP64 element a beat (FPU
// epc 1). Closed form (handbook section 5, shifted by c0): reads c0+1..c0+b = 3..10, beats
// c0+2..c0+b+1 = 4..11, writes c0+2+D..c0+b+1+D = 8..15, so cycles = c0 + b + D + 2 = 16 and the
// latency (complete - dispatch + 1) is b + D + 2 = 14. v1 and v2 are physical registers 1 and 2: word w
// sits in banks (1 + w) and (2 + w) mod 6, never the same, so no bank stall. Flops (section 6): one
// per element, 64; 64 / 16 = 4 a cycle; peak (section 10) 8 lanes x 2 x 1 = 16 FP64 flops a cycle.
// The lanes wait for the front end in cycles 0, 1 and 2, the cycle the vfadd is dispatched in (it reads
// from the next; docs/model.md "Stalls"): 3 x 8 = 24 `frontend` stall cycles (section 10: blocked
// dispatch is a stall of the lanes it starves).
const VFADD = `
  li a0, 64
  vsetvli t0, a0, e64, m1, ta, ma
  vfadd.vv v3, v1, v2
`

describe('expectations on one vfadd.vv (closed form of the timing model)', () => {
  const run = runPipeline({ program: VFADD, machine: {} })

  it('passes the hand-worked figures and says what it measured', () => {
    const results = evaluateExpectations(
      claims([
        { kind: 'metric', metric: 'cycles', op: '==', value: 16 },
        { kind: 'metric', metric: 'flops', op: '==', value: 64 },
        { kind: 'metric', metric: 'flopsPerCycle', op: '==', value: 4 },
        { kind: 'metric', metric: 'peakFlopsPerCycle', op: '==', value: 16 },
        { kind: 'metric', metric: 'fractionOfPeak', op: '==', value: 0.25 },
        { kind: 'stall', reason: 'bank', op: '==', value: 0 },
        { kind: 'stall', reason: 'frontend', op: '==', value: 24 },
        { kind: 'phase', lane: 3, instruction: 1, field: 'readStart', op: '==', value: 3 },
        { kind: 'phase', lane: 3, instruction: 1, field: 'readEnd', op: '==', value: 10 },
        { kind: 'phase', lane: 3, instruction: 1, field: 'execStart', op: '==', value: 4 },
        { kind: 'phase', lane: 3, instruction: 1, field: 'writeStart', op: '==', value: 8 },
        { kind: 'phase', lane: 3, instruction: 1, field: 'writeEnd', op: '==', value: 15 },
        { kind: 'latency', instruction: 1, op: '==', value: 14 },
        { kind: 'latency', instruction: 1, op: '<=', value: 40 },
      ]),
      run,
    )
    for (const r of results) expect(r, r.text).toMatchObject({ pass: true, note: null })
    expect(results.map((r) => r.measured)).toEqual(['16', '64', '4', '16', '0.25', '0', '24', '3', '10', '4', '8', '15', '14', '14'])
    expect(results[7]!.text).toBe('lane 3, instruction 1, readStart == 3')
  })

  it('fails a bound the run misses, with the cycle, lane and instruction that decide it', () => {
    const [cycles, writeEnd, latency, bank] = evaluateExpectations(
      claims([
        { kind: 'metric', metric: 'cycles', op: '<=', value: 15 },
        { kind: 'phase', lane: 3, instruction: 1, field: 'writeEnd', op: '==', value: 47 },
        { kind: 'latency', instruction: 1, op: '<', value: 14 },
        { kind: 'stall', reason: 'bank', op: '>', value: 0 },
      ]),
      run,
    )
    // The last busy cycle is 15 (cycles count from 0), the vfadd's last write; every lane has 8 elements,
    // so lane 0 is the first lane found writing then.
    expect(cycles).toMatchObject({ pass: false, measured: '16', at: { cycle: 15, lane: 0, instruction: 1 } })
    expect(writeEnd).toMatchObject({ pass: false, measured: '15', at: { cycle: 15, lane: 3, instruction: 1 } })
    expect(latency).toMatchObject({ pass: false, measured: '14', at: { cycle: 15, instruction: 1 } })
    expect(bank).toMatchObject({ pass: false, measured: '0', at: null })
  })

  it('says which instruction or lane does not exist instead of passing or throwing', () => {
    const [lane, ins] = evaluateExpectations(
      claims([
        { kind: 'phase', lane: 8, instruction: 1, field: 'writeEnd', op: '==', value: 15 },
        { kind: 'latency', instruction: 9, op: '<=', value: 40 },
      ]),
      run,
    )
    expect(lane).toMatchObject({ pass: false, measured: null, note: 'the machine has 8 lanes (0 to 7)' })
    expect(ins).toMatchObject({ pass: false, measured: null, note: 'the run has no instruction 9 (it has 0 to 1)' })
  })
})

describe('a bank conflict decided at its first cycle (docs/model.md "Stalls", worked example)', () => {
  // v1 and v7 are physical 1 and 7, 1 = 7 mod 6: every word of both sources is in the same bank. In the
  // vfadd's first read cycle, c0 + 1 = 3, the second source is refused its port in every lane: 8 bank stall
  // cycles, and the run takes one cycle more than the closed form, 17.
  const run = runPipeline({ program: VFADD.replace('v1, v2', 'v1, v7'), machine: {} })

  it('measures stall.bank == 8 and points at cycle 3, lane 0, instruction 1', () => {
    const [bank, cycles] = evaluateExpectations(
      claims([
        { kind: 'stall', reason: 'bank', op: '==', value: 0 },
        { kind: 'metric', metric: 'cycles', op: '<=', value: 16 },
      ]),
      run,
    )
    expect(bank).toMatchObject({ pass: false, measured: '8', at: { cycle: 3, lane: 0, instruction: 1 } })
    expect(cycles).toMatchObject({ pass: false, measured: '17', at: { cycle: 16 } })
  })
})

describe('peak flops (common practice: no run beats its peak; handbook section 10)', () => {
  const example = (name: string) => readFileSync(join(import.meta.dirname, '..', '..', 'examples', name), 'utf8')

  it('keeps the FP64 dot product under 8 lanes x 2 x 1 = 16 flops a cycle', () => {
    const results = evaluateExpectations(
      claims([
        { kind: 'metric', metric: 'peakFlopsPerCycle', op: '==', value: 16 },
        { kind: 'metric', metric: 'flopsPerCycle', op: '<=', value: 16 },
        { kind: 'metric', metric: 'fractionOfPeak', op: '<=', value: 1 },
      ]),
      runPipeline({ program: example('dot.s'), machine: {} }),
    )
    for (const r of results) expect(r.pass, `${r.text}: ${r.measured}`).toBe(true)
  })

  it('counts 2 x 19 = 38 flops for saxpy\'s one vfmacc strip of 19 elements, under the FP32 peak of 8 x 2 x 2 = 32', () => {
    const results = evaluateExpectations(
      claims([
        { kind: 'metric', metric: 'flops', op: '==', value: 38 },
        { kind: 'metric', metric: 'flopsPerCycle', op: '<=', value: 32 },
      ]),
      runPipeline({ program: example('saxpy.s'), machine: {} }),
    )
    for (const r of results) expect(r.pass, `${r.text}: ${r.measured}`).toBe(true)
  })
})

// 0.1 + 0.2 in binary64 rounds to 0x3FD3333333333334, one ulp above 0x3FD3333333333333, the double nearest
// 0.3 (IEEE 754 round to nearest even; a well-known example, from memory).
const SUM = `
  .data
  .balign 8
a:   .double 0.1
b:   .double 0.2
res: .double 0.0
  .text
  la a1, a
  la a2, b
  la a3, res
  vsetivli t0, 1, e64, m1, ta, ma
  vle64.v v1, (a1)
  vle64.v v2, (a2)
  vfadd.vv v3, v1, v2
  vse64.v v3, (a3)
  vsetivli t0, 4, e32, m1, ta, ma
  vmv.v.i v4, -1
`

describe('register and memory values (IEEE 754 binary64, two\'s complement)', () => {
  const run = runPipeline({ program: SUM, machine: {} })

  it('compares floating point by ulps: 0.1 + 0.2 is 1 ulp from 0.3', () => {
    const [exact, near, tolerant, register] = evaluateExpectations(
      claims([
        { kind: 'memory', label: 'res', type: 'f64', values: ['0.30000000000000004'] },
        { kind: 'memory', label: 'res', type: 'f64', values: ['0.3'] },
        { kind: 'memory', label: 'res', type: 'f64', values: ['0.3'], toleranceUlps: 1 },
        { kind: 'register', register: 3, type: 'f64', values: ['0.3'], toleranceUlps: 1 },
      ]),
      run,
    )
    expect(exact).toMatchObject({ pass: true, measured: '[0.30000000000000004]' })
    expect(near).toMatchObject({ pass: false, note: 'element 0: expected 0.3, got 0.30000000000000004 (1 ulp apart)' })
    expect(tolerant!.pass).toBe(true)
    expect(tolerant!.text).toBe('memory at label res (f32 x 1) equals [0.3] within 1 ulp'.replace('f32', 'f64'))
    expect(register!.pass).toBe(true)
  })

  it('reads -1 in e32 as i32 -1, u32 4294967295 and the pattern 0xffffffff', () => {
    const results = evaluateExpectations(
      claims([
        { kind: 'register', register: 4, type: 'i32', values: ['-1', '-1', '-1', '-1'] },
        { kind: 'register', register: 4, type: 'u32', values: ['4294967295', '0xffffffff'] },
        { kind: 'register', register: 4, type: 'i64', values: ['-1', '-1'] },
        { kind: 'register', register: 4, type: 'u32', values: ['-1'] },
      ]),
      run,
    )
    expect(results.map((r) => r.pass)).toEqual([true, true, true, false])
    expect(results[3]!.note).toBe('value 1: -1 is outside the range of u32 (0..4294967295)')
  })

  it('names a missing label and a range past the data segment', () => {
    const [label, past] = evaluateExpectations(
      claims([
        { kind: 'memory', label: 'nothing', type: 'f64', values: ['0'] },
        { kind: 'memory', label: 'res', type: 'f64', values: ['0', '0'] },
      ]),
      run,
    )
    expect(label).toMatchObject({ pass: false, note: 'no label nothing in the program' })
    expect(past).toMatchObject({ pass: false, note: '2 f64 values (16 bytes) run past the data segment (8 bytes)' })
  })
})

describe('negative cases', () => {
  it('passes "run fails at stage assemble" on a program that does not assemble, and fails the others with the reason', () => {
    const run = runPipeline({ program: 'vfoo.vv v1, v2, v3', machine: {} })
    expect(run.ok).toBe(false)
    const [fails, wrongStage, cycles] = evaluateExpectations(
      claims([
        { kind: 'fails', stage: 'assemble' },
        { kind: 'fails', stage: 'execute' },
        { kind: 'metric', metric: 'cycles', op: '<=', value: 120 },
      ]),
      run,
    )
    expect(fails).toMatchObject({ pass: true, text: 'run fails at stage assemble' })
    expect(wrongStage!.pass).toBe(false)
    expect(cycles).toMatchObject({ pass: false, measured: null })
    expect(cycles!.note).toMatch(/^the run failed at stage assemble: /)
  })

  it('fails "run fails" when the run succeeds, and checks the machine stage and its code', () => {
    expect(evaluateExpectations(claims([{ kind: 'fails', stage: 'assemble' }]), runPipeline({ program: VFADD, machine: {} }))[0]).toMatchObject({ pass: false, measured: 'the run succeeded' })
    const bad = runPipeline({ program: VFADD, machine: { lanes: 0 } })
    const [stage, code, otherCode] = evaluateExpectations(
      claims([
        { kind: 'fails', stage: 'machine' },
        { kind: 'fails', stage: 'machine', code: 'invalid-machine' },
        { kind: 'fails', stage: 'machine', code: 'cycle-limit' },
      ]),
      bad,
    )
    expect([stage!.pass, code!.pass, otherCode!.pass]).toEqual([true, true, false])
  })
})
