# saxpy with a ragged tail: y = a * x + y on 19 single-precision elements.
# The loop is strip-mined with vsetvli. At VLEN 128 (e32, m1: VLMAX 4) it runs
# strips of 4, 4, 4, 4 and 3 elements; at the default VLEN 8192 it is a single
# strip of 19 elements, and on 8 lanes lanes 0-2 get 3 elements while lanes 3-7
# get 2: the lanes with fewer elements finish early (the ragged tail).
# Output: the 19 results of y (76 bytes) on standard output.
# AVL is how many elements to update (1..19, the data's length).
    .equ    AVL, 19
    .data
    .balign 8
a:  .float 2.5
x:  .float 1.0, 2.0, 3.0, 4.0, 5.0, 6.0, 7.0, 8.0, 9.0, 10.0
    .float 11.0, 12.0, 13.0, 14.0, 15.0, 16.0, 17.0, 18.0, 19.0
y:  .float 0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5
    .float 0.5, 0.5, 0.5, 0.5, 0.5, -1.0, -1.0, -1.0, -1.0

    .text
    la      t2, a
    flw     fa0, 0(t2)
    la      a1, x
    la      a2, y
    li      a0, AVL                 # elements left
loop:
    vsetvli t0, a0, e32, m1, ta, ma # t0 = vl for this strip
    vle32.v v8, (a1)
    vle32.v v16, (a2)
    vfmacc.vf v16, fa0, v8          # y += a * x
    vse32.v v16, (a2)
    slli    t1, t0, 2               # bytes in this strip
    add     a1, a1, t1
    add     a2, a2, t1
    sub     a0, a0, t0
    bnez    a0, loop

    li      a0, 1                   # write(1, y, 76)
    la      a1, y
    li      a2, 76
    li      a7, 64
    ecall
    li      a0, 0                   # exit(0)
    li      a7, 93
    ecall
