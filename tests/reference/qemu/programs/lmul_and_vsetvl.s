# vl = min(AVL, VLMAX) for AVL 100 at e8 with LMUL mf8..m8, and the same
# vector add and sum at each; VLMAX for other SEW/LMUL pairs (rs1 = x0 asks for
# VLMAX); vsetivli; vsetvl with vtype in a register, including reserved
# encodings (vsew = 4, vlmul = 4), which set vill and vl = 0; AVL = 0.
    .globl _start
    .text
_start:
    la a2, vls
    la a3, sums
    li a0, 100
    vsetvli t0, a0, e8, mf8, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    la a1, bytes
    vle8.v v8, (a1)
    vadd.vv v16, v8, v8
    vsetvli t1, zero, e8, m1, ta, ma
    vmv.s.x v1, zero
    vsetvli t0, a0, e8, mf8, ta, ma
    vredsum.vs v2, v16, v1
    vmv.x.s t2, v2
    sd t2, 0(a3)
    addi a3, a3, 8
    vsetvli t0, a0, e8, mf4, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    la a1, bytes
    vle8.v v8, (a1)
    vadd.vv v16, v8, v8
    vsetvli t1, zero, e8, m1, ta, ma
    vmv.s.x v1, zero
    vsetvli t0, a0, e8, mf4, ta, ma
    vredsum.vs v2, v16, v1
    vmv.x.s t2, v2
    sd t2, 0(a3)
    addi a3, a3, 8
    vsetvli t0, a0, e8, mf2, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    la a1, bytes
    vle8.v v8, (a1)
    vadd.vv v16, v8, v8
    vsetvli t1, zero, e8, m1, ta, ma
    vmv.s.x v1, zero
    vsetvli t0, a0, e8, mf2, ta, ma
    vredsum.vs v2, v16, v1
    vmv.x.s t2, v2
    sd t2, 0(a3)
    addi a3, a3, 8
    vsetvli t0, a0, e8, m1, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    la a1, bytes
    vle8.v v8, (a1)
    vadd.vv v16, v8, v8
    vsetvli t1, zero, e8, m1, ta, ma
    vmv.s.x v1, zero
    vsetvli t0, a0, e8, m1, ta, ma
    vredsum.vs v2, v16, v1
    vmv.x.s t2, v2
    sd t2, 0(a3)
    addi a3, a3, 8
    vsetvli t0, a0, e8, m2, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    la a1, bytes
    vle8.v v8, (a1)
    vadd.vv v16, v8, v8
    vsetvli t1, zero, e8, m1, ta, ma
    vmv.s.x v1, zero
    vsetvli t0, a0, e8, m2, ta, ma
    vredsum.vs v2, v16, v1
    vmv.x.s t2, v2
    sd t2, 0(a3)
    addi a3, a3, 8
    vsetvli t0, a0, e8, m4, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    la a1, bytes
    vle8.v v8, (a1)
    vadd.vv v16, v8, v8
    vsetvli t1, zero, e8, m1, ta, ma
    vmv.s.x v1, zero
    vsetvli t0, a0, e8, m4, ta, ma
    vredsum.vs v2, v16, v1
    vmv.x.s t2, v2
    sd t2, 0(a3)
    addi a3, a3, 8
    vsetvli t0, a0, e8, m8, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    la a1, bytes
    vle8.v v8, (a1)
    vadd.vv v16, v8, v8
    vsetvli t1, zero, e8, m1, ta, ma
    vmv.s.x v1, zero
    vsetvli t0, a0, e8, m8, ta, ma
    vredsum.vs v2, v16, v1
    vmv.x.s t2, v2
    sd t2, 0(a3)
    addi a3, a3, 8
    vsetvli t0, zero, e16, mf4, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    vsetvli t0, zero, e32, mf2, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    vsetvli t0, zero, e64, m1, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    vsetvli t0, zero, e64, m8, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    vsetvli t0, zero, e32, m8, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    vsetvli t0, zero, e16, m2, ta, ma
    sd t0, 0(a2)
    addi a2, a2, 8
    vsetivli t0, 13, e16, m1, tu, mu
    sd t0, 0(a2)
    vsetivli t0, 31, e64, m2, ta, ma
    sd t0, 8(a2)
    li a0, 7
    vsetvli t0, a0, e32, m1, ta, ma
    vsetvli zero, zero, e64, m1, ta, ma
    vmv.x.s t0, v0
    li t3, 0xd1
    vsetvl t0, a0, t3
    sd t0, 16(a2)
    li t3, 0x1b
    li a0, 1000
    vsetvl t0, a0, t3
    sd t0, 24(a2)
    vsetvl t0, zero, t3
    sd t0, 32(a2)
    li t3, 0x20
    vsetvl t0, a0, t3
    sd t0, 40(a2)
    li t3, 0x04
    vsetvl t0, a0, t3
    sd t0, 48(a2)
    li a0, 0
    vsetvli t0, a0, e32, m1, ta, ma
    sd t0, 56(a2)

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
bytes: .byte 0, 7, 14, 21, 28, 35, 42, 49, 56, 63, 70, 77, 84, 91, 98, 105, 112, 119, 126, 133, 140, 147, 154, 161, 168, 175, 182, 189, 196, 203, 210, 217, 224, 231, 238, 245, 252, 3, 10, 17, 24, 31, 38, 45, 52, 59, 66, 73, 80, 87, 94, 101, 108, 115, 122, 129, 136, 143, 150, 157, 164, 171, 178, 185, 192, 199, 206, 213, 220, 227, 234, 241, 248, 255, 6, 13, 20, 27, 34, 41, 48, 55, 62, 69, 76, 83, 90, 97, 104, 111, 118, 125, 132, 139, 146, 153, 160, 167, 174, 181, 188, 195, 202, 209, 216, 223, 230, 237, 244, 251, 2, 9, 16, 23, 30, 37, 44, 51, 58, 65, 72, 79, 86, 93, 100, 107, 114, 121
    .balign 8
result:
vls: .zero 176
sums: .zero 56
result_end:
