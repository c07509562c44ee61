# Fixed point (V 1.0 section 12) under each vxrm rounding mode (0 rnu, 1 rne,
# 2 rdn, 3 rod): averaging add/sub, vsmul, scaling shifts, narrowing clips,
# saturating add/sub, and vxsat after each mode. Values of our own chosen to
# hit ties, saturation and negative operands.
    .globl _start
    .text
_start:
    la s0, out
    li s1, 0
1:
    csrw vxrm, s1
    csrwi vxsat, 0
    li a0, 16
    vsetvli t0, a0, e16, m1, ta, ma
    la a1, h1
    vle16.v v1, (a1)
    la a1, h2
    vle16.v v2, (a1)
    vaadd.vv v3, v1, v2
    vse16.v v3, (s0)
    addi s0, s0, 32
    vasubu.vv v3, v1, v2
    vse16.v v3, (s0)
    addi s0, s0, 32
    vsmul.vv v3, v1, v2
    vse16.v v3, (s0)
    addi s0, s0, 32
    vssra.vi v3, v1, 3
    vse16.v v3, (s0)
    addi s0, s0, 32
    vssrl.vx v3, v1, s1
    vse16.v v3, (s0)
    addi s0, s0, 32
    vsadd.vv v3, v1, v2
    vse16.v v3, (s0)
    addi s0, s0, 32
    vssubu.vx v3, v1, s1
    vse16.v v3, (s0)
    addi s0, s0, 32
    vsaddu.vi v3, v1, -3
    vse16.v v3, (s0)
    addi s0, s0, 32
    vsetvli t0, a0, e8, mf2, ta, ma
    vnclip.wi v4, v1, 5
    vse8.v v4, (s0)
    addi s0, s0, 16
    vnclipu.wv v4, v2, v1
    vse8.v v4, (s0)
    addi s0, s0, 16
    vsetvli t0, a0, e16, m1, ta, ma
    li t3, 0x7fff
    vaaddu.vx v3, v2, t3
    vse16.v v3, (s0)
    addi s0, s0, 32
    csrr t1, vxsat
    sd t1, 0(s0)
    csrr t1, vcsr
    sd t1, 8(s0)
    addi s0, s0, 16
    addi s1, s1, 1
    li t2, 4
    blt s1, t2, 1b
    li a7, 64
    li a0, 1
    la a1, out
    sub a2, s0, a1
    ecall
    li a7, 93
    li a0, 0
    ecall
    .data
h1: .half 1, 3, 5, -7, 32767, -32768, 100, -100, 0x7ff0, 12345, -12345, 2, 6, 10, -3, 255
h2: .half 2, 2, 6, 8, 1, -32768, -101, 101, 0x10, -2, 3, 0x8000, 7, 11, -5, 1
    .balign 8
out: .zero 1600
