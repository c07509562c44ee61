# Strided loads and stores: gather column 1 of a 12 x 3 matrix of doubles
# (stride 24 bytes), store it back reversed with a negative stride, and a
# zero-stride load that broadcasts one word.
    .globl _start
    .text
_start:
    li a0, 12
    vsetvli t0, a0, e64, m4, ta, ma
    la a1, matrix
    addi a1, a1, 8
    li a2, 24
    vlse64.v v4, (a1), a2
    la a3, column
    vse64.v v4, (a3)
    la a4, reversed_end
    addi a4, a4, -8
    li a5, -8
    vsse64.v v4, (a4), a5
    la a6, vls
    sd t0, 0(a6)
    li a0, 9
    vsetvli t0, a0, e32, m2, ta, ma
    sd t0, 8(a6)
    la a1, word
    vlse32.v v8, (a1), zero
    la a3, broadcast
    vse32.v v8, (a3)

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
matrix: .double 0.5, 1.5, 2.5, 10.5, 11.5, 12.5, 20.5, 21.5, 22.5, 30.5, 31.5, 32.5, 40.5, 41.5, 42.5, 50.5, 51.5, 52.5, 60.5, 61.5, 62.5, 70.5, 71.5, 72.5, 80.5, 81.5, 82.5, 90.5, 91.5, 92.5, 100.5, 101.5, 102.5, 110.5, 111.5, 112.5
word: .word 0x5eed1234
    .balign 8
result:
column: .zero 96
reversed: .zero 96
reversed_end:
broadcast: .zero 40
vls: .zero 16
result_end:
