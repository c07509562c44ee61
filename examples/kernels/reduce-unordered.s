# Kernel unordered reduction: the sum of 256 single-precision ones with one
# vfredusum.vs (e32, LMUL 1: vl 256 at VLEN 8192). Each lane folds its 32
# elements into its accumulators, then the lane partials meet on the ring.
# Every value is 1.0, so the sum is exactly 256 in any order.
    .data
    .balign 8
sum: .zero  4

    .text
    li      a0, 256
    vsetvli t0, a0, e32, m1, ta, ma
    li      t3, 1
    fcvt.s.l fa0, t3
    vfmv.v.f v8, fa0
    vmv.v.i v0, 0
    vfredusum.vs v16, v8, v0
    la      a2, sum
    vsetivli zero, 1, e32, m1, ta, ma
    vse32.v v16, (a2)
