# Segment loads and stores (V 1.0 section 7.8: unit, strided and indexed, nf
# 2 to 8), whole-register loads, stores and moves (7.9, 16.6), vrgatherei16
# (16.4) and add-with-carry/subtract-with-borrow (11.4).
    .globl _start
    .text
_start:
    la a1, src
    la s0, out
    li a0, 5
    vsetvli t0, a0, e16, m1, ta, ma
    vlseg3e16.v v1, (a1)
    vsseg3e16.v v1, (s0)
    addi s0, s0, 30
    li t1, 14
    vlsseg2e16.v v4, (a1), t1
    vssseg2e16.v v4, (s0), t1
    addi s0, s0, 70
    vsetvli t0, a0, e8, m1, ta, ma
    vlseg8e8.v v8, (a1)
    vsseg8e8.v v8, (s0)
    addi s0, s0, 40
    la a2, idx
    vsetvli t0, a0, e32, m1, ta, ma
    vluxseg2ei32.v v16, (a1), v0
    vle32.v v20, (a2)
    vloxseg4ei32.v v24, (a1), v20
    vsuxseg4ei32.v v24, (s0), v20
    addi s0, s0, 96
    vl2re32.v v2, (a1)
    vmv2r.v v6, v2
    vs2r.v v6, (s0)
    csrr t2, vlenb
    slli t2, t2, 1
    add s0, s0, t2
    vl1re8.v v9, (a1)
    vs1r.v v9, (s0)
    srli t2, t2, 1
    add s0, s0, t2
    li a0, 8
    vsetvli t0, a0, e32, m1, ta, ma
    la a3, idx16
    vsetvli t0, a0, e16, mf2, ta, ma
    vle16.v v10, (a3)
    vsetvli t0, a0, e32, m1, ta, ma
    vle32.v v11, (a1)
    vrgatherei16.vv v12, v11, v10
    vse32.v v12, (s0)
    addi s0, s0, 32
    vle32.v v13, (a2)
    vmseq.vi v0, v13, 4
    vadc.vvm v14, v11, v13, v0
    vse32.v v14, (s0)
    addi s0, s0, 32
    vsbc.vxm v14, v11, a0, v0
    vse32.v v14, (s0)
    addi s0, s0, 32
    vmadc.vim v15, v11, -1, v0
    vmsbc.vv v16, v13, v11
    vmadc.vx v17, v11, a3
    vsetvli t0, a0, e8, m1, ta, ma
    vse8.v v15, (s0)
    addi s0, s0, 1
    vse8.v v16, (s0)
    addi s0, s0, 1
    vse8.v v17, (s0)
    addi s0, s0, 6
    li a7, 64
    li a0, 1
    la a1, out
    sub a2, s0, a1
    ecall
    li a7, 93
    li a0, 0
    ecall
    .data
    .balign 8
src: .word 0x11223344, 0x55667788, 0x99aabbcc, 0xddeeff00, 0xfedcba98, 0x76543210, 0x0f1e2d3c, 0x4b5a6978
    .word 0x8796a5b4, 0xc3d2e1f0, 0x13579bdf, 0x2468ace0, 0xdeadbeef, 0xcafef00d, 0x01234567, 0x89abcdef
    .word 0x31415926, 0x53589793, 0x23846264, 0x33832795, 0x02884197, 0x16939937, 0x51058209, 0x74944592
    .zero 1024
idx: .word 12, 0, 40, 4, 24, 8, 16, 20
idx16: .half 7, 0, 3, 3, 9, 1, 6, 2
    .balign 8
out: .zero 4096
