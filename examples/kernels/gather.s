# Kernel gather: y[i] = table[k] + 1.0 with k = (8 i) mod 256, for 256
# doubles, through an indexed load (vluxei64.v with byte offsets 8 k). The
# default machine moves one element of an indexed access a cycle, so the
# gather alone takes at least 256 cycles however many lanes there are.
# table[k] = k, so y[i] = ((8 i) mod 256) + 1: y[0..3] = 1, 9, 17, 25.
    .data
    .balign 8
table: .zero 2048
y:     .zero 2048

    .text
    li      a0, 256
    vsetvli t0, a0, e64, m2, ta, ma # vl 256 at VLEN 8192
    vid.v   v2
    vfcvt.f.xu.v v4, v2             # table[k] = k
    la      a1, table
    vse64.v v4, (a1)
    li      t2, 255
    vsll.vi v6, v2, 3               # 8 i
    vand.vx v6, v6, t2              # k = (8 i) mod 256
    vsll.vi v6, v6, 3               # byte offset 8 k
    vluxei64.v v8, (a1), v6         # the gather
    li      t3, 1
    fcvt.d.l fa0, t3
    vfadd.vf v8, v8, fa0
    la      a2, y
    vse64.v v8, (a2)
