# vcompress.vm packs the elements above a threshold; vcpop.m counts them and
# vfirst.m finds the first. The rest of the destination stays undisturbed.
    .globl _start
    .text
_start:
    li a0, 27
    vsetvli t0, a0, e16, m4, ta, ma
    la a6, vls
    sd t0, 0(a6)
    la a1, data
    vle16.v v4, (a1)
    li a2, 500
    vmsgt.vx v1, v4, a2
    vmv.v.i v8, -1
    vcompress.vm v8, v4, v1
    la a3, packed
    vse16.v v8, (a3)
    vcpop.m t1, v1
    vfirst.m t2, v1
    la a4, counts
    sd t1, 0(a4)
    sd t2, 8(a4)

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
data: .half 0, 389, 778, 167, 556, 945, 334, 723, 112, 501, 890, 279, 668, 57, 446, 835, 224, 613, 2, 391, 780, 169, 558, 947, 336, 725, 114
    .balign 8
result:
packed: .zero 56
counts: .zero 16
vls: .zero 8
result_end:
