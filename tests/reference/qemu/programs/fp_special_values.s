# FP64 and FP32 arithmetic on signed zeros, infinities, quiet and signalling
# NaNs, subnormals and the largest finite value: add, subtract, multiply,
# divide, square root, min/max (IEEE 754-2019 minimumNumber/maximumNumber, as
# RISC-V defines them), sign injection and their .vf forms. NaN results are the
# canonical NaN.
    .globl _start
    .text
_start:
    li a0, 16
    vsetvli t0, a0, e64, m8, ta, ma
    la a1, a64
    vle64.v v8, (a1)
    la a1, b64
    vle64.v v16, (a1)
    fld fa0, 48(a1)
    fld fa1, 8(a1)
    la a2, out64
    vfadd.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfsub.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfmul.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfdiv.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfmin.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfmax.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfsgnj.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfsgnjn.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfsgnjx.vv v24, v8, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfadd.vf v24, v8, fa0
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfrsub.vf v24, v8, fa1
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfrdiv.vf v24, v8, fa1
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfmin.vf v24, v8, fa0
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfmax.vf v24, v8, fa0
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfsgnjn.vf v24, v8, fa1
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfmul.vf v24, v8, fa1
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfsqrt.v v24, v8
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfneg.v v24, v8
    vse64.v v24, (a2)
    addi a2, a2, 128
    vfabs.v v24, v16
    vse64.v v24, (a2)
    addi a2, a2, 128
    li a0, 16
    vsetvli t0, a0, e32, m4, ta, ma
    la a1, a32
    vle32.v v8, (a1)
    la a1, b32
    vle32.v v16, (a1)
    flw fa0, 24(a1)
    flw fa1, 4(a1)
    la a2, out32
    vfadd.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfsub.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfmul.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfdiv.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfmin.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfmax.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfsgnj.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfsgnjn.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfsgnjx.vv v24, v8, v16
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfadd.vf v24, v8, fa0
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfrsub.vf v24, v8, fa1
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfrdiv.vf v24, v8, fa1
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfmin.vf v24, v8, fa0
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfmax.vf v24, v8, fa0
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfsgnjn.vf v24, v8, fa1
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfmul.vf v24, v8, fa1
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfsqrt.v v24, v8
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfneg.v v24, v8
    vse32.v v24, (a2)
    addi a2, a2, 64
    vfabs.v v24, v16
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
a64: .dword 0x3FF0000000000000, 0xBFF8000000000000, 0x0000000000000000, 0x8000000000000000, 0x7FF0000000000000, 0xFFF0000000000000, 0x7FF8000000000000, 0x7FF4000000000000, 0x0000000000000001, 0x000FFFFFFFFFFFFF, 0x7FEFFFFFFFFFFFFF, 0x3FD5555555555555, 0xC01D000000000000, 0x000012688B70E62B, 0x4000000000000000, 0x3FB999999999999A
b64: .dword 0x4008000000000000, 0x8000000000000000, 0x8000000000000000, 0x0000000000000000, 0x7FF0000000000000, 0x7FF0000000000000, 0x3FF0000000000000, 0x4000000000000000, 0x8000000000000001, 0x0010000000000000, 0x4000000000000000, 0x4008000000000000, 0x7FF8000000000000, 0x3DDB7CDFD9D7BDBB, 0x7FF4000000000000, 0x3FC999999999999A
a32: .word 0x3F800000, 0xBFC00000, 0x00000000, 0x80000000, 0x7F800000, 0xFF800000, 0x7FC00000, 0x7FA00000, 0x00000001, 0x007FFFFF, 0x7F7FFFFF, 0x3EAAAAAB, 0xC0E80000, 0x000116C2, 0x40000000, 0x3DCCCCCD
b32: .word 0x40400000, 0x80000000, 0x80000000, 0x00000000, 0x7F800000, 0x7F800000, 0x3F800000, 0x40000000, 0x80000001, 0x00800000, 0x40000000, 0x40400000, 0x7FC00000, 0x2EDBE6FF, 0x7FA00000, 0x3E4CCCCD
    .balign 8
result:
out64: .zero 2432
out32: .zero 1216
result_end:
