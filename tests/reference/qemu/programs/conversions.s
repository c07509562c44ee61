# Float/integer conversions with the RISC-V rules: round to nearest even
# (2.5 -> 2, -2.5 -> -2, 3.5 -> 4), saturation out of range, NaN -> the largest
# integer, -inf -> the smallest, negative -> 0 for unsigned; rtz truncates; integer
# to float rounds to nearest even (2^53 + 1 -> 2^53, 2^24 + 1 -> 2^24).
    .globl _start
    .text
_start:
    li a0, 20
    vsetvli t0, a0, e64, m4, ta, ma
    la a1, f64s
    vle64.v v8, (a1)
    la a2, out64
    vfcvt.x.f.v v16, v8
    vse64.v v16, (a2)
    addi a2, a2, 160
    vfcvt.xu.f.v v16, v8
    vse64.v v16, (a2)
    addi a2, a2, 160
    vfcvt.rtz.x.f.v v16, v8
    vse64.v v16, (a2)
    addi a2, a2, 160
    li a0, 20
    vsetvli t0, a0, e32, m2, ta, ma
    la a1, f32s
    vle32.v v8, (a1)
    la a2, out32
    vfcvt.x.f.v v16, v8
    vse32.v v16, (a2)
    addi a2, a2, 80
    vfcvt.xu.f.v v16, v8
    vse32.v v16, (a2)
    addi a2, a2, 80
    vfcvt.rtz.x.f.v v16, v8
    vse32.v v16, (a2)
    addi a2, a2, 80
    li a0, 20
    vsetvli t0, a0, e64, m4, ta, ma
    la a1, i64s
    vle64.v v8, (a1)
    la a2, outi64
    vfcvt.f.x.v v16, v8
    vse64.v v16, (a2)
    addi a2, a2, 160
    vfcvt.f.xu.v v16, v8
    vse64.v v16, (a2)
    addi a2, a2, 160
    li a0, 20
    vsetvli t0, a0, e32, m2, ta, ma
    la a1, i32s
    vle32.v v8, (a1)
    la a2, outi32
    vfcvt.f.x.v v16, v8
    vse32.v v16, (a2)
    addi a2, a2, 80
    vfcvt.f.xu.v v16, v8
    vse32.v v16, (a2)
    addi a2, a2, 80

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
f64s: .dword 0x4004000000000000, 0xC004000000000000, 0x400C000000000000, 0xBFE0000000000000, 0x3FE0000000000000, 0x3FF8000000000000, 0xBFF0000000000000, 0x3FDFFFFFFFFFFFFF, 0x4330000000000001, 0x7E37E43C8800759C, 0xFE37E43C8800759C, 0x43E0000000000000, 0xC3E0000000000000, 0x43F0000000000000, 0x40FE240C9FBE76C9, 0x8000000000000000, 0x7FF8000000000000, 0x7FF0000000000000, 0xFFF0000000000000, 0x7FF0000000000123
f32s: .word 0x40200000, 0xC0200000, 0x40600000, 0xBF000000, 0x3F000000, 0x3FC00000, 0xBF800000, 0x4B800000, 0x4F000000, 0xCF000000, 0x4F800000, 0x7149F2CA, 0xF149F2CA, 0x4B000002, 0x42F6E979, 0x80000000, 0x7FC00000, 0x7F800000, 0xFF800000, 0x7F800001
    .balign 8
i64s: .dword 9007199254740993, 9223372036854775807, -9223372036854775808, -1, 0, 1, -9007199254740993, 18014398509481987, 4611686018427387903, -4611686018427387905, 72057594037927937, 3, -3, 1234567890123456789, -1234567890123456789, 9007199254740995, 2305843009213693953, -2, 1152921504606846977, 576460752303423489
i32s: .word 16777217, 16777219, -1, 2147483647, -2147483648, 0, 1, 33554435, -16777217, 123456789, -123456789, 3, -3, 16777218, 67108867, 2, 268435457, -268435459, 1073741825, 5
    .balign 8
result:
out64: .zero 480
out32: .zero 240
outi64: .zero 320
outi32: .zero 160
result_end:
