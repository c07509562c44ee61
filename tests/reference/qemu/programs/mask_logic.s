# Mask-register logic (vmand, vmnand, vmandn, vmor, vmnor, vmorn, vmxor, vmxnor)
# and the pseudo-instructions vmnot.m, vmmv.m, vmclr.m, vmset.m over 29 bits;
# the bits past vl stay undisturbed (seen by storing 64 bits afterwards).
    .globl _start
    .text
_start:
    li a0, 29
    vsetvli t0, a0, e32, m8, ta, mu
    la a6, vls
    sd t0, 0(a6)
    la a1, ma
    vlm.v v1, (a1)
    la a1, mb
    vlm.v v2, (a1)
    la a2, out
    la a1, pre
    vlm.v v3, (a1)
    vmand.mm v3, v1, v2
    vsm.v v3, (a2)
    addi a2, a2, 4
    la a1, pre
    vlm.v v3, (a1)
    vmnand.mm v3, v1, v2
    vsm.v v3, (a2)
    addi a2, a2, 4
    la a1, pre
    vlm.v v3, (a1)
    vmandn.mm v3, v1, v2
    vsm.v v3, (a2)
    addi a2, a2, 4
    la a1, pre
    vlm.v v3, (a1)
    vmor.mm v3, v1, v2
    vsm.v v3, (a2)
    addi a2, a2, 4
    la a1, pre
    vlm.v v3, (a1)
    vmnor.mm v3, v1, v2
    vsm.v v3, (a2)
    addi a2, a2, 4
    la a1, pre
    vlm.v v3, (a1)
    vmorn.mm v3, v1, v2
    vsm.v v3, (a2)
    addi a2, a2, 4
    la a1, pre
    vlm.v v3, (a1)
    vmxor.mm v3, v1, v2
    vsm.v v3, (a2)
    addi a2, a2, 4
    la a1, pre
    vlm.v v3, (a1)
    vmxnor.mm v3, v1, v2
    vsm.v v3, (a2)
    addi a2, a2, 4
    la a1, pre
    vlm.v v3, (a1)
    vmnot.m v3, v1
    vsm.v v3, (a2)
    addi a2, a2, 4
    la a1, pre
    vlm.v v3, (a1)
    vmmv.m v3, v2
    vsm.v v3, (a2)
    addi a2, a2, 4
    la a1, pre
    vlm.v v3, (a1)
    vmclr.m v3
    vsm.v v3, (a2)
    addi a2, a2, 4
    la a1, pre
    vlm.v v3, (a1)
    vmset.m v3
    vsm.v v3, (a2)
    addi a2, a2, 4
    li a0, 64
    vsetvli t0, a0, e8, m8, ta, mu
    sd t0, 8(a6)
    la a1, pre
    vlm.v v3, (a1)
    li a0, 29
    vsetvli t0, a0, e8, m8, ta, mu
    vmxor.mm v3, v1, v2
    li a0, 64
    vsetvli t0, a0, e8, m8, ta, mu
    vsm.v v3, (a2)

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
ma: .byte 0xc5, 0x3a, 0xff, 0x10, 0, 0, 0, 0
mb: .byte 0x9c, 0x0f, 0x55, 0x1e, 0, 0, 0, 0
pre: .byte 0x77, 0x77, 0x77, 0x77, 0x77, 0x77, 0x77, 0x77
    .balign 8
result:
out: .zero 56
vls: .zero 16
result_end:
