# Scalar FP in every static rounding mode (rne rtz rdn rup rmm) and under frm
# (dyn); vfrec7/vfrsqrt7 over all 128 table indices and special values
# (V 1.0 sections 13.9, 13.10); vfclass; widening FP and narrowing conversions
# (13.3, 13.7, 13.19 with round-to-odd) and the ordered widening sum (14.3).
    .globl _start
    .text
_start:
    la s0, out
    la a1, dvals
    fld fa0, 0(a1)
    fld fa1, 8(a1)
    flw fa2, 16(a1)
    flw fa3, 20(a1)
    fadd.d ft0, fa0, fa1, rne
    fsd ft0, 0(s0)
    fadd.d ft0, fa0, fa1, rtz
    fsd ft0, 8(s0)
    fadd.d ft0, fa0, fa1, rdn
    fsd ft0, 16(s0)
    fadd.d ft0, fa0, fa1, rup
    fsd ft0, 24(s0)
    fdiv.d ft0, fa0, fa1, rmm
    fsd ft0, 32(s0)
    fdiv.s ft1, fa2, fa3, rup
    fsw ft1, 40(s0)
    fdiv.s ft1, fa2, fa3, rdn
    fsw ft1, 44(s0)
    fsqrt.d ft0, fa1, rdn
    fsd ft0, 48(s0)
    fsqrt.d ft0, fa1, rup
    fsd ft0, 56(s0)
    fmadd.s ft1, fa2, fa3, fa2, rtz
    fsw ft1, 64(s0)
    fmul.d ft0, fa0, fa1, rtz
    fsd ft0, 72(s0)
    fcvt.w.d t1, fa1, rmm
    sw t1, 80(s0)
    fcvt.l.d t1, fa0, rdn
    sd t1, 88(s0)
    fcvt.s.d ft1, fa0, rup
    fsw ft1, 96(s0)
    fcvt.s.l ft1, t1, rtz
    fsw ft1, 100(s0)
    li t1, 3
    fsrm t1
    fsub.d ft0, fa0, fa1
    fsd ft0, 104(s0)
    frrm t2
    sd t2, 112(s0)
    fclass.d t2, fa1
    sd t2, 120(s0)
    fsrmi 0
    addi s0, s0, 128
    # estimates
    la a1, ests
    li s1, 288
1:
    vsetvli t0, s1, e32, m8, ta, ma
    vle32.v v8, (a1)
    vfrec7.v v16, v8
    vse32.v v16, (s0)
    slli t1, t0, 2
    add s0, s0, t1
    vfrsqrt7.v v16, v8
    vse32.v v16, (s0)
    add s0, s0, t1
    vfclass.v v16, v8
    vse32.v v16, (s0)
    add s0, s0, t1
    add a1, a1, t1
    sub s1, s1, t0
    bnez s1, 1b
    # widening FP and narrowing conversions
    li a0, 8
    vsetvli t0, a0, e32, m1, ta, ma
    la a1, ests
    vle32.v v1, (a1)
    addi a3, a1, 32
    vle32.v v2, (a3)
    la a2, dvals
    vsetvli t0, a0, e64, m2, ta, ma
    vle64.v v4, (a2)
    vsetvli t0, a0, e32, m1, ta, ma
    vfwadd.wv v6, v4, v1
    vfwsub.vf v8, v2, fa2
    vfwnmsac.vv v6, v1, v2
    vfwmul.vf v10, v1, fa3
    vsetvli t0, a0, e64, m2, ta, ma
    vse64.v v6, (s0)
    addi s0, s0, 64
    vse64.v v8, (s0)
    addi s0, s0, 64
    vse64.v v10, (s0)
    addi s0, s0, 64
    vsetvli t0, a0, e32, m1, ta, ma
    vfncvt.rod.f.f.w v12, v4
    vse32.v v12, (s0)
    addi s0, s0, 32
    vfncvt.f.f.w v12, v4
    vse32.v v12, (s0)
    addi s0, s0, 32
    vfncvt.x.f.w v12, v4
    vse32.v v12, (s0)
    addi s0, s0, 32
    vfwcvt.f.f.v v14, v1
    vfmv.s.f v16, fa0
    vfwredosum.vs v16, v2, v16
    vsetvli t0, a0, e64, m2, ta, ma
    vse64.v v14, (s0)
    addi s0, s0, 64
    vsetivli zero, 1, e64, m1, ta, ma
    vse64.v v16, (s0)
    addi s0, s0, 8
    li a7, 64
    li a0, 1
    la a1, out
    sub a2, s0, a1
    ecall
    li a7, 93
    li a0, 0
    ecall
    .data
    .balign 8
dvals: .dword 0x3ff0000000000001, 0x4008000000000003
    .word 0x3f800001, 0x40400000
    .dword 0x7ff0000000000000, 0xc000000000000000, 0x0000000000000001, 0x3ff8000000000000, 0x47efffffe0000000, 0xbfd5555555555555
ests:
    # 1.0 and 2.0 times each 7-bit fraction index (+ a quarter step): every table entry
    .word 0x3f804000, 0x3f814000, 0x3f824000, 0x3f834000, 0x3f844000, 0x3f854000, 0x3f864000, 0x3f874000
    .word 0x3f884000, 0x3f894000, 0x3f8a4000, 0x3f8b4000, 0x3f8c4000, 0x3f8d4000, 0x3f8e4000, 0x3f8f4000
    .word 0x3f904000, 0x3f914000, 0x3f924000, 0x3f934000, 0x3f944000, 0x3f954000, 0x3f964000, 0x3f974000
    .word 0x3f984000, 0x3f994000, 0x3f9a4000, 0x3f9b4000, 0x3f9c4000, 0x3f9d4000, 0x3f9e4000, 0x3f9f4000
    .word 0x3fa04000, 0x3fa14000, 0x3fa24000, 0x3fa34000, 0x3fa44000, 0x3fa54000, 0x3fa64000, 0x3fa74000
    .word 0x3fa84000, 0x3fa94000, 0x3faa4000, 0x3fab4000, 0x3fac4000, 0x3fad4000, 0x3fae4000, 0x3faf4000
    .word 0x3fb04000, 0x3fb14000, 0x3fb24000, 0x3fb34000, 0x3fb44000, 0x3fb54000, 0x3fb64000, 0x3fb74000
    .word 0x3fb84000, 0x3fb94000, 0x3fba4000, 0x3fbb4000, 0x3fbc4000, 0x3fbd4000, 0x3fbe4000, 0x3fbf4000
    .word 0x3fc04000, 0x3fc14000, 0x3fc24000, 0x3fc34000, 0x3fc44000, 0x3fc54000, 0x3fc64000, 0x3fc74000
    .word 0x3fc84000, 0x3fc94000, 0x3fca4000, 0x3fcb4000, 0x3fcc4000, 0x3fcd4000, 0x3fce4000, 0x3fcf4000
    .word 0x3fd04000, 0x3fd14000, 0x3fd24000, 0x3fd34000, 0x3fd44000, 0x3fd54000, 0x3fd64000, 0x3fd74000
    .word 0x3fd84000, 0x3fd94000, 0x3fda4000, 0x3fdb4000, 0x3fdc4000, 0x3fdd4000, 0x3fde4000, 0x3fdf4000
    .word 0x3fe04000, 0x3fe14000, 0x3fe24000, 0x3fe34000, 0x3fe44000, 0x3fe54000, 0x3fe64000, 0x3fe74000
    .word 0x3fe84000, 0x3fe94000, 0x3fea4000, 0x3feb4000, 0x3fec4000, 0x3fed4000, 0x3fee4000, 0x3fef4000
    .word 0x3ff04000, 0x3ff14000, 0x3ff24000, 0x3ff34000, 0x3ff44000, 0x3ff54000, 0x3ff64000, 0x3ff74000
    .word 0x3ff84000, 0x3ff94000, 0x3ffa4000, 0x3ffb4000, 0x3ffc4000, 0x3ffd4000, 0x3ffe4000, 0x3fff4000
    .word 0x40004000, 0x40014000, 0x40024000, 0x40034000, 0x40044000, 0x40054000, 0x40064000, 0x40074000
    .word 0x40084000, 0x40094000, 0x400a4000, 0x400b4000, 0x400c4000, 0x400d4000, 0x400e4000, 0x400f4000
    .word 0x40104000, 0x40114000, 0x40124000, 0x40134000, 0x40144000, 0x40154000, 0x40164000, 0x40174000
    .word 0x40184000, 0x40194000, 0x401a4000, 0x401b4000, 0x401c4000, 0x401d4000, 0x401e4000, 0x401f4000
    .word 0x40204000, 0x40214000, 0x40224000, 0x40234000, 0x40244000, 0x40254000, 0x40264000, 0x40274000
    .word 0x40284000, 0x40294000, 0x402a4000, 0x402b4000, 0x402c4000, 0x402d4000, 0x402e4000, 0x402f4000
    .word 0x40304000, 0x40314000, 0x40324000, 0x40334000, 0x40344000, 0x40354000, 0x40364000, 0x40374000
    .word 0x40384000, 0x40394000, 0x403a4000, 0x403b4000, 0x403c4000, 0x403d4000, 0x403e4000, 0x403f4000
    .word 0x40404000, 0x40414000, 0x40424000, 0x40434000, 0x40444000, 0x40454000, 0x40464000, 0x40474000
    .word 0x40484000, 0x40494000, 0x404a4000, 0x404b4000, 0x404c4000, 0x404d4000, 0x404e4000, 0x404f4000
    .word 0x40504000, 0x40514000, 0x40524000, 0x40534000, 0x40544000, 0x40554000, 0x40564000, 0x40574000
    .word 0x40584000, 0x40594000, 0x405a4000, 0x405b4000, 0x405c4000, 0x405d4000, 0x405e4000, 0x405f4000
    .word 0x40604000, 0x40614000, 0x40624000, 0x40634000, 0x40644000, 0x40654000, 0x40664000, 0x40674000
    .word 0x40684000, 0x40694000, 0x406a4000, 0x406b4000, 0x406c4000, 0x406d4000, 0x406e4000, 0x406f4000
    .word 0x40704000, 0x40714000, 0x40724000, 0x40734000, 0x40744000, 0x40754000, 0x40764000, 0x40774000
    .word 0x40784000, 0x40794000, 0x407a4000, 0x407b4000, 0x407c4000, 0x407d4000, 0x407e4000, 0x407f4000
    .word 0x00000000, 0x80000000, 0x7f800000, 0xff800000, 0x7fc00000, 0x7f800001, 0x00000001, 0x80400000
    .word 0x00200000, 0x007fffff, 0xbf800000, 0x7f7fffff, 0x01000000, 0x00800000, 0x3f000000, 0x5f000000
    .word 0x00000002, 0x80000010, 0x00100000, 0x20000000, 0x9f000000, 0x60000000, 0x7e000000, 0x3e800000
    .word 0x40800000, 0x40c00000, 0x41000000, 0x41200000, 0x00400000, 0x00080000, 0x80000001, 0xff7fffff
out: .zero 8192
