# Kernel matrix-vector product y = A x, A 64 x 64 doubles stored by columns.
# y accumulates one column at a time: y += A[:, j] * x[j] (vle64.v of the
# column, vfmacc.vf with x[j] from a scalar register), so there is no
# reduction. A is 32 KiB: at least 32768 / 64 = 512 cycles of the load bus.
# x[j] = 1 for every j, so y[i] is the sum of row i: A[i][j] = 1 gives 64.
    .data
    .balign 8
A:  .zero   32768
xv: .zero   512
y:  .zero   512

    .text
    # A = all ones, x = all ones, written by the vector unit first.
    li      a0, 64
    vsetvli t0, a0, e64, m1, ta, ma
    li      t3, 1
    fcvt.d.l fa1, t3
    vfmv.v.f v4, fa1
    la      a1, A
    li      t4, 64
fill:
    vse64.v v4, (a1)
    addi    a1, a1, 512
    addi    t4, t4, -1
    bnez    t4, fill
    la      a2, xv
    vse64.v v4, (a2)
    # y = A x
    vmv.v.i v16, 0
    la      a1, A
    li      t4, 64
col:
    fld     fa0, 0(a2)
    vle64.v v8, (a1)
    vfmacc.vf v16, fa0, v8
    addi    a1, a1, 512
    addi    a2, a2, 8
    addi    t4, t4, -1
    bnez    t4, col
    la      a3, y
    vse64.v v16, (a3)
