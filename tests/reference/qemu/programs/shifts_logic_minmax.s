# Shifts use only the low log2(SEW) bits of the amount (V 1.0 section 11.6);
# logical operations; signed and unsigned min/max, at e16 and e64 with LMUL=2.
    .globl _start
    .text
_start:
    li a0, 12
    vsetvli t0, a0, e16, m2, ta, ma
    la a1, s16
    vle16.v v2, (a1)
    la a1, n16
    vle16.v v4, (a1)
    li a3, 67
    li a4, -5
    la a2, sh16
    vsll.vv v6, v2, v4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vsrl.vv v6, v2, v4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vsra.vv v6, v2, v4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vsll.vx v6, v2, a3
    vse16.v v6, (a2)
    addi a2, a2, 24
    vsrl.vx v6, v2, a3
    vse16.v v6, (a2)
    addi a2, a2, 24
    vsra.vx v6, v2, a3
    vse16.v v6, (a2)
    addi a2, a2, 24
    vsll.vi v6, v2, 31
    vse16.v v6, (a2)
    addi a2, a2, 24
    vsrl.vi v6, v2, 5
    vse16.v v6, (a2)
    addi a2, a2, 24
    vsra.vi v6, v2, 1
    vse16.v v6, (a2)
    addi a2, a2, 24
    vand.vv v6, v2, v4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vor.vv v6, v2, v4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vxor.vv v6, v2, v4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vand.vx v6, v2, a4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vor.vx v6, v2, a4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vxor.vx v6, v2, a4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vand.vi v6, v2, -6
    vse16.v v6, (a2)
    addi a2, a2, 24
    vor.vi v6, v2, 9
    vse16.v v6, (a2)
    addi a2, a2, 24
    vxor.vi v6, v2, -1
    vse16.v v6, (a2)
    addi a2, a2, 24
    vnot.v v6, v2
    vse16.v v6, (a2)
    addi a2, a2, 24
    vmin.vv v6, v2, v4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vminu.vv v6, v2, v4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vmax.vv v6, v2, v4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vmaxu.vv v6, v2, v4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vmin.vx v6, v2, a4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vminu.vx v6, v2, a4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vmax.vx v6, v2, a4
    vse16.v v6, (a2)
    addi a2, a2, 24
    vmaxu.vx v6, v2, a4
    vse16.v v6, (a2)
    addi a2, a2, 24
    li a0, 12
    vsetvli t0, a0, e64, m2, ta, ma
    la a1, s64
    vle64.v v2, (a1)
    la a1, n64
    vle64.v v4, (a1)
    li a3, 67
    li a4, -5
    la a2, sh64
    vsll.vv v6, v2, v4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vsrl.vv v6, v2, v4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vsra.vv v6, v2, v4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vsll.vx v6, v2, a3
    vse64.v v6, (a2)
    addi a2, a2, 96
    vsrl.vx v6, v2, a3
    vse64.v v6, (a2)
    addi a2, a2, 96
    vsra.vx v6, v2, a3
    vse64.v v6, (a2)
    addi a2, a2, 96
    vsll.vi v6, v2, 31
    vse64.v v6, (a2)
    addi a2, a2, 96
    vsrl.vi v6, v2, 5
    vse64.v v6, (a2)
    addi a2, a2, 96
    vsra.vi v6, v2, 1
    vse64.v v6, (a2)
    addi a2, a2, 96
    vand.vv v6, v2, v4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vor.vv v6, v2, v4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vxor.vv v6, v2, v4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vand.vx v6, v2, a4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vor.vx v6, v2, a4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vxor.vx v6, v2, a4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vand.vi v6, v2, -6
    vse64.v v6, (a2)
    addi a2, a2, 96
    vor.vi v6, v2, 9
    vse64.v v6, (a2)
    addi a2, a2, 96
    vxor.vi v6, v2, -1
    vse64.v v6, (a2)
    addi a2, a2, 96
    vnot.v v6, v2
    vse64.v v6, (a2)
    addi a2, a2, 96
    vmin.vv v6, v2, v4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vminu.vv v6, v2, v4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vmax.vv v6, v2, v4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vmaxu.vv v6, v2, v4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vmin.vx v6, v2, a4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vminu.vx v6, v2, a4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vmax.vx v6, v2, a4
    vse64.v v6, (a2)
    addi a2, a2, 96
    vmaxu.vx v6, v2, a4
    vse64.v v6, (a2)
    addi a2, a2, 96

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
s16: .half 1, -1, -32768, 32767, 255, -256, 4660, -4660, 3, 16, -2, 100
n16: .half 0, 1, 15, 16, 17, 31, 4, 8, -1, 3, 2, 65535
    .balign 8
s64: .dword 1, -1, -9223372036854775808, 9223372036854775807, 255, -256, 4660, -4660, 3, 64, -2, 100
n64: .dword 0, 1, 63, 64, 65, 127, 4, 8, -1, 3, 2, 65535
    .balign 8
result:
sh16: .zero 648
sh64: .zero 2592
result_end:
