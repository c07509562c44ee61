# The FP32 fused multiply-add forms on operands where double rounding differs:
# (1+2^-12)^2 + 2^-60 is just above a binary32 tie, so rounding the exact sum once
# gives 1+2^-11+2^-23 while rounding through binary64 first gives 1+2^-11.
    .globl _start
    .text
_start:
    li a0, 16
    vsetvli t0, a0, e32, m4, ta, ma
    la a1, A
    vle32.v v8, (a1)
    la a1, B
    vle32.v v16, (a1)
    flw fa0, 0(a1)
    la a1, C
    la a2, out
    vle32.v v24, (a1)
    vfmacc.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfmacc.vf v24, fa0, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfnmacc.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfnmacc.vf v24, fa0, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfmsac.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfmsac.vf v24, fa0, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfnmsac.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfnmsac.vf v24, fa0, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfmadd.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfmadd.vf v24, fa0, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfnmadd.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfnmadd.vf v24, fa0, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfmsub.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfmsub.vf v24, fa0, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfnmsub.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vle32.v v24, (a1)
    vfnmsub.vf v24, fa0, v16
    vse32.v v24, (a2)
    addi a2, a2, 64

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
A: .word 0x3F800800, 0x3F800800, 0x00000000, 0x7F800000, 0x7F800000, 0x7F000000, 0x00800000, 0x3FAAAAAB, 0x40490FDB, 0xBF7FFFFF, 0x0DA24260, 0x7FC00001, 0x40400000, 0x4B800001, 0x80000000, 0x7F7FFFFF
B: .word 0x3F800800, 0x3F800800, 0x40A00000, 0x00000000, 0x3F800000, 0x40000000, 0x3E800000, 0x40400000, 0x3EA2F983, 0x3F800001, 0x0DA24260, 0x3F800000, 0x3EAAAAAB, 0x3FC00000, 0x00000000, 0x3F800001
C: .word 0xBF801000, 0x21800000, 0x80000000, 0x3F800000, 0xFF800000, 0xFF000000, 0x00000001, 0xC0800000, 0xBF800000, 0x3F800000, 0x00000000, 0x3F800000, 0xBF800000, 0x4B800000, 0x80000000, 0xF3800000
    .balign 8
result:
out: .zero 1024
result_end:
