# Moves between scalar and vector registers: vmv.x.s (sign-extends), vmv.s.x,
# vmv.v.v/x/i, vfmv.v.f, vfmerge.vfm, vmerge.vvm/vim, vfmv.f.s (NaN-boxes FP32),
# vfmv.s.f, fmv.d.x/fmv.x.d; a binary64 value in an f register used at SEW=32 is
# not NaN-boxed and reads as the canonical NaN. With vl = 0, vmv.x.s and
# vfmv.f.s still read element 0 and vmv.s.x writes nothing.
    .globl _start
    .text
_start:
    li a0, 6
    vsetvli t0, a0, e32, m1, ta, mu
    la a2, out
    la a1, words
    vle32.v v1, (a1)
    vmv.x.s t1, v1
    sd t1, 0(a2)
    li t2, -123456789012
    vmv.s.x v2, t2
    vmv.v.v v3, v1
    vmv.s.x v3, t2
    addi a3, a2, 8
    vse32.v v3, (a3)
    vmv.v.x v4, t2
    addi a3, a2, 32
    vse32.v v4, (a3)
    vmv.v.i v5, -16
    addi a3, a2, 56
    vse32.v v5, (a3)
    la a1, f32one
    flw fa0, 0(a1)
    vfmv.v.f v6, fa0
    addi a3, a2, 80
    vse32.v v6, (a3)
    la a1, f64val
    fld fa1, 0(a1)
    vfmv.v.f v6, fa1
    addi a3, a2, 104
    vse32.v v6, (a3)
    vfadd.vf v7, v1, fa1
    addi a3, a2, 128
    vse32.v v7, (a3)
    li t3, 0x0f
    vmv.s.x v0, t3
    vfmerge.vfm v8, v1, fa0, v0
    addi a3, a2, 152
    vse32.v v8, (a3)
    vmerge.vvm v9, v1, v5, v0
    addi a3, a2, 176
    vse32.v v9, (a3)
    vmerge.vim v9, v1, 3, v0
    addi a3, a2, 200
    vse32.v v9, (a3)
    vfmv.f.s fa2, v1
    fmv.x.d t4, fa2
    sd t4, 224(a2)
    vfmv.s.f v10, fa0
    vmv.x.s t5, v10
    sd t5, 232(a2)
    vsetvli t0, a0, e64, m1, ta, mu
    li t6, 0x400921fb54442d18
    fmv.d.x fa3, t6
    vfmv.v.f v11, fa3
    vfmv.f.s fa4, v11
    fsd fa4, 240(a2)
    vmv.x.s t1, v11
    sd t1, 248(a2)
    vsetivli t0, 0, e32, m1, ta, mu
    vmv.x.s t1, v1
    sd t1, 256(a2)
    vmv.s.x v1, zero
    vfmv.f.s fa5, v1
    fmv.x.d t1, fa5
    sd t1, 264(a2)

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
words: .word 0xfffffff0, 0x7f800001, 3, 0x80000000, 5, 6
f32one: .float 1.0
    .balign 8
f64val: .double 2.0
result:
out: .zero 272
result_end:
