# Mask scans over 40 elements: vmsbf.m, vmsif.m, vmsof.m (unmasked, masked,
# and on an all-zero source), viota.m and vid.v unmasked and masked, vcpop.m and
# vfirst.m (-1 when no bit is set). Masks come from vlm.v.
    .globl _start
    .text
_start:
    li a0, 40
    vsetvli t0, a0, e8, m4, ta, mu
    la a6, vls
    sd t0, 0(a6)
    la a1, m1
    vlm.v v1, (a1)
    la a1, m2
    vlm.v v2, (a1)
    la a1, m0
    vlm.v v0, (a1)
    la a2, out
    vmset.m v3
    vmsbf.m v3, v1
    vsm.v v3, (a2)
    addi a2, a2, 5
    vmset.m v3
    vmsif.m v3, v1
    vsm.v v3, (a2)
    addi a2, a2, 5
    vmset.m v3
    vmsof.m v3, v1
    vsm.v v3, (a2)
    addi a2, a2, 5
    vmset.m v3
    vmsbf.m v3, v1, v0.t
    vsm.v v3, (a2)
    addi a2, a2, 5
    vmset.m v3
    vmsif.m v3, v1, v0.t
    vsm.v v3, (a2)
    addi a2, a2, 5
    vmset.m v3
    vmsof.m v3, v1, v0.t
    vsm.v v3, (a2)
    addi a2, a2, 5
    vmset.m v3
    vmsbf.m v3, v2
    vsm.v v3, (a2)
    addi a2, a2, 5
    vmset.m v3
    vmsof.m v3, v2
    vsm.v v3, (a2)
    addi a2, a2, 5
    vmv.v.i v8, -1
    viota.m v8, v1
    vse8.v v8, (a2)
    addi a2, a2, 40
    vmv.v.i v8, -1
    viota.m v8, v1, v0.t
    vse8.v v8, (a2)
    addi a2, a2, 40
    vmv.v.i v8, -1
    vid.v v8, v0.t
    vse8.v v8, (a2)
    addi a2, a2, 40
    la a3, scalars
    vcpop.m t1, v1
    sd t1, 0(a3)
    vcpop.m t1, v1, v0.t
    sd t1, 8(a3)
    vfirst.m t1, v1
    sd t1, 16(a3)
    vfirst.m t1, v1, v0.t
    sd t1, 24(a3)
    vfirst.m t1, v2
    sd t1, 32(a3)
    vcpop.m t1, v2
    sd t1, 40(a3)

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
m1: .byte 0x00, 0x50, 0x03, 0x80, 0x0f
m2: .byte 0, 0, 0, 0, 0
m0: .byte 0xff, 0x0f, 0xf0, 0x55, 0xaa
    .balign 8
result:
out: .zero 160
scalars: .zero 48
vls: .zero 8
result_end:
