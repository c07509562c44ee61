# Clamp 40 int16 values into [-100, 250] with compares and merges, then a
# masked subtract (v0.t) that leaves masked-off elements undisturbed.
    .globl _start
    .text
_start:
    li a0, 40
    li a4, -100
    li a5, 250
    la a1, data
    la a2, out
    la a3, vls
loop:
    vsetvli t0, a0, e16, m2, ta, mu
    sd t0, 0(a3)
    addi a3, a3, 8
    vle16.v v2, (a1)
    vmsgt.vx v0, v2, a5
    vmerge.vxm v2, v2, a5, v0
    vmslt.vx v0, v2, a4
    vmerge.vxm v2, v2, a4, v0
    vle16.v v4, (a1)
    vmsne.vv v0, v4, v2
    vsub.vv v4, v4, v2, v0.t
    vse16.v v2, (a1)
    vse16.v v4, (a2)
    slli t1, t0, 1
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
result:
data: .half -200, -103, -6, 91, 188, 285, 382, -121, -24, 73, 170, 267, 364, -139, -42, 55, 152, 249, 346, -157, -60, 37, 134, 231, 328, -175, -78, 19, 116, 213, 310, -193, -96, 1, 98, 195, 292, 389, -114, -17
out: .zero 80
vls: .zero 160
result_end:
