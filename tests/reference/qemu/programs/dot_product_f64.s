# FP64 dot product of 45 elements: vfmacc into an accumulator that keeps its
# tail undisturbed across strips, then one vfredusum (element order) and one
# vfredosum at VLMAX. Prints both sums and the vl history.
    .globl _start
    .text
_start:
    vsetvli t0, zero, e64, m1, ta, ma
    vmv.v.i v8, 0
    li a0, 45
    la a1, x
    la a2, y
    la a3, vls
loop:
    vsetvli t0, a0, e64, m1, tu, mu
    sd t0, 0(a3)
    addi a3, a3, 8
    vle64.v v1, (a1)
    vle64.v v2, (a2)
    vfmacc.vv v8, v1, v2
    slli t1, t0, 3
    add a1, a1, t1
    add a2, a2, t1
    sub a0, a0, t0
    bnez a0, loop
    vsetvli t0, zero, e64, m1, ta, ma
    vmv.s.x v9, zero
    vfredusum.vs v10, v8, v9
    vfredosum.vs v11, v8, v9
    la a4, sums
    vfmv.f.s fa0, v10
    fsd fa0, 0(a4)
    vfmv.f.s fa1, v11
    fsd fa1, 8(a4)

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
x: .double 1.0, -1.3333333333333333, 1.6666666666666665, -2.0, 2.333333333333333, -2.666666666666667, 3.0, -3.3333333333333335, 3.6666666666666665, -4.0, 4.333333333333334, -4.666666666666666, 5.0, -5.333333333333333, 5.666666666666667, -6.0, 6.333333333333333, -6.666666666666667, 7.0, -7.333333333333333, 7.666666666666667, -8.0, 8.333333333333332, -8.666666666666668, 9.0, -9.333333333333334, 9.666666666666666, -10.0, 10.333333333333334, -10.666666666666666, 11.0, -11.333333333333334, 11.666666666666666, -12.0, 12.333333333333334, -12.666666666666666, 13.0, -13.333333333333334, 13.666666666666666, -14.0, 14.333333333333334, -14.666666666666666, 15.0, -15.333333333333334, 15.666666666666666
y: .double 1e+16, 0.3, 0.6, 0.8999999999999999, 1.2, 1.5, 1.7999999999999998, 1e+16, 2.4, 2.6999999999999997, 3.0, 3.3, 3.5999999999999996, 3.9, 1e+16, 4.5, 4.8, 5.1, 5.3999999999999995, 5.7, 6.0, 1e+16, 6.6, 6.8999999999999995, 7.199999999999999, 7.5, 7.8, 8.1, 1e+16, 8.7, 9.0, 9.299999999999999, 9.6, 9.9, 10.2, 1e+16, 10.799999999999999, 11.1, 11.4, 11.7, 12.0, 12.299999999999999, 1e+16, 12.9, 13.2
result:
sums: .zero 16
vls: .zero 400
result_end:
