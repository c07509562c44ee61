# Integer multiply-add forms (vmacc, vnmsac, vmadd, vnmsub; .vv and .vx)
# with wrap-around, unmasked and masked (masked-off elements keep vd).
    .globl _start
    .text
_start:
    li a0, 11
    vsetvli t0, a0, e32, m1, ta, mu
    la a1, x
    vle32.v v1, (a1)
    la a1, y
    vle32.v v2, (a1)
    la a1, z
    li a3, -3
    li a4, 0x55
    vmv.s.x v0, a4
    la a2, out
    vle32.v v3, (a1)
    vmacc.vv v3, v1, v2
    vse32.v v3, (a2)
    addi a2, a2, 44
    vle32.v v3, (a1)
    vnmsac.vv v3, v1, v2
    vse32.v v3, (a2)
    addi a2, a2, 44
    vle32.v v3, (a1)
    vmadd.vv v3, v1, v2
    vse32.v v3, (a2)
    addi a2, a2, 44
    vle32.v v3, (a1)
    vnmsub.vv v3, v1, v2
    vse32.v v3, (a2)
    addi a2, a2, 44
    vle32.v v3, (a1)
    vmacc.vx v3, a3, v2
    vse32.v v3, (a2)
    addi a2, a2, 44
    vle32.v v3, (a1)
    vnmsac.vx v3, a3, v2
    vse32.v v3, (a2)
    addi a2, a2, 44
    vle32.v v3, (a1)
    vmadd.vx v3, a3, v2
    vse32.v v3, (a2)
    addi a2, a2, 44
    vle32.v v3, (a1)
    vnmsub.vx v3, a3, v2
    vse32.v v3, (a2)
    addi a2, a2, 44
    vle32.v v3, (a1)
    vmacc.vv v3, v1, v2, v0.t
    vse32.v v3, (a2)
    addi a2, a2, 44
    vle32.v v3, (a1)
    vmadd.vx v3, a3, v2, v0.t
    vse32.v v3, (a2)
    addi a2, a2, 44
    vle32.v v3, (a1)
    vdivu.vv v3, v1, v2, v0.t
    vse32.v v3, (a2)
    addi a2, a2, 44
    vle32.v v3, (a1)
    vremu.vx v3, v1, a3, v0.t
    vse32.v v3, (a2)
    addi a2, a2, 44

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
x: .word 3, -4, 100000, -100000, 65536, 7, 0, 1, -1, 2147483647, 12345
y: .word 5, 6, 100000, 3, 65536, -9, 8, -2147483648, -1, 2, 54321
z: .word 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11
    .balign 8
result:
out: .zero 528
    .balign 8
result_end:
