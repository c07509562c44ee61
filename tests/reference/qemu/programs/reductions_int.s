# Integer reductions (vredsum, vredmax[u], vredmin[u], vredand, vredor,
# vredxor) unmasked and masked, at e8/m2, e16/m1 and e64/m4; the sum wraps at
# SEW. Results read back with vmv.x.s (sign-extended).
    .globl _start
    .text
_start:
    li a0, 30
    vsetvli t0, a0, e8, m2, ta, mu
    la a6, vls
    sd t0, 0(a6)
    la a1, r8
    vle8.v v8, (a1)
    li a3, 0x5b
    vmv.s.x v1, a3
    vsetvli t0, a0, e8, m1, ta, mu
    li a3, 0x3c
    vmv.v.x v0, a3
    vsetvli t0, a0, e8, m2, ta, mu
    la a2, o8
    vmv.v.i v12, 0
    vredsum.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredsum.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmax.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmax.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmaxu.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmaxu.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmin.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmin.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredminu.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredminu.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredand.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredand.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredor.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredor.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredxor.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredxor.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    li a0, 7
    vsetvli t0, a0, e16, m1, ta, mu
    la a6, vls
    sd t0, 8(a6)
    la a1, r16
    vle16.v v8, (a1)
    li a3, 0x5b
    vmv.s.x v1, a3
    vsetvli t0, a0, e8, m1, ta, mu
    li a3, 0x3c
    vmv.v.x v0, a3
    vsetvli t0, a0, e16, m1, ta, mu
    la a2, o16
    vmv.v.i v12, 0
    vredsum.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredsum.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmax.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmax.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmaxu.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmaxu.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmin.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmin.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredminu.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredminu.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredand.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredand.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredor.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredor.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredxor.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredxor.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    li a0, 13
    vsetvli t0, a0, e64, m4, ta, mu
    la a6, vls
    sd t0, 16(a6)
    la a1, r64
    vle64.v v8, (a1)
    li a3, 0x5b
    vmv.s.x v1, a3
    vsetvli t0, a0, e8, m1, ta, mu
    li a3, 0x3c
    vmv.v.x v0, a3
    vsetvli t0, a0, e64, m4, ta, mu
    la a2, o64
    vmv.v.i v12, 0
    vredsum.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredsum.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmax.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmax.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmaxu.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmaxu.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmin.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredmin.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredminu.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredminu.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredand.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredand.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredor.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredor.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredxor.vs v12, v8, v1
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8
    vmv.v.i v12, 0
    vredxor.vs v12, v8, v1, v0.t
    vmv.x.s t1, v12
    sd t1, 0(a2)
    addi a2, a2, 8

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
r8: .byte -117, -80, -43, -6, 31, 68, 105, -114, -77, -40, -3, 34, 71, 108, -111, -74, -37, 0, 37, 74, 111, -108, -71, -34, 3, 40, 77, 114, -105, -68
    .balign 8
r16: .half -32757, -32720, -32683, -32646, -32609, -32572, -32535
    .balign 8
r64: .dword -32757, -32720, -32683, 9223372036854775807, -32609, -9223372036854775808, 123456789012, -32498, -32461, -32424, -32387, -32350, -32313
    .balign 8
result:
o8: .zero 128
o16: .zero 128
o64: .zero 128
vls: .zero 24
result_end:
