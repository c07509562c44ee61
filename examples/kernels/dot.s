# Kernel dot product: sum of x[i] y[i] over 1024 doubles. Strips of vl
# elements accumulate into a vector of partial sums (vfmacc.vv), and one
# unordered reduction (vfredusum.vs) folds it at the end. 16 bytes loaded an
# element: at least 1024 x 16 / 64 = 256 cycles on one 512-bit load bus.
    .data
    .balign 8
x:  .zero   8192
y:  .zero   8192
res: .zero  8

    .text
    la      a1, x
    la      a2, y
    li      a0, 1024
    vsetvli t0, a0, e64, m1, ta, ma
    vmv.v.i v24, 0                  # partial sums
loop:
    vsetvli t0, a0, e64, m1, tu, ma
    vle64.v v8, (a1)
    vle64.v v16, (a2)
    vfmacc.vv v24, v8, v16
    slli    t1, t0, 3
    add     a1, a1, t1
    add     a2, a2, t1
    sub     a0, a0, t0
    bnez    a0, loop
    li      a0, 1024
    vsetvli t0, a0, e64, m1, ta, ma
    vmv.v.i v1, 0
    vfredusum.vs v1, v24, v1
    la      a3, res
    vsetivli zero, 1, e64, m1, ta, ma
    vse64.v v1, (a3)
