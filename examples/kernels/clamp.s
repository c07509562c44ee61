# Kernel masked clamp: clamp 1024 signed 32-bit samples to 0..100 with
# compare-to-mask and vmerge (e32, vl 256 a strip at VLEN 8192). The samples
# are s[i] = 3 i - 1000 (written first), so s[0..3] = -1000, -997, -994, -991
# clamp to 0 and s[1023] = 2069 clamps to 100; s[334] = 2 stays 2.
    .data
    .balign 8
s:  .zero   4096

    .text
    la      a1, s
    li      a0, 1024
    li      a3, 0                   # index of the strip's first element
    li      t3, -1000
fill:
    vsetvli t0, a0, e32, m1, ta, ma
    vid.v   v8
    vadd.vx v8, v8, a3
    li      t4, 3
    vmul.vx v8, v8, t4
    vadd.vx v8, v8, t3              # 3 i - 1000
    vse32.v v8, (a1)
    slli    t1, t0, 2
    add     a1, a1, t1
    add     a3, a3, t0
    sub     a0, a0, t0
    bnez    a0, fill
    la      a1, s
    li      a0, 1024
    li      t2, 100
clamp:
    vsetvli t0, a0, e32, m1, ta, ma
    vle32.v v8, (a1)
    vmv.v.i v16, 0
    vmslt.vx v0, v8, zero
    vmerge.vvm v8, v8, v16, v0      # below 0 -> 0
    vmsgt.vx v0, v8, t2
    vmerge.vxm v8, v8, t2, v0       # above 100 -> 100
    vse32.v v8, (a1)
    slli    t1, t0, 2
    add     a1, a1, t1
    sub     a0, a0, t0
    bnez    a0, clamp
