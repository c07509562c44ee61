# Our own kernels for the ELF reader check: two functions marked with
# .type @function (as compilers mark them), a data label, and a helper that
# is only a label. 32-bit encodings only (no compressed forms).
  .option norvc
  .text
  .globl saxpy
  .type saxpy, @function
saxpy:                       # a0 = n, a1 = x, a2 = y, fa0 = a: y = a*x + y
  vsetvli t0, a0, e64, m1, ta, ma
  vle64.v v0, (a1)
  vle64.v v1, (a2)
  vfmacc.vf v1, fa0, v0
  vse64.v v1, (a2)
  slli t1, t0, 3
  add a1, a1, t1
  add a2, a2, t1
  sub a0, a0, t0
  bnez a0, saxpy
  ret
  .size saxpy, .-saxpy

  .globl dot
  .type dot, @function
dot:                         # a0 = n, a1 = x, a2 = y: fa0 = sum x*y
  vsetvli t0, zero, e64, m1, ta, ma
  vmv.v.i v8, 0
1:
  vsetvli t0, a0, e64, m1, ta, ma
  vle64.v v0, (a1)
  vle64.v v1, (a2)
  vfmul.vv v2, v0, v1
  vfredusum.vs v8, v2, v8
  slli t1, t0, 3
  add a1, a1, t1
  add a2, a2, t1
  sub a0, a0, t0
  bnez a0, 1b
  vfmv.f.s fa0, v8
  ret
  .size dot, .-dot

  .globl scale_table
  .type scale_table, @function
scale_table:                 # refers to data: needs the linker in an object file
  la a1, table
  fld fa0, 0(a1)
  ret
  .size scale_table, .-scale_table

  .data
  .balign 8
table: .double 2.5
