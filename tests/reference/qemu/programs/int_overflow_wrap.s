# Integer arithmetic wraps around at every SEW: add, subtract, multiply,
# the high halves (vmulh, vmulhu), and division by zero (quotient all ones,
# remainder the dividend) and overflow (-2^(SEW-1) / -1) as V 1.0 section 11.11
# defines them; the scalar mul and addi wrap at 64 bits.
    .globl _start
    .text
_start:
    li a0, 8
    vsetvli t0, a0, e8, m1, ta, ma
    la a1, a8
    vle8.v v8, (a1)
    la a1, b8
    vle8.v v9, (a1)
    li a3, -7
    la a2, out8
    vadd.vv v10, v8, v9
    vse8.v v10, (a2)
    addi a2, a2, 8
    vsub.vv v10, v8, v9
    vse8.v v10, (a2)
    addi a2, a2, 8
    vmul.vv v10, v8, v9
    vse8.v v10, (a2)
    addi a2, a2, 8
    vmulh.vv v10, v8, v9
    vse8.v v10, (a2)
    addi a2, a2, 8
    vmulhu.vv v10, v8, v9
    vse8.v v10, (a2)
    addi a2, a2, 8
    vdiv.vv v10, v8, v9
    vse8.v v10, (a2)
    addi a2, a2, 8
    vdivu.vv v10, v8, v9
    vse8.v v10, (a2)
    addi a2, a2, 8
    vrem.vv v10, v8, v9
    vse8.v v10, (a2)
    addi a2, a2, 8
    vremu.vv v10, v8, v9
    vse8.v v10, (a2)
    addi a2, a2, 8
    vadd.vx v10, v8, a3
    vse8.v v10, (a2)
    addi a2, a2, 8
    vrsub.vx v10, v8, a3
    vse8.v v10, (a2)
    addi a2, a2, 8
    vmul.vx v10, v8, a3
    vse8.v v10, (a2)
    addi a2, a2, 8
    vmulh.vx v10, v8, a3
    vse8.v v10, (a2)
    addi a2, a2, 8
    vmulhu.vx v10, v8, a3
    vse8.v v10, (a2)
    addi a2, a2, 8
    vdiv.vx v10, v8, a3
    vse8.v v10, (a2)
    addi a2, a2, 8
    vremu.vx v10, v8, a3
    vse8.v v10, (a2)
    addi a2, a2, 8
    vadd.vi v10, v8, -9
    vse8.v v10, (a2)
    addi a2, a2, 8
    vrsub.vi v10, v8, -9
    vse8.v v10, (a2)
    addi a2, a2, 8
    vneg.v v10, v8
    vse8.v v10, (a2)
    addi a2, a2, 8
    li a0, 8
    vsetvli t0, a0, e16, m1, ta, ma
    la a1, a16
    vle16.v v8, (a1)
    la a1, b16
    vle16.v v9, (a1)
    li a3, -7
    la a2, out16
    vadd.vv v10, v8, v9
    vse16.v v10, (a2)
    addi a2, a2, 16
    vsub.vv v10, v8, v9
    vse16.v v10, (a2)
    addi a2, a2, 16
    vmul.vv v10, v8, v9
    vse16.v v10, (a2)
    addi a2, a2, 16
    vmulh.vv v10, v8, v9
    vse16.v v10, (a2)
    addi a2, a2, 16
    vmulhu.vv v10, v8, v9
    vse16.v v10, (a2)
    addi a2, a2, 16
    vdiv.vv v10, v8, v9
    vse16.v v10, (a2)
    addi a2, a2, 16
    vdivu.vv v10, v8, v9
    vse16.v v10, (a2)
    addi a2, a2, 16
    vrem.vv v10, v8, v9
    vse16.v v10, (a2)
    addi a2, a2, 16
    vremu.vv v10, v8, v9
    vse16.v v10, (a2)
    addi a2, a2, 16
    vadd.vx v10, v8, a3
    vse16.v v10, (a2)
    addi a2, a2, 16
    vrsub.vx v10, v8, a3
    vse16.v v10, (a2)
    addi a2, a2, 16
    vmul.vx v10, v8, a3
    vse16.v v10, (a2)
    addi a2, a2, 16
    vmulh.vx v10, v8, a3
    vse16.v v10, (a2)
    addi a2, a2, 16
    vmulhu.vx v10, v8, a3
    vse16.v v10, (a2)
    addi a2, a2, 16
    vdiv.vx v10, v8, a3
    vse16.v v10, (a2)
    addi a2, a2, 16
    vremu.vx v10, v8, a3
    vse16.v v10, (a2)
    addi a2, a2, 16
    vadd.vi v10, v8, -9
    vse16.v v10, (a2)
    addi a2, a2, 16
    vrsub.vi v10, v8, -9
    vse16.v v10, (a2)
    addi a2, a2, 16
    vneg.v v10, v8
    vse16.v v10, (a2)
    addi a2, a2, 16
    li a0, 8
    vsetvli t0, a0, e32, m1, ta, ma
    la a1, a32
    vle32.v v8, (a1)
    la a1, b32
    vle32.v v9, (a1)
    li a3, -7
    la a2, out32
    vadd.vv v10, v8, v9
    vse32.v v10, (a2)
    addi a2, a2, 32
    vsub.vv v10, v8, v9
    vse32.v v10, (a2)
    addi a2, a2, 32
    vmul.vv v10, v8, v9
    vse32.v v10, (a2)
    addi a2, a2, 32
    vmulh.vv v10, v8, v9
    vse32.v v10, (a2)
    addi a2, a2, 32
    vmulhu.vv v10, v8, v9
    vse32.v v10, (a2)
    addi a2, a2, 32
    vdiv.vv v10, v8, v9
    vse32.v v10, (a2)
    addi a2, a2, 32
    vdivu.vv v10, v8, v9
    vse32.v v10, (a2)
    addi a2, a2, 32
    vrem.vv v10, v8, v9
    vse32.v v10, (a2)
    addi a2, a2, 32
    vremu.vv v10, v8, v9
    vse32.v v10, (a2)
    addi a2, a2, 32
    vadd.vx v10, v8, a3
    vse32.v v10, (a2)
    addi a2, a2, 32
    vrsub.vx v10, v8, a3
    vse32.v v10, (a2)
    addi a2, a2, 32
    vmul.vx v10, v8, a3
    vse32.v v10, (a2)
    addi a2, a2, 32
    vmulh.vx v10, v8, a3
    vse32.v v10, (a2)
    addi a2, a2, 32
    vmulhu.vx v10, v8, a3
    vse32.v v10, (a2)
    addi a2, a2, 32
    vdiv.vx v10, v8, a3
    vse32.v v10, (a2)
    addi a2, a2, 32
    vremu.vx v10, v8, a3
    vse32.v v10, (a2)
    addi a2, a2, 32
    vadd.vi v10, v8, -9
    vse32.v v10, (a2)
    addi a2, a2, 32
    vrsub.vi v10, v8, -9
    vse32.v v10, (a2)
    addi a2, a2, 32
    vneg.v v10, v8
    vse32.v v10, (a2)
    addi a2, a2, 32
    li a0, 8
    vsetvli t0, a0, e64, m1, ta, ma
    la a1, a64
    vle64.v v8, (a1)
    la a1, b64
    vle64.v v9, (a1)
    li a3, -7
    la a2, out64
    vadd.vv v10, v8, v9
    vse64.v v10, (a2)
    addi a2, a2, 64
    vsub.vv v10, v8, v9
    vse64.v v10, (a2)
    addi a2, a2, 64
    vmul.vv v10, v8, v9
    vse64.v v10, (a2)
    addi a2, a2, 64
    vmulh.vv v10, v8, v9
    vse64.v v10, (a2)
    addi a2, a2, 64
    vmulhu.vv v10, v8, v9
    vse64.v v10, (a2)
    addi a2, a2, 64
    vdiv.vv v10, v8, v9
    vse64.v v10, (a2)
    addi a2, a2, 64
    vdivu.vv v10, v8, v9
    vse64.v v10, (a2)
    addi a2, a2, 64
    vrem.vv v10, v8, v9
    vse64.v v10, (a2)
    addi a2, a2, 64
    vremu.vv v10, v8, v9
    vse64.v v10, (a2)
    addi a2, a2, 64
    vadd.vx v10, v8, a3
    vse64.v v10, (a2)
    addi a2, a2, 64
    vrsub.vx v10, v8, a3
    vse64.v v10, (a2)
    addi a2, a2, 64
    vmul.vx v10, v8, a3
    vse64.v v10, (a2)
    addi a2, a2, 64
    vmulh.vx v10, v8, a3
    vse64.v v10, (a2)
    addi a2, a2, 64
    vmulhu.vx v10, v8, a3
    vse64.v v10, (a2)
    addi a2, a2, 64
    vdiv.vx v10, v8, a3
    vse64.v v10, (a2)
    addi a2, a2, 64
    vremu.vx v10, v8, a3
    vse64.v v10, (a2)
    addi a2, a2, 64
    vadd.vi v10, v8, -9
    vse64.v v10, (a2)
    addi a2, a2, 64
    vrsub.vi v10, v8, -9
    vse64.v v10, (a2)
    addi a2, a2, 64
    vneg.v v10, v8
    vse64.v v10, (a2)
    addi a2, a2, 64
    li t1, 9223372036854775807
    li t2, 3
    mul t3, t1, t2
    addi t4, t1, 1
    la a2, scalars
    sd t3, 0(a2)
    sd t4, 8(a2)

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
a8: .byte 127, -128, -1, 100, 0, 77, -77, 1
b8: .byte 1, -1, 0, 100, 0, -3, 5, -128
    .balign 8
a16: .half 32767, -32768, -1, 30000, 0, 777, -777, 1
b16: .half 1, -1, 0, 30000, 0, -3, 5, -32768
    .balign 8
a32: .word 2147483647, -2147483648, -1, 2000000000, 0, 77777, -77777, 1
b32: .word 1, -1, 0, 2000000000, 0, -3, 5, -2147483648
    .balign 8
a64: .dword 9223372036854775807, -9223372036854775808, -1, 8000000000000000000, 0, 7777777777, -7777777777, 1
b64: .dword 1, -1, 0, 8000000000000000000, 0, -3, 5, -9223372036854775808
    .balign 8
result:
out8: .zero 152
out16: .zero 304
out32: .zero 608
out64: .zero 1216
scalars: .zero 16
result_end:
