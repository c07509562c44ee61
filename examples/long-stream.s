# Long stream: 1,000 dynamic vector instructions for the Worker and the bench.
# Set-up (12 instructions), then a loop of 8 independent vfmacc.vv per
# iteration, run 123 times (984 instructions), then 3 vfadd.vv and one store.
# With e64 and LMUL 2 at the default VLEN 8192, vl = 256: on 8 lanes each
# vfmacc.vv is 32 beats a lane, and the 8 accumulators (v8..v22) never wait on
# each other, so the FPUs should stay busy.
# Output: the combined accumulator, vl doubles (2048 bytes at VLEN 8192).
# AVL is the vector length asked for (vl = min(AVL, VLMAX)): sweep it on the Sweeps page.
    .equ    AVL, 256
    .data
    .balign 8
half:
    .double 0.5
acc:
    .zero   AVL*8

    .text
    li      a0, AVL
    vsetvli t0, a0, e64, m2, ta, ma
    vid.v   v2
    vfcvt.f.xu.v v2, v2             # x[i] = i
    la      t2, half
    fld     fa0, 0(t2)
    vfmv.v.f v4, fa0                # 0.5 everywhere
    vmv.v.i v8, 0
    vmv.v.i v10, 0
    vmv.v.i v12, 0
    vmv.v.i v14, 0
    vmv.v.i v16, 0
    vmv.v.i v18, 0
    vmv.v.i v20, 0
    vmv.v.i v22, 0
    li      t1, 123
loop:
    vfmacc.vv v8, v2, v4
    vfmacc.vv v10, v2, v4
    vfmacc.vv v12, v2, v4
    vfmacc.vv v14, v2, v4
    vfmacc.vv v16, v2, v4
    vfmacc.vv v18, v2, v4
    vfmacc.vv v20, v2, v4
    vfmacc.vv v22, v2, v4
    addi    t1, t1, -1
    bnez    t1, loop

    vfadd.vv v8, v8, v10
    vfadd.vv v12, v12, v14
    vfadd.vv v8, v8, v12
    la      a1, acc
    vse64.v v8, (a1)

    slli    a2, t0, 3               # write(1, acc, vl * 8)
    li      a0, 1
    li      a7, 64
    ecall
    li      a0, 0
    li      a7, 93
    ecall
