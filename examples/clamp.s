# Masked clamp: clamp 20 signed 32-bit samples to the range 0..100.
# Compares write a mask into v0; vmerge then takes the bound where the mask is
# set and keeps the sample where it is clear. vcpop.m counts the samples clamped
# from above: it has a scalar result, so the front end waits for it.
# e32 with LMUL 8 holds all 20 samples in one register group from VLEN 128 up.
# Output: the 20 samples, the first AVL of them clamped, and the count (84 bytes) on standard output.
# AVL is how many samples to clamp (1..20; vl = min(AVL, VLMAX)).
    .equ    AVL, 20
    .data
    .balign 8
samples:
    .word   12, -5, 140, 99, 100, 101, 0, -1, 55, 250
    .word   -300, 7, 64, 128, 3, -64, 100, 42, 1000, 8
count:
    .word   0

    .text
    la      a1, samples
    li      a0, AVL
    li      t2, 100
    vsetvli t0, a0, e32, m8, ta, ma
    vle32.v v8, (a1)
    vmv.v.i v16, 0
    vmslt.vx v0, v8, zero           # mask: samples below 0
    vmerge.vvm v8, v8, v16, v0      # ... become 0
    vmsgt.vx v0, v8, t2             # mask: samples above 100
    vmerge.vxm v8, v8, t2, v0       # ... become 100
    vcpop.m a3, v0                  # how many were above 100
    vse32.v v8, (a1)
    la      a4, count
    sw      a3, 0(a4)

    li      a0, 1                   # write(1, samples, 84)
    la      a1, samples
    li      a2, 84
    li      a7, 64
    ecall
    li      a0, 0
    li      a7, 93
    ecall
