# FP compares with NaN operands (false except vmfne) and -0 == +0, masked
# with v0.t over an all-ones destination (masked-off bits stay undisturbed);
# integer compares in every .vv/.vx/.vi form on e8 values around the signed and
# unsigned limits; mask registers stored with vsm.v.
    .globl _start
    .text
_start:
    li a0, 16
    vsetvli t0, a0, e64, m8, ta, mu
    la a1, a64
    vle64.v v8, (a1)
    la a1, b64
    vle64.v v16, (a1)
    fld fa0, 8(a1)
    la a2, masks
    vid.v v24
    vmsgtu.vi v1, v24, 2
    vmmv.m v0, v1
    vmxnor.mm v2, v2, v2
    vmfeq.vv v2, v8, v16, v0.t
    vsm.v v2, (a2)
    addi a2, a2, 2
    vmmv.m v0, v1
    vmxnor.mm v2, v2, v2
    vmfne.vv v2, v8, v16, v0.t
    vsm.v v2, (a2)
    addi a2, a2, 2
    vmmv.m v0, v1
    vmxnor.mm v2, v2, v2
    vmflt.vv v2, v8, v16, v0.t
    vsm.v v2, (a2)
    addi a2, a2, 2
    vmmv.m v0, v1
    vmxnor.mm v2, v2, v2
    vmfle.vv v2, v8, v16, v0.t
    vsm.v v2, (a2)
    addi a2, a2, 2
    vmmv.m v0, v1
    vmxnor.mm v2, v2, v2
    vmfgt.vv v2, v8, v16, v0.t
    vsm.v v2, (a2)
    addi a2, a2, 2
    vmmv.m v0, v1
    vmxnor.mm v2, v2, v2
    vmfge.vv v2, v8, v16, v0.t
    vsm.v v2, (a2)
    addi a2, a2, 2
    vmmv.m v0, v1
    vmxnor.mm v2, v2, v2
    vmfeq.vf v2, v8, fa0, v0.t
    vsm.v v2, (a2)
    addi a2, a2, 2
    vmmv.m v0, v1
    vmxnor.mm v2, v2, v2
    vmfne.vf v2, v8, fa0, v0.t
    vsm.v v2, (a2)
    addi a2, a2, 2
    vmmv.m v0, v1
    vmxnor.mm v2, v2, v2
    vmflt.vf v2, v8, fa0, v0.t
    vsm.v v2, (a2)
    addi a2, a2, 2
    vmmv.m v0, v1
    vmxnor.mm v2, v2, v2
    vmfle.vf v2, v8, fa0, v0.t
    vsm.v v2, (a2)
    addi a2, a2, 2
    vmmv.m v0, v1
    vmxnor.mm v2, v2, v2
    vmfgt.vf v2, v8, fa0, v0.t
    vsm.v v2, (a2)
    addi a2, a2, 2
    vmmv.m v0, v1
    vmxnor.mm v2, v2, v2
    vmfge.vf v2, v8, fa0, v0.t
    vsm.v v2, (a2)
    addi a2, a2, 2
    li a0, 24
    vsetvli t0, a0, e8, m1, ta, mu
    la a1, i8a
    vle8.v v8, (a1)
    la a1, i8b
    vle8.v v9, (a1)
    li a3, -3
    vmclr.m v2
    vmseq.vv v2, v8, v9
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsne.vv v2, v8, v9
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmslt.vv v2, v8, v9
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsltu.vv v2, v8, v9
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsle.vv v2, v8, v9
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsleu.vv v2, v8, v9
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsgt.vv v2, v8, v9
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsgtu.vv v2, v8, v9
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmseq.vx v2, v8, a3
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsne.vx v2, v8, a3
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmslt.vx v2, v8, a3
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsltu.vx v2, v8, a3
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsle.vx v2, v8, a3
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsleu.vx v2, v8, a3
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsgt.vx v2, v8, a3
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsgtu.vx v2, v8, a3
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmseq.vi v2, v8, -3
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsne.vi v2, v8, 5
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsle.vi v2, v8, -1
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsleu.vi v2, v8, -16
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsgt.vi v2, v8, 4
    vsm.v v2, (a2)
    addi a2, a2, 3
    vmclr.m v2
    vmsgtu.vi v2, v8, 15
    vsm.v v2, (a2)
    addi a2, a2, 3

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
i8a: .byte 0, 1, -1, 127, -128, 5, -3, 4, 15, -16, 100, -100, 3, -3, 0, 7, 8, -8, 16, -17, 2, 64, -64, 1
i8b: .byte 0, 2, 1, -128, 127, 5, -3, -4, 16, -15, -100, 100, 3, 3, 1, 7, -8, 8, 16, 17, 2, -64, 64, -1
    .balign 8
result:
masks: .zero 90
    .balign 8
result_end:
