# Slides on 64-bit elements: vslideup/vslidedown by register and immediate
# (including offsets past vl and past VLMAX), vslide1up/vslide1down with x and
# f scalars, and a masked slide that leaves masked-off elements undisturbed.
    .globl _start
    .text
_start:
    li a0, 10
    vsetvli t0, a0, e64, m8, ta, mu
    la a6, vls
    sd t0, 0(a6)
    la a1, src
    vle64.v v8, (a1)
    la a2, out
    vmv.v.i v16, 7
    li a3, 3
    vslideup.vx v16, v8, a3
    vse64.v v16, (a2)
    addi a2, a2, 80
    vmv.v.i v16, 7
    vslidedown.vi v16, v8, 4
    vse64.v v16, (a2)
    addi a2, a2, 80
    li a3, 1000
    vmv.v.i v16, 7
    vslidedown.vx v16, v8, a3
    vse64.v v16, (a2)
    addi a2, a2, 80
    vmv.v.i v16, 7
    vslideup.vi v16, v8, 31
    vse64.v v16, (a2)
    addi a2, a2, 80
    li a4, -77
    vslide1up.vx v16, v8, a4
    vse64.v v16, (a2)
    addi a2, a2, 80
    vslide1down.vx v16, v8, a4
    vse64.v v16, (a2)
    addi a2, a2, 80
    la a5, fval
    fld fa0, 0(a5)
    vfslide1up.vf v16, v8, fa0
    vse64.v v16, (a2)
    addi a2, a2, 80
    vfslide1down.vf v16, v8, fa0
    vse64.v v16, (a2)
    addi a2, a2, 80
    vid.v v24
    vand.vi v24, v24, 1
    vmseq.vi v0, v24, 1
    vmv.v.i v16, -5
    vslidedown.vi v16, v8, 2, v0.t
    vse64.v v16, (a2)
    addi a2, a2, 80
    li a0, 6
    vsetvli t0, a0, e64, m8, ta, mu
    sd t0, 8(a6)
    vmv.v.i v16, 9
    vslidedown.vi v16, v8, 3
    li a0, 10
    vsetvli t0, a0, e64, m8, ta, mu
    vse64.v v16, (a2)

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
src: .dword 111, 222, 333, 444, 555, 666, 777, 888, 999, 1110
fval: .double -0.0
result:
out: .zero 800
vls: .zero 16
result_end:
