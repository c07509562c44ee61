/**
 * One FP32 vfredusum whose two summation orders round differently, with the
 * expected sums worked out here, step by step, in IEEE 754 binary32
 * round-to-nearest-even (Math.fround rounds a binary64 value to binary32 that
 * way; a sum of two binary32 values is exact in binary64, so each step rounds once).
 *
 * The machine: 2 lanes, 1 accumulator a lane, 2 FP32 elements a beat, a ring.
 * Its order (docs/model.md, "The FP order of an unordered sum"): element i in
 * lane i mod 2, so lane 0 holds x0, x2 and lane 1 holds x1, x3, each lane's
 * pair in one beat into its accumulator (x0 + x2, x1 + x3); the ring then
 * starts at the highest lane, (x1 + x3) + (x0 + x2), and vs1[0] comes last.
 */
export const values = [16777216, 1, 0, 1] as const
export const start = 0

export const program = `    .data
    .balign 8
x:      .float 16777216.0, 1.0, 0.0, 1.0
s:      .float 0.0
sum:    .zero 4
    .text
    la      a1, x
    li      a0, 4
    vsetvli t0, a0, e32, m1, ta, ma
    vle32.v v8, (a1)
    la      a1, s
    flw     ft0, 0(a1)
    vfmv.s.f v4, ft0
    vfredusum.vs v2, v8, v4
    la      a1, sum
    vsetivli zero, 1, e32, m1, ta, ma
    vse32.v v2, (a1)
`

export const machine = { lanes: 2, vlen: 128, reductionAccumulators: 1, fpuElementsPerCycle: { '32': 2 }, interLane: 'ring' } as const

const f = Math.fround
const [x0, x1, x2, x3] = values

/** Element order, as QEMU: ((((s + x0) + x1) + x2) + x3). 2^24 + 1 is a tie and rounds to the even 2^24, twice. */
export const elementSum = f(f(f(f(start + x0) + x1) + x2) + x3)
/** The machine's order: s + ((x1 + x3) + (x0 + x2)) = 0 + (2 + 2^24), exact. */
export const machineSum = f(start + f(f(x1 + x3) + f(x0 + x2)))
