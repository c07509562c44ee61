# Ordered versus unordered reduction of the same 32 single-precision values.
# vfredusum.vs (unordered) lets each lane fold its elements into several
# accumulators, then combines the lane partials on the ring; vfredosum.vs
# (ordered) walks the elements one by one from lane to lane, so it takes about
# vl x (FPU latency + ring hop latency) cycles. The values mix large and small
# magnitudes, so a machine that really sums in another order rounds differently;
# both forms sum in element order functionally (as QEMU does).
# e32 with LMUL 8 holds all 32 elements from VLEN 128 up.
# Output: the unordered sum, then the ordered sum (2 floats, 8 bytes).
# AVL is how many values to sum (1..32, the data's length).
    .equ    AVL, 32
    .data
    .balign 8
values:
    .float  16777216.0, 1.0, 1.0, 1.0, -16777216.0, 0.5, 0.25, 3.0
    .float  1000000.0, 0.125, -1000000.0, 2.0, 7.0, 0.75, 1.0, 1.0
    .float  33554432.0, 1.0, 3.0, 1.0, -33554432.0, 0.5, 0.5, 9.0
    .float  1.5, 2.5, 3.5, 4.5, 5.5, 6.5, 7.5, 8.5
sums:
    .zero   8

    .text
    la      a1, values
    la      a2, sums
    li      a0, AVL
    vsetvli t0, a0, e32, m8, ta, ma
    vle32.v v8, (a1)
    vmv.v.i v0, 0                   # v0[0] = 0.0 (all-zero bits), the start value
    vfredusum.vs v16, v8, v0        # unordered
    vfredosum.vs v24, v8, v0        # ordered
    vsetivli zero, 1, e32, m1, ta, ma
    vse32.v v16, (a2)
    addi    a2, a2, 4
    vse32.v v24, (a2)

    li      a0, 1                   # write(1, sums, 8)
    la      a1, sums
    li      a2, 8
    li      a7, 64
    ecall
    li      a0, 0
    li      a7, 93
    ecall
