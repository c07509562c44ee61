# vrgather.vv/.vx/.vi at e16/m2 with indices in range, past VLMAX (giving 0)
# and masked; then an e8/m4 reversal vd[i] = vs2[vl-1-i] whose result depends
# on vl (and so on VLEN).
    .globl _start
    .text
_start:
    li a0, 16
    vsetvli t0, a0, e16, m2, ta, mu
    la a6, vls
    sd t0, 0(a6)
    la a1, src
    vle16.v v2, (a1)
    la a1, idx
    vle16.v v4, (a1)
    la a2, out
    li a3, 5
    li a4, 4000
    li a5, 0x00f0
    vmv.s.x v0, a5
    vmv.v.i v6, -2
    vrgather.vv v6, v2, v4
    vse16.v v6, (a2)
    addi a2, a2, 32
    vmv.v.i v6, -2
    vrgather.vx v6, v2, a3
    vse16.v v6, (a2)
    addi a2, a2, 32
    vmv.v.i v6, -2
    vrgather.vx v6, v2, a4
    vse16.v v6, (a2)
    addi a2, a2, 32
    vmv.v.i v6, -2
    vrgather.vi v6, v2, 15
    vse16.v v6, (a2)
    addi a2, a2, 32
    vmv.v.i v6, -2
    vrgather.vi v6, v2, 31
    vse16.v v6, (a2)
    addi a2, a2, 32
    vmv.v.i v6, -2
    vrgather.vv v6, v2, v4, v0.t
    vse16.v v6, (a2)
    addi a2, a2, 32
    li a0, 64
    vsetvli t0, a0, e8, m4, ta, mu
    sd t0, 8(a6)
    vid.v v8
    vrsub.vx v12, v8, t0
    vadd.vi v12, v12, -1
    vrgather.vv v16, v8, v12
    vse8.v v16, (a2)

    # write(1, result, result_end - result); exit(0)
    li a7, 64
    li a0, 1
    la a1, result
    la a2, result_end
    sub a2, a2, a1
    ecall
    li a7, 93
    li a0, 0
    ecall

    .data
    .balign 8
src: .half 100, 103, 106, 109, 112, 115, 118, 121, 124, 127, 130, 133, 136, 139, 142, 145
idx: .half 3, 0, 15, 16, 31, 7, 7, 65535, 1, 2, 8, 9, 12, 5, 40, 6
    .balign 8
result:
out: .zero 192
reversed: .zero 64
vls: .zero 16
result_end:
