# 3-point stencil with slides: y[i] = 0.25 * x[i-1] + 0.5 * x[i] + 0.25 * x[i+1]
# on 16 doubles, with zero boundaries (x[-1] = x[16] = 0).
# The neighbours come from slides (vfslide1up / vfslide1down), which move every
# element one lane over on the ring instead of loading x twice more.
# e64 with LMUL 8 keeps all 16 elements in one register group from VLEN 128 up.
# Output: the 16 results (128 bytes) on standard output.
# AVL is how many elements to filter (1..16, the data's length; x[AVL] counts as 0 once vl < 16).
    .equ    AVL, 16
    .data
    .balign 8
coef:
    .double 0.25, 0.5
x:  .double 4.0, 8.0, 16.0, 8.0, 4.0, 0.0, -4.0, -8.0
    .double -16.0, -8.0, -4.0, 0.0, 2.0, 2.0, 2.0, 2.0
y:  .zero   128

    .text
    la      t2, coef
    fld     fa0, 0(t2)              # 0.25
    fld     fa1, 8(t2)              # 0.5
    fmv.d.x ft0, zero               # boundary value 0.0
    la      a1, x
    la      a2, y
    li      a0, AVL
    vsetvli t0, a0, e64, m8, ta, ma
    vle64.v v8, (a1)                # x
    vfslide1up.vf v16, v8, ft0      # x[i-1]
    vfslide1down.vf v24, v8, ft0    # x[i+1]
    vfadd.vv v16, v16, v24          # x[i-1] + x[i+1]
    vfmul.vf v16, v16, fa0          # * 0.25
    vfmacc.vf v16, fa1, v8          # + 0.5 * x[i]
    vse64.v v16, (a2)

    li      a0, 1                   # write(1, y, 128)
    la      a1, y
    li      a2, 128
    li      a7, 64
    ecall
    li      a0, 0
    li      a7, 93
    ecall
