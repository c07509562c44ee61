/**
 * Sweep programs of our own, each with a swept symbol AVL defined by `.equ`.
 *
 * FMA_CURVE: 64 vfmacc.vv at e64 with vl = AVL (8 rounds over 8 independent
 * accumulators; LMUL 2 so that vl reaches 256 at the default VLEN 8192).
 * REDUCTION_CURVE: one unordered sum (vfredusum.vs) of AVL doubles.
 */
export const FMA_CURVE = `# 64 vfmacc.vv at e64, vl = AVL
    .equ    AVL, 256
    .text
    li      a0, AVL
    vsetvli t0, a0, e64, m2, ta, ma
    vid.v   v2
    vfcvt.f.xu.v v2, v2
    vmv.v.v v4, v2
${[8, 10, 12, 14, 16, 18, 20, 22].map((r) => `    vmv.v.i v${r}, 0`).join('\n')}
${Array.from({ length: 8 }, () => [8, 10, 12, 14, 16, 18, 20, 22].map((r) => `    vfmacc.vv v${r}, v2, v4`).join('\n')).join('\n')}
    li      a0, 0
    li      a7, 93
    ecall
`

export const REDUCTION_CURVE = `# vfredusum.vs over AVL doubles
    .equ    AVL, 256
    .text
    li      a0, AVL
    vsetvli t0, a0, e64, m4, ta, ma
    vid.v   v8
    vfcvt.f.xu.v v8, v8
    vmv.v.i v0, 0
    vfredusum.vs v16, v8, v0
    li      a0, 0
    li      a7, 93
    ecall
`
