# Dot product of two 24-element double-precision vectors.
# Each strip multiplies element-wise (vfmul.vv), then folds the products into a
# running sum held in element 0 of v1 with an unordered reduction
# (vfredusum.vs): lane partials, then the inter-lane phase on the ring.
# All values are small integers, so the sum is exact in any order.
# Output: the dot product as one double (8 bytes) on standard output.
# AVL is how many elements to use (1..24, the data's length).
    .equ    AVL, 24
    .data
    .balign 8
x:  .double 1.0, 2.0, 3.0, 4.0, 5.0, 6.0, 7.0, 8.0
    .double 9.0, 10.0, 11.0, 12.0, 13.0, 14.0, 15.0, 16.0
    .double 17.0, 18.0, 19.0, 20.0, 21.0, 22.0, 23.0, 24.0
y:  .double 2.0, -1.0, 3.0, 1.0, 2.0, -1.0, 3.0, 1.0
    .double 2.0, -1.0, 3.0, 1.0, 2.0, -1.0, 3.0, 1.0
    .double 2.0, -1.0, 3.0, 1.0, 2.0, -1.0, 3.0, 1.0
result:
    .zero   8

    .text
    la      a1, x
    la      a2, y
    li      a0, AVL                 # elements left
    fmv.d.x fa0, zero
    vsetvli t0, a0, e64, m1, ta, ma
    vfmv.s.f v1, fa0                # running sum = 0.0
loop:
    vsetvli t0, a0, e64, m1, ta, ma
    vle64.v v8, (a1)
    vle64.v v16, (a2)
    vfmul.vv v24, v8, v16
    vfredusum.vs v1, v24, v1        # v1[0] += sum of this strip
    slli    t1, t0, 3
    add     a1, a1, t1
    add     a2, a2, t1
    sub     a0, a0, t0
    bnez    a0, loop

    vfmv.f.s fa1, v1                # the front end waits for this scalar
    la      a3, result
    fsd     fa1, 0(a3)

    li      a0, 1                   # write(1, result, 8)
    la      a1, result
    li      a2, 8
    li      a7, 64
    ecall
    li      a0, 0
    li      a7, 93
    ecall
