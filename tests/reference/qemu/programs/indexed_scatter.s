# Indexed accesses: gather 20 words through 16-bit byte offsets (vluxei16),
# scatter them through 32-bit offsets (vsuxei32) and ordered 64-bit offsets
# (vsoxei64, with repeated indices: the last element in order wins), and an
# ordered gather with 8-bit offsets (vloxei8). Some are masked.
    .globl _start
    .text
_start:
    li a0, 20
    vsetvli t0, a0, e32, m2, ta, mu
    la a6, vls
    sd t0, 0(a6)
    la a1, table
    la a2, idx16
    vsetvli t0, a0, e16, m1, ta, mu
    vle16.v v1, (a2)
    vsetvli t0, a0, e32, m2, ta, mu
    vluxei16.v v2, (a1), v1
    la a3, gathered
    vse32.v v2, (a3)
    la a2, idx32
    vle32.v v4, (a2)
    la a3, scattered
    vsuxei32.v v2, (a3), v4
    vsetvli t0, a0, e64, m4, ta, mu
    sd t0, 8(a6)
    la a2, idx64
    vle64.v v8, (a2)
    vsetvli t0, a0, e32, m2, ta, mu
    la a3, ordered
    vsoxei64.v v2, (a3), v8
    vid.v v6
    vmsgtu.vi v0, v6, 5
    la a2, idx8
    vsetvli t0, a0, e8, mf2, ta, mu
    vle8.v v12, (a2)
    vsetvli t0, a0, e32, m2, ta, mu
    vmv.v.i v14, -1
    vloxei8.v v14, (a1), v12, v0.t
    la a3, masked
    vse32.v v14, (a3)

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
table: .word 0, 1007, 2028, 3063, 4112, 5175, 6252, 7343, 8448, 9567, 10700, 11847, 13008, 14183, 15372, 16575, 17792, 19023, 20268, 21527, 22800, 24087, 25388, 26703, 28032, 29375, 30732, 32103, 33488, 34887, 36300, 37727, 39168, 40623, 42092, 43575, 45072, 46583, 48108, 49647, 51200, 52767, 54348, 55943, 57552, 59175, 60812, 62463, 64128, 65807, 67500, 69207, 70928, 72663, 74412, 76175, 77952, 79743, 81548, 83367, 85200, 87047, 88908, 90783
idx16: .half 0, 28, 56, 84, 112, 140, 168, 196, 224, 252, 24, 52, 80, 108, 136, 164, 192, 220, 248, 20
    .balign 8
idx32: .word 0, 12, 24, 36, 48, 60, 72, 4, 16, 28, 40, 52, 64, 76, 8, 20, 32, 44, 56, 68
idx64: .dword 0, 4, 8, 12, 16, 20, 0, 4, 8, 12, 16, 20, 0, 4, 8, 12, 16, 20, 0, 4
idx8: .byte 0, 44, 88, 132, 176, 220, 24, 68, 112, 156, 200, 4, 48, 92, 136, 180, 224, 28, 72, 116
    .balign 8
result:
gathered: .zero 80
scattered: .zero 80
ordered: .zero 24
masked: .zero 80
vls: .zero 16
result_end:
