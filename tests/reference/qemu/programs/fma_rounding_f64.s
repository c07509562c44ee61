# All eight FP64 fused multiply-add forms, .vv and .vf, on operands chosen
# so that rounding the product first would give a different answer (e.g.
# (1+2^-27)^2 - (1+2^-26) = 2^-54 exactly, 0 when rounded twice; 1e308 x 2 - 1e308
# overflows only when rounded twice), plus signed zeros, infinities, NaN and
# subnormals. IEEE 754-2008 fusedMultiplyAdd, one rounding.
    .globl _start
    .text
_start:
    li a0, 16
    vsetvli t0, a0, e64, m8, ta, ma
    la a1, A
    vle64.v v8, (a1)
    la a1, B
    vle64.v v16, (a1)
    fld fa0, 0(a1)
    la a1, C
    la a2, out
    vle64.v v24, (a1)
    vfmacc.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfmacc.vf v24, fa0, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfnmacc.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfnmacc.vf v24, fa0, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfmsac.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfmsac.vf v24, fa0, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfnmsac.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfnmsac.vf v24, fa0, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfmadd.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfmadd.vf v24, fa0, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfnmadd.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfnmadd.vf v24, fa0, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfmsub.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfmsub.vf v24, fa0, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfnmsub.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vle64.v v24, (a1)
    vfnmsub.vf v24, fa0, v16
    vse64.v v24, (a2)
    addi a2, a2, 128

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
A: .dword 0x3FF0000008000000, 0x3FF0000000400000, 0x0000000000000000, 0x7FF0000000000000, 0x7FF0000000000000, 0x7FE1CCF385EBC8A0, 0x0170000000000000, 0x3FF5555555555555, 0x400921FB54442D18, 0xBFEFFFFFFFFFFFFF, 0x01A56E1FC2F8F359, 0x7FF8000000000001, 0x4008000000000000, 0x4340000000000001, 0x8000000000000000, 0x7FEFFFFFFFFFFFFF
B: .dword 0x3FF0000008000000, 0x3FF0000020000000, 0x4014000000000000, 0x0000000000000000, 0x3FF0000000000000, 0x4000000000000000, 0x3C30000000000000, 0x4008000000000000, 0x3FD45F306DC9C883, 0x3FF0000000000001, 0x01A56E1FC2F8F359, 0x3FF0000000000000, 0x3FD5555555555555, 0x3FF8000000000000, 0x0000000000000000, 0x3FF0000000000001
C: .dword 0xBFF0000010000000, 0x3C90000000000000, 0x8000000000000000, 0x3FF0000000000000, 0xFFF0000000000000, 0xFFE1CCF385EBC8A0, 0x0000000000000001, 0xC010000000000000, 0xBFF0000000000000, 0x3FF0000000000000, 0x0000000000000000, 0x3FF0000000000000, 0xBFF0000000000000, 0x4340000000000000, 0x8000000000000000, 0xFCA0000000000000
    .balign 8
result:
out: .zero 2048
result_end:
