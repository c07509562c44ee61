# Vector FP in each dynamic rounding mode (frm: RISC-V V 1.0 section 13.1, F
# extension "Rounding modes"): vfadd, vfsub, vfmul, vfdiv, vfmacc and vfsqrt
# at e64, vfadd, vfmul and vfmacc at e32, vfwadd and vfwmacc, and the sums
# vfredosum, vfredusum and vfwredosum, vfcvt.x.f.v and vfcvt.f.x.v, once per mode (rne, rtz, rdn, rup,
# rmm), on operands whose results are inexact (0.1 + 0.2, 1/3, sqrt 2, a sum
# past the largest finite value, a subnormal sum), so that the modes differ
# in their last bits and in overflow (to infinity or the largest finite).
    .globl _start
    .text
_start:
    la s0, out
    li s1, 0
    li s2, 5
modes:
    fsrm s1
    li a0, 8
    vsetvli t0, a0, e64, m4, ta, ma
    la a1, A
    vle64.v v8, (a1)
    la a1, B
    vle64.v v12, (a1)
    vfadd.vv v16, v8, v12
    vse64.v v16, (s0)
    addi s0, s0, 64
    vfsub.vv v16, v8, v12
    vse64.v v16, (s0)
    addi s0, s0, 64
    vfmul.vv v16, v8, v12
    vse64.v v16, (s0)
    addi s0, s0, 64
    vfdiv.vv v16, v8, v12
    vse64.v v16, (s0)
    addi s0, s0, 64
    la a1, C
    vle64.v v16, (a1)
    vfmacc.vv v16, v8, v12
    vse64.v v16, (s0)
    addi s0, s0, 64
    vfsqrt.v v16, v12
    vse64.v v16, (s0)
    addi s0, s0, 64
    vsetvli t0, a0, e32, m2, ta, ma
    la a1, AF
    vle32.v v8, (a1)
    la a1, BF
    vle32.v v10, (a1)
    vfadd.vv v12, v8, v10
    vse32.v v12, (s0)
    addi s0, s0, 32
    vfmul.vv v12, v8, v10
    vse32.v v12, (s0)
    addi s0, s0, 32
    la a1, CF
    vle32.v v12, (a1)
    vfmacc.vv v12, v8, v10
    vse32.v v12, (s0)
    addi s0, s0, 32
    # Widening: binary32 operands, binary64 results (2 x LMUL = 4 registers).
    vfwadd.vv v16, v8, v10
    vsetvli t0, a0, e64, m4, ta, ma
    vse64.v v16, (s0)
    addi s0, s0, 64
    la a1, C
    vle64.v v16, (a1)
    vsetvli t0, a0, e32, m2, ta, ma
    vfwmacc.vv v16, v8, v10
    vsetvli t0, a0, e64, m4, ta, ma
    vse64.v v16, (s0)
    addi s0, s0, 64
    # Reductions from 1.0: ordered and unordered sums at e64 (element order in both), the widening sum of binary32.
    la a1, D
    vle64.v v8, (a1)
    la a1, E
    vle64.v v20, (a1)
    vfredosum.vs v16, v8, v20
    vfmv.f.s fa0, v16
    fsd fa0, 0(s0)
    vfredusum.vs v16, v8, v20
    vfmv.f.s fa0, v16
    fsd fa0, 8(s0)
    addi s0, s0, 16
    # Single-width conversions: D to integers, and integers past 2^53 to binary64.
    vfcvt.x.f.v v16, v8
    vse64.v v16, (s0)
    addi s0, s0, 64
    la a1, I
    vle64.v v12, (a1)
    vfcvt.f.x.v v16, v12
    vse64.v v16, (s0)
    addi s0, s0, 64
    vsetvli t0, a0, e32, m2, ta, ma
    la a1, DF
    vle32.v v8, (a1)
    vfwredosum.vs v16, v8, v20
    vsetvli t0, a0, e64, m1, ta, ma
    vfmv.f.s fa0, v16
    fsd fa0, 0(s0)
    addi s0, s0, 8
    addi s1, s1, 1
    blt s1, s2, modes

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
A:  .double 0.1, 1.0, -1.0, 2.0, 1.7e308, -3.0, 1.5e-323, 1.0000000000000002
B:  .double 0.2, 3.0, 3.0, 3.0, 1.7e308, 7.0, 0.3, 1e-16
C:  .double 0.3, -1.0, 1e-300, -0.5, -1.7e308, 0.1, 5e-324, 1.0
AF: .float 0.1, 1.0, -1.0, 2.0, 3.0e38, -3.0, 1.0e-45, 1.0000001
BF: .float 0.2, 3.0, 3.0, 3.0, 3.0e38, 7.0, 0.3, 1.0e-7
CF: .float 0.3, -1.0, 1.0e-30, -0.5, -3.0e38, 0.1, 1.0e-45, 1.0
D:  .double 0.1, 0.2, 0.3, 0.3333333333333333, 1e-3, 7.0, -0.7, 1e10
E:  .double 1.0
I:  .dword 9007199254740993, -9007199254740993, 9007199254740995, 3, -3, 18014398509481985, 0x7fffffffffffffff, -1
DF: .float 0.1, 0.2, 0.3, 0.33333334, 1e-3, 7.0, -0.7, 1e10
    .balign 8
result:
out: .zero 3800
result_end:
