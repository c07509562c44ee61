# FP reductions in FP64 (e64/m8) and FP32 (e32/m4): vfredusum (summed in
# element order, as QEMU does), vfredosum, vfredmax, vfredmin, unmasked and
# masked, with start values +0, -0 and a NaN; values chosen so that the order
# of summation shows (1e16 + 1 - 1e16). With every element masked off the
# result is vs1[0].
    .globl _start
    .text
_start:
    li a0, 20
    vsetvli t0, a0, e64, m8, ta, mu
    la a6, vls
    sd t0, 0(a6)
    la a1, f64
    vle64.v v8, (a1)
    vid.v v16
    vand.vi v16, v16, 3
    vmsne.vi v0, v16, 1
    la a1, starts64
    la a2, fo64
    fld fa0, 0(a1)
    vfmv.s.f v1, fa0
    vfredusum.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredusum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredosum.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredosum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredmax.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredmax.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredmin.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredmin.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    fld fa0, 8(a1)
    vfmv.s.f v1, fa0
    vfredusum.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredusum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredosum.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredosum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredmax.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredmax.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredmin.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredmin.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    fld fa0, 16(a1)
    vfmv.s.f v1, fa0
    vfredusum.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredusum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredosum.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredosum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredmax.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredmax.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredmin.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vfredmin.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    vmclr.m v0
    vfredosum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsd fa1, 0(a2)
    addi a2, a2, 8
    li a0, 20
    vsetvli t0, a0, e32, m4, ta, mu
    la a6, vls
    sd t0, 8(a6)
    la a1, f32
    vle32.v v8, (a1)
    vid.v v16
    vand.vi v16, v16, 3
    vmsne.vi v0, v16, 1
    la a1, starts32
    la a2, fo32
    flw fa0, 0(a1)
    vfmv.s.f v1, fa0
    vfredusum.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredusum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredosum.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredosum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredmax.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredmax.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredmin.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredmin.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    flw fa0, 4(a1)
    vfmv.s.f v1, fa0
    vfredusum.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredusum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredosum.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredosum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredmax.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredmax.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredmin.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredmin.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    flw fa0, 8(a1)
    vfmv.s.f v1, fa0
    vfredusum.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredusum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredosum.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredosum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredmax.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredmax.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredmin.vs v2, v8, v1
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vfredmin.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4
    vmclr.m v0
    vfredosum.vs v2, v8, v1, v0.t
    vfmv.f.s fa1, v2
    fsw fa1, 0(a2)
    addi a2, a2, 4

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
f64: .dword 0x4341C37937E08000, 0x3FF0000000000000, 0xC341C37937E08000, 0x3FF0000000000000, 0x3FB999999999999A, 0x3FC999999999999A, 0x3FD3333333333333, 0x8000000000000000, 0x400C000000000000, 0x01A56E1FC2F8F359, 0x43B0000000000000, 0xC3B0000000000000, 0x401C000000000000, 0x3FE0000000000000, 0x3FD0000000000000, 0x3FC0000000000000, 0x3FD5555555555555, 0xC004000000000000, 0x4022000000000000, 0x7E37E43C8800759C
f32: .word 0x4CBEBC20, 0x3F800000, 0xCCBEBC20, 0x3F800000, 0x3DCCCCCD, 0x3E4CCCCD, 0x3E99999A, 0x80000000, 0x40600000, 0x0DA24260, 0x4E800000, 0xCE800000, 0x40E00000, 0x3F000000, 0x3E800000, 0x3E000000, 0x3EAAAAAB, 0xC0200000, 0x41100000, 0x7149F2CA
    .balign 8
starts64: .dword 0x0000000000000000, 0x8000000000000000, 0x7FF8000000000000
starts32: .word 0x00000000, 0x80000000, 0x7FC00000
    .balign 8
result:
fo64: .zero 200
fo32: .zero 100
    .balign 8
vls: .zero 16
result_end:
