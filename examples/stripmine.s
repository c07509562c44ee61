# Strip-mined loop: z[i] = 3 * x[i] + 7 over 300 64-bit integers.
# The first loop fills x[i] = i (vid.v plus the strip's start index); the second
# is the kernel. With e64 and LMUL 1 at the default VLEN 8192, VLMAX is 128, so
# each loop runs strips of 128, 128 and 44 elements; at VLEN 128 it is 150 strips
# of 2. The last, shorter strip leaves some lanes idle.
# Output: the AVL results of z (2400 bytes for AVL 300) on standard output.
# AVL is the element count (any positive number: the arrays are sized by it).
    .equ    AVL, 300
    .data
    .balign 8
x:  .zero   AVL*8
z:  .zero   AVL*8

    .text
    la      a1, x
    li      a0, AVL                 # elements left
    li      a3, 0                   # index of the strip's first element
fill:
    vsetvli t0, a0, e64, m1, ta, ma
    vid.v   v8
    vadd.vx v8, v8, a3              # x[i] = i
    vse64.v v8, (a1)
    slli    t1, t0, 3
    add     a1, a1, t1
    add     a3, a3, t0
    sub     a0, a0, t0
    bnez    a0, fill

    la      a1, x
    la      a2, z
    li      a0, AVL
    li      t3, 3
kernel:
    vsetvli t0, a0, e64, m1, ta, ma
    vle64.v v8, (a1)
    vmul.vx v16, v8, t3             # 3 * x[i]
    vadd.vi v16, v16, 7             # + 7
    vse64.v v16, (a2)
    slli    t1, t0, 3
    add     a1, a1, t1
    add     a2, a2, t1
    sub     a0, a0, t0
    bnez    a0, kernel

    li      a0, 1                   # write(1, z, AVL * 8)
    la      a1, z
    li      a2, AVL*8
    li      a7, 64
    ecall
    li      a0, 0
    li      a7, 93
    ecall
