# Kernel axpy: y = a x + y on 1024 doubles, strip-mined (vl 128 at VLEN 8192).
# Each element loads 16 bytes (x and y) and stores 8: with one 512-bit load bus
# the loads alone need 1024 x 16 / 64 = 256 cycles, while the FMAs need only
# 1024 / 8 lanes = 128. Each strip's FMA waits for its loads' data, so on the
# default machine the memory latency shows as dependences.
    .data
    .balign 8
a:  .double 2.5
x:  .zero   8192
y:  .zero   8192

    .text
    la      t2, a
    fld     fa0, 0(t2)
    la      a1, x
    la      a2, y
    li      a0, 1024
loop:
    vsetvli t0, a0, e64, m1, ta, ma
    vle64.v v8, (a1)
    vle64.v v16, (a2)
    vfmacc.vf v16, fa0, v8
    vse64.v v16, (a2)
    slli    t1, t0, 3
    add     a1, a1, t1
    add     a2, a2, t1
    sub     a0, a0, t0
    bnez    a0, loop
