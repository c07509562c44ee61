import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { parseMachine, type MachineInput } from '../../../shared/schemas/machine'
import { execute } from '../../../shared/sim/exec/execute'
import type { UnorderedSum } from '../../../shared/sim/exec/machine'
import { assemble } from '../../../shared/sim/isa/assembler'
import { runPipeline } from '../../../shared/sim/run'
import { machineReductionOrder } from '../../../shared/sim/timing/reduction-order'
import { simulate } from '../../../shared/sim/timing/simulate'

const program = (text: string) => {
  const asm = assemble(text)
  if (!asm.ok) throw new Error(asm.errors.map((e) => `${e.line}:${e.column} ${e.message}`).join('; '))
  return asm.program
}

/** Doubles of very different magnitudes and signs, so that every grouping rounds differently (a fixed LCG, common practice). */
function spread(n: number, seed: number): number[] {
  let s = seed
  const out: number[] = []
  for (let i = 0; i < n; i++) {
    s = (Math.imul(s, 1103515245) + 12345) >>> 0
    out.push(((s % 2 === 0 ? 1 : -1) * (1 + (s % 997) / 997)) * 10 ** ((s >>> 8) % 17))
  }
  return out
}

const usum = (xs: number[], start: number, sew: 32 | 64, vl = xs.length) => `
    .data
    .balign 8
xs: .${sew === 64 ? 'double' : 'float'} ${xs.join(', ')}
s0: .${sew === 64 ? 'double' : 'float'} ${start}
    .text
    li a0, ${vl}
    vsetvli t0, a0, e${sew}, m1, ta, ma
    la a1, xs
    vle${sew}.v v2, (a1)
    la a2, s0
    ${sew === 64 ? 'fld' : 'flw'} fa1, 0(a2)
    vfmv.s.f v1, fa1
    vfredusum.vs v4, v2, v1
    vfmv.f.s fa0, v4
`

function resultOf(text: string, vlen: number, order?: UnorderedSum, sew: 32 | 64 = 64): number {
  const run = execute(program(text), { vlen, ...(order ? { fpReductionOrder: order } : {}) })
  if (!run.ok) throw new Error(run.error.message)
  const bits = run.f[10]!
  return sew === 64 ? new Float64Array(new BigUint64Array([bits]).buffer)[0]! : new Float32Array(new Uint32Array([Number(bits & 0xffffffffn)]).buffer)[0]!
}

describe('the FP reduction order a machine implies (timing model section 8), for functional execution', () => {
  // 4 lanes, 4 accumulators, FPU latency 4, vl 32: lane l holds x[l + 4j], j = 0..7, one FP64 element a beat.
  const L = 4
  const xs = spread(32, 16)
  const start = 0.3
  const lane = (l: number) => Array.from({ length: 8 }, (_, j) => xs[l + 4 * j]!)
  // Beat j into accumulator j mod 4: acc a = x_a + x_(a+4); ready in the order 0, 1, 2, 3, so the engine pairs (0,1) and (2,3).
  const lanePartial = (x: number[]) => (x[0]! + x[4]! + (x[1]! + x[5]!)) + (x[2]! + x[6]! + (x[3]! + x[7]!))
  const p = [0, 1, 2, 3].map((l) => lanePartial(lane(l)))
  const machine = (input: MachineInput) => parseMachine({ lanes: L, vlen: 2048, reductionAccumulators: 4, units: { fpu: { latency: 4 } }, rfBanks: 16, rfPortsPerBank: 4, ...input })

  it('sums on the ring as start + (p0 + (p1 + (p2 + p3))), unlike element order', () => {
    const got = resultOf(usum(xs, start, 64), 2048, machineReductionOrder(machine({ interLane: 'ring' })))
    expect(got).toBe(start + (p[0]! + (p[1]! + (p[2]! + p[3]!))))
    expect(got).not.toBe(resultOf(usum(xs, start, 64), 2048))
  })

  it('sums on the tree as start + ((p0 + p1) + (p2 + p3))', () => {
    const got = resultOf(usum(xs, start, 64), 2048, machineReductionOrder(machine({ interLane: 'tree' })))
    expect(got).toBe(start + (p[0]! + p[1]! + (p[2]! + p[3]!)))
    expect(got).not.toBe(resultOf(usum(xs, start, 64), 2048, machineReductionOrder(machine({ interLane: 'ring' }))))
  })

  it('pairs the partials at the cycles the timing engine combines them (lane 1: 8 beats, 3 combines, then the ring add)', () => {
    const asm = program(usum(xs, start, 64))
    const run = execute(asm, { vlen: 2048 })
    if (!run.ok) throw new Error(run.error.message)
    const { trace } = simulate(run.stream, machine({}))
    const red = trace.instructions.find((i) => i.op === 'vfredusum.vs')!
    const fpu = trace.resources.find((r) => r.name === 'lane 1 fpu')!.id
    const cycles: number[] = []
    for (let i = 0; i < trace.usage.count; i++) {
      if (trace.usage.resource[i] !== fpu || trace.usage.instruction[i] !== red.index) continue
      for (let c = trace.usage.start[i]!; c < trace.usage.start[i]! + trace.usage.length[i]!; c++) cycles.push(c)
    }
    const t0 = Math.min(...cycles)
    // Accumulators ready at t0 + 8, 9, 10, 11: (0,1) at t0 + 9, (2,3) at t0 + 11, the two results at t0 + 15;
    // lane partials are ready at t0 + 19, lane 3 sends at t0 + 20, lane 2 adds at t0 + 21 and sends at t0 + 25,
    // and lane 1 adds what arrives at t0 + 26 (ringHopLatency 1).
    expect(cycles.map((c) => c - t0)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 9, 11, 15, 26])
  })

  it('folds two FP32 elements a beat (fpuElementsPerCycle 32: 2) in element order, rounding each add to binary32', () => {
    const xf = spread(32, 11).map((v) => Math.fround(v))
    const f = Math.fround
    const add = (a: number, b: number) => f(a + b)
    // Lane l: 8 elements, 4 beats of 2, beat j into accumulator j: acc j = x_(2j) + x_(2j+1) (local indices).
    const part = (l: number) => {
      const x = Array.from({ length: 8 }, (_, j) => xf[l + 4 * j]!)
      const acc = [0, 1, 2, 3].map((j) => add(x[2 * j]!, x[2 * j + 1]!))
      return add(add(acc[0]!, acc[1]!), add(acc[2]!, acc[3]!))
    }
    const q = [0, 1, 2, 3].map(part)
    const got = resultOf(usum(xf, 0.5, 32), 2048, machineReductionOrder(machine({})), 32)
    expect(got).toBe(add(0.5, add(q[0]!, add(q[1]!, add(q[2]!, q[3]!)))))
  })

  it('leaves a sum with no active element to vs1[0] and skips lanes without elements (vl 3 on 4 lanes)', () => {
    const three = spread(3, 5)
    const got = resultOf(usum(three, start, 64), 2048, machineReductionOrder(machine({})))
    expect(got).toBe(start + (three[0]! + (three[1]! + three[2]!)))
  })
})

// Random programs of our own: FP64 element-wise work, sums, slides and stores on random data (vslideup's vd never overlaps vs2, RISC-V V 1.0 section 16.3.1).
const OPS = ['vfadd.vv v{d}, v{a}, v{b}', 'vfmul.vv v{d}, v{a}, v{b}', 'vfmacc.vv v{d}, v{a}, v{b}', 'vfredusum.vs v{d}, v{a}, v{b}', 'vfredosum.vs v{d}, v{a}, v{b}', 'vslideup.vi v{d}, v{a}, 3', 'vse64.v v{a}, (a2)']
const programArb = fc.record({
  data: fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 64, maxLength: 64 }),
  vl: fc.integer({ min: 1, max: 32 }),
  body: fc.array(fc.tuple(fc.integer({ min: 0, max: OPS.length - 1 }), fc.integer({ min: 1, max: 7 }), fc.integer({ min: 1, max: 7 }), fc.integer({ min: 1, max: 7 })), { minLength: 1, maxLength: 12 }),
})
const textOf = ({ data, vl, body }: { data: number[]; vl: number; body: [number, number, number, number][] }) => `
    .data
    .balign 8
xs: .double ${data.map((v) => (Object.is(v, -0) ? '-0.0' : String(v))).join(', ')}
out: .zero 256
    .text
    li a0, ${vl}
    vsetvli t0, a0, e64, m1, ta, ma
    la a1, xs
    la a2, out
    vle64.v v1, (a1)
    addi a1, a1, 256
    vle64.v v2, (a1)
${body.map(([k, d, a, b]) => '    ' + OPS[k]!.replace('{d}', String(k === 5 && d === a ? (a % 7) + 1 : d)).replace('{a}', String(a)).replace('{b}', String(b))).join('\n')}
`

describe('the full pipeline keeps the functional results (issue 4 invariant)', () => {
  const elementOrder: UnorderedSum = ({ start, values, add }) => values.reduce((acc, v) => add(acc, v), start)

  it('gives the registers and memory of plain functional execution when the order is the element order', () => {
    fc.assert(
      fc.property(programArb, fc.constantFrom(1, 2, 4, 8), (p, lanes) => {
        const text = textOf(p)
        const plain = execute(program(text), { vlen: 2048 })
        expect(plain.ok).toBe(true)
        if (!plain.ok) return
        const piped = runPipeline({ program: text, machine: { lanes, vlen: 2048 } }, { execute: { fpReductionOrder: elementOrder } })
        expect(piped.ok).toBe(true)
        if (!piped.ok) return
        expect(piped.functional.x).toEqual(plain.x)
        expect(piped.functional.f).toEqual(plain.f)
        expect(piped.functional.v).toEqual(plain.v)
        expect(piped.functional.memory).toEqual(plain.memory)
        for (const ins of piped.trace.instructions) expect(ins.complete).not.toBeNull()
      }),
      { numRuns: 60 },
    )
  })
})
