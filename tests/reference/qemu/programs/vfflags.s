# The IEEE 754 exception flags vector FP instructions accrue into fflags (V 1.0
# section 13.1, as the scalar instructions do): element-wise add, multiply,
# divide, min/max, square root, fused multiply-add, quiet and signaling
# compares, conversions, widening and narrowing arithmetic and conversions,
# reductions (ordered, unordered, min/max, widening), the vfrec7/vfrsqrt7
# estimates, a signaling NaN scalar operand, a masked-off
# element (no flag) and vl = 0 (no element, no flag). One byte of fflags per case.
    .globl _start
    .text
_start:
    la a1, c64
    la a2, c32
    la a4, result
    vsetivli zero, 2, e64, m1, ta, ma
    addi t2, a1, 0
    vle64.v v1, (t2)
    addi t2, a1, 16
    vle64.v v2, (t2)
    fsflags zero
    vfadd.vv v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 16
    vle64.v v1, (t2)
    fsflags zero
    vfadd.vv v3, v1, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 16
    vle64.v v1, (t2)
    addi t2, a1, 32
    vle64.v v2, (t2)
    fsflags zero
    vfdiv.vv v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fsflags zero
    vfdiv.vv v3, v2, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 48
    vle64.v v1, (t2)
    fsflags zero
    vfmul.vv v3, v1, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 64
    vle64.v v1, (t2)
    fsflags zero
    vfmul.vv v3, v1, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 80
    vle64.v v1, (t2)
    addi t2, a1, 16
    vle64.v v2, (t2)
    fsflags zero
    vfmin.vv v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 96
    vle64.v v1, (t2)
    fsflags zero
    vfmax.vv v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fsflags zero
    vmfeq.vv v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fsflags zero
    vmflt.vv v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 80
    vle64.v v1, (t2)
    fsflags zero
    vmfeq.vv v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 112
    vle64.v v1, (t2)
    fsflags zero
    vfsqrt.v v3, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 128
    vle64.v v1, (t2)
    fsflags zero
    vfcvt.x.f.v v3, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 160
    vle64.v v1, (t2)
    fsflags zero
    vfcvt.f.x.v v3, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 144
    vle64.v v1, (t2)
    addi t2, a1, 16
    vle64.v v2, (t2)
    addi t2, a1, 16
    vle64.v v3, (t2)
    fsflags zero
    vfmacc.vv v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 144
    vle64.v v1, (t2)
    addi t2, a1, 32
    vle64.v v2, (t2)
    addi t2, a1, 16
    vle64.v v3, (t2)
    fsflags zero
    vfmacc.vv v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 0
    vle64.v v1, (t2)
    addi t2, a1, 16
    vle64.v v3, (t2)
    fld fa0, 16(a1)
    fsflags zero
    vfmacc.vf v3, fa0, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    fld fa0, 80(a1)
    addi t2, a1, 16
    vle64.v v1, (t2)
    fsflags zero
    vfadd.vf v3, v1, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 16
    vle64.v v1, (t2)
    addi t2, a1, 16
    vle64.v v3, (t2)
    vmv.v.i v0, 1
    fsflags zero
    vfdiv.vv v3, v1, v2, v0.t
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    vsetivli zero, 0, e64, m1, ta, ma
    fsflags zero
    vfadd.vf v3, v1, fa0
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    vsetivli zero, 4, e32, m1, ta, ma
    addi t2, a2, 0
    vle32.v v1, (t2)
    fsflags zero
    vfadd.vv v3, v1, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    flw fa1, 0(a2)
    addi t2, a2, 0
    vle32.v v1, (t2)
    fsflags zero
    vfadd.vf v3, v1, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 16
    vle32.v v1, (t2)
    fsflags zero
    vfmul.vv v3, v1, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 32
    vle32.v v1, (t2)
    fsflags zero
    vfmul.vv v3, v1, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 48
    vle32.v v1, (t2)
    fsflags zero
    vfsub.vv v3, v1, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 64
    vle32.v v1, (t2)
    fsflags zero
    vfcvt.f.x.v v3, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 0
    vle32.v v1, (t2)
    fsflags zero
    vfdiv.vf v3, v1, fa1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 0
    vle32.v v1, (t2)
    addi t2, a2, 32
    vle32.v v2, (t2)
    fsflags zero
    vmfle.vv v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    vsetivli zero, 2, e32, m1, ta, ma
    addi t2, a2, 80
    vle32.v v1, (t2)
    fsflags zero
    vfwadd.vv v4, v1, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 80
    vle32.v v1, (t2)
    addi t2, a2, 0
    vle32.v v2, (t2)
    fsflags zero
    vfwadd.vv v4, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 80
    vle32.v v1, (t2)
    fsflags zero
    vfwmul.vv v4, v1, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 96
    vle32.v v1, (t2)
    addi t2, a2, 0
    vle32.v v2, (t2)
    addi t2, a1, 16
    vle64.v v4, (t2)
    fsflags zero
    vfwmacc.vv v4, v1, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 96
    vle32.v v1, (t2)
    addi t2, a2, 64
    vle32.v v2, (t2)
    vmv.v.i v2, 0
    addi t2, a1, 16
    vle64.v v4, (t2)
    fsflags zero
    vfwmacc.vv v4, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 48
    vle32.v v1, (t2)
    fsflags zero
    vfwcvt.f.f.v v4, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 64
    vle32.v v1, (t2)
    fsflags zero
    vfwcvt.f.x.v v4, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 128
    vle64.v v2, (t2)
    fsflags zero
    vfncvt.f.f.w v6, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 48
    vle64.v v2, (t2)
    fsflags zero
    vfncvt.f.f.w v6, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 64
    vle64.v v2, (t2)
    fsflags zero
    vfncvt.f.f.w v6, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 128
    vle64.v v2, (t2)
    fsflags zero
    vfncvt.x.f.w v6, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 160
    vle64.v v2, (t2)
    fsflags zero
    vfncvt.f.x.w v6, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 80
    vle64.v v2, (t2)
    fsflags zero
    vfncvt.f.f.w v6, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    vsetivli zero, 2, e64, m1, ta, ma
    addi t2, a1, 0
    vle64.v v1, (t2)
    addi t2, a1, 16
    vle64.v v2, (t2)
    fsflags zero
    vfredosum.vs v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 48
    vle64.v v1, (t2)
    addi t2, a1, 32
    vle64.v v2, (t2)
    fsflags zero
    vfredusum.vs v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 48
    vle64.v v1, (t2)
    vmv.v.i v0, 1
    addi t2, a1, 48
    vle64.v v2, (t2)
    fsflags zero
    vfredosum.vs v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 80
    vle64.v v1, (t2)
    addi t2, a1, 16
    vle64.v v2, (t2)
    fsflags zero
    vfredmax.vs v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 96
    vle64.v v1, (t2)
    fsflags zero
    vfredmin.vs v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 16
    vle64.v v1, (t2)
    addi t2, a1, 80
    vle64.v v2, (t2)
    vmv.v.i v0, 0
    fsflags zero
    vfredosum.vs v3, v1, v2, v0.t
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    vsetivli zero, 2, e32, m1, ta, ma
    addi t2, a2, 80
    vle32.v v1, (t2)
    addi t2, a1, 16
    vle64.v v2, (t2)
    fsflags zero
    vfwredosum.vs v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 48
    vle32.v v1, (t2)
    fsflags zero
    vfwredusum.vs v3, v1, v2
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    vsetivli zero, 4, e32, m1, ta, ma
    addi t2, a2, 96
    vle32.v v1, (t2)
    fsflags zero
    vfrec7.v v3, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 96
    vle32.v v1, (t2)
    fsflags zero
    vfrsqrt7.v v3, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 32
    vle32.v v1, (t2)
    fsflags zero
    vfrec7.v v3, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 48
    vle32.v v1, (t2)
    fsflags zero
    vfrsqrt7.v v3, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a2, 0
    vle32.v v1, (t2)
    fsflags zero
    vfrec7.v v3, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    vsetivli zero, 2, e64, m1, ta, ma
    addi t2, a1, 112
    vle64.v v1, (t2)
    fsflags zero
    vfrsqrt7.v v3, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    addi t2, a1, 48
    vle64.v v1, (t2)
    fsflags zero
    vfrec7.v v3, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
    li t3, 1
    vmv.s.x v1, t3
    fsflags zero
    vfrec7.v v3, v1
    frflags t0
    sb t0, 0(a4)
    addi a4, a4, 1
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
    .balign 16
c64: .dword 0x3FF0000000000000, 0x3C30000000000000, 0x3FF0000000000000, 0x3FF0000000000000, 0x0000000000000000, 0x3FF0000000000000, 0x7FEFFFFFFFFFFFFF, 0x4000000000000000, 0x0170000000000000, 0x39B0000000000000, 0x7FF0000000000001, 0x3FF0000000000000, 0x7FF8000000000000, 0x3FF0000000000000, 0xBFF0000000000000, 0x4000000000000000, 0x400C000000000000, 0x4202A05F20000000, 0x7FF0000000000000, 0x0000000000000000, 0x0020000000000001, 0x0000000000000003
c32: .word 0x3F800000, 0x30800000, 0x3F800000, 0x3F800000, 0x7F7FFFFF, 0x40000000, 0x3F800000, 0x3F800000, 0x00400001, 0x3F000000, 0x3F800000, 0x3F800000, 0x7F800001, 0x3F800000, 0x3F800000, 0x3F800000, 0x01000001, 0x00000003, 0x00000005, 0x00000007, 0x71800000, 0x0D800000, 0x3F800000, 0x3F800000, 0x7F800000, 0x00000000, 0x3F800000, 0x3F800000
result: .zero 57
result_end:
