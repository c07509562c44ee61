# Kernel ordered reduction: the same 256 ones summed with vfredosum.vs, which
# adds the elements one by one in element order, walking from lane to lane:
# each add waits for the one before (an FPU latency) and a ring hop, so it
# takes about vl x (FPU latency + hop latency) cycles. The sum is exactly 256.
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
    vfredosum.vs v16, v8, v0
    la      a2, sum
    vsetivli zero, 1, e32, m1, ta, ma
    vse32.v v16, (a2)
