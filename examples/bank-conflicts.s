# Bank conflicts: four accumulating FMAs compete for the register-file ports.
# Each vfmacc.vv beat reads three words (vs2, vs1 and the accumulator vd) and
# writes one, so one FMA a cycle needs four port uses a cycle in every lane.
# The default machine has 6 banks of one port each per lane, and word w of
# physical register p sits in bank (p + w) mod 6: the three reads of one FMA,
# its own write-back and that of the FMA before it keep landing in the same
# bank; one access gets the port (writes first) and the other waits, even
# though the lane is busy. That is a `bank` stall.
# Try it: in Machine > Register file, set "Banks per lane" to 4 and watch the
# bank stalls triple and the run grow by about a fifth; set "Ports per bank"
# to 2 and they all but vanish (8 banks of 2 ports: none at all).
# At the default VLEN 8192, e64 and m1 give vl = 128: 16 elements a lane.
# Output: acc = 16 * x * y = 32 i^2 for i = 0..vl-1, vl doubles on stdout.
# AVL is the vector length asked for (vl = min(AVL, VLMAX)): sweep it on the Sweeps page.
    .equ    AVL, 128
    .data
    .balign 8
acc:
    .zero   AVL*8

    .text
    li      a0, AVL
    vsetvli t0, a0, e64, m1, ta, ma
    vid.v   v1
    vfcvt.f.xu.v v2, v1             # x[i] = i
    vfadd.vv v3, v2, v2             # y[i] = 2i
    vmv.v.i v8, 0                   # four independent accumulators
    vmv.v.i v9, 0
    vmv.v.i v10, 0
    vmv.v.i v11, 0
    li      t1, 4
loop:
    vfmacc.vv v8, v2, v3            # acc += x * y, four times per pass
    vfmacc.vv v9, v2, v3
    vfmacc.vv v10, v2, v3
    vfmacc.vv v11, v2, v3
    addi    t1, t1, -1
    bnez    t1, loop

    vfadd.vv v8, v8, v9             # combine the accumulators
    vfadd.vv v10, v10, v11
    vfadd.vv v8, v8, v10
    la      a1, acc
    vse64.v v8, (a1)

    slli    a2, t0, 3               # write(1, acc, vl * 8)
    li      a0, 1
    li      a7, 64
    ecall
    li      a0, 0                   # exit(0)
    li      a7, 93
    ecall
