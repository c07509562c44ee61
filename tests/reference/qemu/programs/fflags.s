# IEEE 754 exception flags (fflags) as the F and D extensions accrue them:
# invalid (NV), divide by zero (DZ), overflow (OF), underflow (UF, tininess
# detected after rounding) and inexact (NX) for scalar arithmetic, square
# root, fused multiply-add, compares (feq quiet, flt/fle signaling), min/max
# with signaling NaNs, and conversions; fcsr shows frm above the flags.
# One byte of fflags per case, cleared before each.
    .globl _start
    .text
_start:
    la a1, c64
    la a2, c32
    la a4, result
    fld fa0, 0(a1)
    fld fa1, 8(a1)
    fsflags zero
    fadd.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 0(a1)
    fld fa1, 0(a1)
    fsflags zero
    fadd.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 0(a1)
    fld fa1, 16(a1)
    fsflags zero
    fdiv.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 16(a1)
    fld fa1, 16(a1)
    fsflags zero
    fdiv.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 144(a1)
    fld fa1, 16(a1)
    fsflags zero
    fdiv.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 24(a1)
    fsflags zero
    fsqrt.d fa3, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 40(a1)
    fsflags zero
    fsqrt.d fa3, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 32(a1)
    fld fa1, 40(a1)
    fsflags zero
    fmul.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 32(a1)
    fld fa1, 40(a1)
    fsflags zero
    fmul.d fa3, fa0, fa1, rtz
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 48(a1)
    fld fa1, 56(a1)
    fsflags zero
    fmul.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 64(a1)
    fld fa1, 72(a1)
    fsflags zero
    fmul.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 144(a1)
    fld fa1, 144(a1)
    fsflags zero
    fsub.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 80(a1)
    fld fa1, 0(a1)
    fsflags zero
    feq.d t1, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 80(a1)
    fld fa1, 0(a1)
    fsflags zero
    flt.d t1, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 0(a1)
    fld fa1, 80(a1)
    fsflags zero
    fle.d t1, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 88(a1)
    fld fa1, 0(a1)
    fsflags zero
    feq.d t1, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 88(a1)
    fld fa1, 0(a1)
    fsflags zero
    fmin.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 80(a1)
    fld fa1, 0(a1)
    fsflags zero
    fmax.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 80(a1)
    fld fa1, 0(a1)
    fsflags zero
    fadd.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 88(a1)
    fld fa1, 0(a1)
    fsflags zero
    fadd.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 96(a1)
    fsflags zero
    fcvt.w.d t1, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 104(a1)
    fsflags zero
    fcvt.w.d t1, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 80(a1)
    fsflags zero
    fcvt.w.d t1, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 112(a1)
    fsflags zero
    fcvt.wu.d t1, fa0, rtz
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 24(a1)
    fsflags zero
    fcvt.wu.d t1, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 144(a1)
    fsflags zero
    fcvt.l.d t1, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 152(a1)
    fsflags zero
    fcvt.lu.d t1, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 120(a1)
    fsflags zero
    fcvt.s.d fa3, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 128(a1)
    fsflags zero
    fcvt.s.d fa3, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 136(a1)
    fsflags zero
    fcvt.s.d fa3, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 160(a1)
    fsflags zero
    fcvt.s.d fa3, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 168(a1)
    fsflags zero
    fcvt.s.d fa3, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 88(a1)
    fsflags zero
    fcvt.s.d fa3, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fsflags zero
    li t1, 9007199254740993
    fcvt.d.l fa3, t1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fsflags zero
    li t1, 16777217
    fcvt.s.w fa3, t1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fsflags zero
    li t1, -7
    fcvt.d.w fa3, t1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 144(a1)
    fld fa1, 16(a1)
    fld fa2, 80(a1)
    fsflags zero
    fmadd.d fa3, fa0, fa1, fa2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 0(a1)
    fld fa1, 8(a1)
    fld fa2, 0(a1)
    fsflags zero
    fmadd.d fa3, fa0, fa1, fa2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 144(a1)
    fld fa1, 0(a1)
    fld fa2, 144(a1)
    fsflags zero
    fnmsub.d fa3, fa0, fa1, fa2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 32(a1)
    fld fa1, 40(a1)
    fld fa2, 32(a1)
    fsflags zero
    fmsub.d fa3, fa0, fa1, fa2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 0(a1)
    fld fa1, 152(a1)
    fsflags zero
    fdiv.d fa3, fa0, fa1, rdn
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 40(a1)
    fld fa1, 0(a1)
    fsflags zero
    fdiv.d fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    flw fa0, 0(a2)
    flw fa1, 4(a2)
    fsflags zero
    fadd.s fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    flw fa0, 8(a2)
    flw fa1, 12(a2)
    fsflags zero
    fmul.s fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    flw fa0, 28(a2)
    flw fa1, 32(a2)
    fsflags zero
    fmul.s fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    flw fa0, 0(a2)
    flw fa1, 20(a2)
    fsflags zero
    fdiv.s fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    flw fa0, 0(a2)
    flw fa1, 24(a2)
    fsflags zero
    fdiv.s fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    flw fa0, 36(a2)
    fsflags zero
    fsqrt.s fa3, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    flw fa0, 16(a2)
    flw fa1, 0(a2)
    fsflags zero
    flt.s t1, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    flw fa0, 16(a2)
    fsflags zero
    fcvt.d.s fa3, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    flw fa0, 32(a2)
    fsflags zero
    fcvt.w.s t1, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    flw fa0, 0(a2)
    flw fa1, 4(a2)
    flw fa2, 0(a2)
    fsflags zero
    fmadd.s fa3, fa0, fa1, fa2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 88(a1)
    fld fa1, 0(a1)
    fsflags zero
    fadd.s fa3, fa0, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fsflags zero
    fld fa0, 0(a1)
    fld fa1, 16(a1)
    fdiv.d fa3, fa0, fa1
    fld fa1, 8(a1)
    fadd.d fa3, fa0, fa1
    fsrmi 2
    frcsr t0
    sb t0, 0(a4)
    addi a4, a4, 1
    csrrci t0, fflags, 1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fsrmi 0
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
c64: .dword 0x3FF0000000000000, 0x3C30000000000000, 0x0000000000000000, 0xBFF0000000000000, 0x7FEFFFFFFFFFFFFF, 0x4000000000000000, 0x0170000000000000, 0x39B0000000000000, 0x0010000000000000, 0x3FE0000000000000, 0x7FF8000000000000, 0x7FF0000000000001, 0x400C000000000000, 0x4202A05F20000000, 0xBFE0000000000000, 0x7E37E43C8800759C, 0x3FB999999999999A, 0x358DEE7A4AD4B81F, 0x7FF0000000000000, 0x4008000000000000, 0x380FFFFFF8000000, 0x37FFFFFFC0100000
c32: .word 0x3F800000, 0x30800000, 0x7F7FFFFF, 0x40000000, 0x7F800001, 0x00000000, 0x40400000, 0x00400001, 0x3F000000, 0xBF800000
result: .zero 55
result_end:
