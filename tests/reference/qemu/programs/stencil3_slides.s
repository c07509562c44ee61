# A 3-point stencil out[i] = (a[i-1] + 2 a[i] + a[i+1]) / 4 in FP32 over 30
# interior points, built with vslide1up/vslide1down strip by strip.
    .globl _start
    .text
_start:
    li a0, 30
    la a1, a
    addi a1, a1, 4
    la a2, out
    la a3, vls
    la t2, quarter
    flw fa2, 0(t2)
    la t2, two
    flw fa3, 0(t2)
loop:
    vsetvli t0, a0, e32, m2, ta, ma
    sd t0, 0(a3)
    addi a3, a3, 8
    vle32.v v2, (a1)
    flw fa0, -4(a1)
    slli t1, t0, 2
    add t3, a1, t1
    flw fa1, 0(t3)
    vfslide1up.vf v4, v2, fa0
    vfslide1down.vf v6, v2, fa1
    vfadd.vv v8, v4, v6
    vfmacc.vf v8, fa3, v2
    vfmul.vf v8, v8, fa2
    vse32.v v8, (a2)
    add a1, a1, t1
    add a2, a2, t1
    sub a0, a0, t0
    bnez a0, loop

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
quarter: .float 0.25
two: .float 2.0
a: .float -1.1, -0.8, 0.09999999999999987, 1.5999999999999996, 3.6999999999999997, 1.2999999999999998, -0.5000000000000001, 3.4, 2.8, 2.8, 3.4, -0.5000000000000001, 1.2999999999999998, 3.6999999999999997, 1.5999999999999996, 0.09999999999999987, -0.8, -1.1, -0.8, 0.09999999999999987, 1.5999999999999996, 3.6999999999999997, 1.2999999999999998, -0.5000000000000001, 3.4, 2.8, 2.8, 3.4, -0.5000000000000001, 1.2999999999999998, 3.6999999999999997, 1.5999999999999996
    .balign 8
result:
out: .zero 120
    .balign 8
vls: .zero 160
result_end:
