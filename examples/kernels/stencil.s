# Kernel 3-point stencil: y[i] = 0.25 x[i-1] + 0.5 x[i] + 0.25 x[i+1] for
# i = 1 .. 1022 on 1024 doubles, with three overlapping unit-stride loads a
# strip (x[i-1], x[i], x[i+1]) instead of slides: 24 bytes loaded an element,
# at least 1022 x 24 / 64 = 384 cycles (rounded up) of the load bus.
    .data
    .balign 8
coef: .double 0.25, 0.5
x:  .zero   8192
y:  .zero   8192

    .text
    la      t2, coef
    fld     fa0, 0(t2)
    fld     fa1, 8(t2)
    la      a1, x                   # &x[i-1]
    la      a2, y
    addi    a2, a2, 8               # &y[1]
    li      a0, 1022
loop:
    vsetvli t0, a0, e64, m1, ta, ma
    vle64.v v8, (a1)                # x[i-1]
    addi    a3, a1, 8
    vle64.v v9, (a3)                # x[i]
    addi    a4, a1, 16
    vle64.v v10, (a4)               # x[i+1]
    vfadd.vv v12, v8, v10
    vfmul.vf v12, v12, fa0
    vfmacc.vf v12, fa1, v9
    vse64.v v12, (a2)
    slli    t1, t0, 3
    add     a1, a1, t1
    add     a2, a2, t1
    sub     a0, a0, t0
    bnez    a0, loop
