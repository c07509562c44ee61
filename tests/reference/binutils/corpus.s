# Chimeline reference corpus for GNU binutils (riscv64-linux-gnu-as -march=rv64gcv).
# Our own: generated from the instruction table by generate-corpus.ts; no words copied from elsewhere.
.option norvc
.text
back:
# add
  add a0, a1, a2
  add t0, sp, s0
  add x31, t6, zero
# sub
  sub a0, a1, a2
  sub t0, sp, s0
  sub x31, t6, zero
# mul
  mul a0, a1, a2
  mul t0, sp, s0
  mul x31, t6, zero
# and
  and a0, a1, a2
  and t0, sp, s0
  and x31, t6, zero
# or
  or a0, a1, a2
  or t0, sp, s0
  or x31, t6, zero
# xor
  xor a0, a1, a2
  xor t0, sp, s0
  xor x31, t6, zero
# addi
  addi a0, a1, 0
  addi t0, sp, -2048
  addi x31, t6, 2047
# andi
  andi a0, a1, 0
  andi t0, sp, -2048
  andi x31, t6, 2047
# ori
  ori a0, a1, 0
  ori t0, sp, -2048
  ori x31, t6, 2047
# slli
  slli a0, a1, 1
  slli t0, sp, 63
  slli x31, t6, 0
# srli
  srli a0, a1, 1
  srli t0, sp, 63
  srli x31, t6, 0
# srai
  srai a0, a1, 1
  srai t0, sp, 63
  srai x31, t6, 0
# lui
  lui a0, 0x12345
  lui t0, 0xfffff
  lui x31, 0
# auipc
  auipc a0, 0x12345
  auipc t0, 0xfffff
  auipc x31, 0
# beq
  beq a1, a2, back
  beq sp, s0, fwd
  beq t6, zero, back
# bne
  bne a1, a2, back
  bne sp, s0, fwd
  bne t6, zero, back
# blt
  blt a1, a2, back
  blt sp, s0, fwd
  blt t6, zero, back
# bge
  bge a1, a2, back
  bge sp, s0, fwd
  bge t6, zero, back
# bltu
  bltu a1, a2, back
  bltu sp, s0, fwd
  bltu t6, zero, back
# bgeu
  bgeu a1, a2, back
  bgeu sp, s0, fwd
  bgeu t6, zero, back
# jal
  jal a0, back
  jal t0, fwd
  jal x31, back
# jalr
  jalr a0, 8(a1)
  jalr t0, -2048(sp)
  jalr x31, 2047(t6)
# ld
  ld a0, 8(a1)
  ld t0, -2048(sp)
  ld x31, 2047(t6)
# lw
  lw a0, 8(a1)
  lw t0, -2048(sp)
  lw x31, 2047(t6)
# sd
  sd a2, 8(a1)
  sd s0, -2048(sp)
  sd zero, 2047(t6)
# sw
  sw a2, 8(a1)
  sw s0, -2048(sp)
  sw zero, 2047(t6)
# fld
  fld fa0, 8(a1)
  fld ft11, -2048(sp)
  fld f8, 2047(t6)
# flw
  flw fa0, 8(a1)
  flw ft11, -2048(sp)
  flw f8, 2047(t6)
# fsd
  fsd fa2, 8(a1)
  fsd f31, -2048(sp)
  fsd fs1, 2047(t6)
# fsw
  fsw fa2, 8(a1)
  fsw f31, -2048(sp)
  fsw fs1, 2047(t6)
# fmv.d.x
  fmv.d.x fa0, a1
  fmv.d.x ft11, sp
  fmv.d.x f8, t6
# fmv.x.d
  fmv.x.d a0, fa1
  fmv.x.d t0, ft0
  fmv.x.d x31, fs11
# ecall
  ecall
# vle8.v
  vle8.v v1, (a1)
  vle8.v v24, (sp), v0.t
  vle8.v v31, (t6)
# vse8.v
  vse8.v v1, (a1)
  vse8.v v24, (sp), v0.t
  vse8.v v31, (t6)
# vlse8.v
  vlse8.v v1, (a1), a2
  vlse8.v v24, (sp), s0, v0.t
  vlse8.v v31, (t6), zero
# vsse8.v
  vsse8.v v1, (a1), a2
  vsse8.v v24, (sp), s0, v0.t
  vsse8.v v31, (t6), zero
# vluxei8.v
  vluxei8.v v1, (a1), v2
  vluxei8.v v24, (sp), v16, v0.t
  vluxei8.v v31, (t6), v30
# vsuxei8.v
  vsuxei8.v v1, (a1), v2
  vsuxei8.v v24, (sp), v16, v0.t
  vsuxei8.v v31, (t6), v30
# vloxei8.v
  vloxei8.v v1, (a1), v2
  vloxei8.v v24, (sp), v16, v0.t
  vloxei8.v v31, (t6), v30
# vsoxei8.v
  vsoxei8.v v1, (a1), v2
  vsoxei8.v v24, (sp), v16, v0.t
  vsoxei8.v v31, (t6), v30
# vle16.v
  vle16.v v1, (a1)
  vle16.v v24, (sp), v0.t
  vle16.v v31, (t6)
# vse16.v
  vse16.v v1, (a1)
  vse16.v v24, (sp), v0.t
  vse16.v v31, (t6)
# vlse16.v
  vlse16.v v1, (a1), a2
  vlse16.v v24, (sp), s0, v0.t
  vlse16.v v31, (t6), zero
# vsse16.v
  vsse16.v v1, (a1), a2
  vsse16.v v24, (sp), s0, v0.t
  vsse16.v v31, (t6), zero
# vluxei16.v
  vluxei16.v v1, (a1), v2
  vluxei16.v v24, (sp), v16, v0.t
  vluxei16.v v31, (t6), v30
# vsuxei16.v
  vsuxei16.v v1, (a1), v2
  vsuxei16.v v24, (sp), v16, v0.t
  vsuxei16.v v31, (t6), v30
# vloxei16.v
  vloxei16.v v1, (a1), v2
  vloxei16.v v24, (sp), v16, v0.t
  vloxei16.v v31, (t6), v30
# vsoxei16.v
  vsoxei16.v v1, (a1), v2
  vsoxei16.v v24, (sp), v16, v0.t
  vsoxei16.v v31, (t6), v30
# vle32.v
  vle32.v v1, (a1)
  vle32.v v24, (sp), v0.t
  vle32.v v31, (t6)
# vse32.v
  vse32.v v1, (a1)
  vse32.v v24, (sp), v0.t
  vse32.v v31, (t6)
# vlse32.v
  vlse32.v v1, (a1), a2
  vlse32.v v24, (sp), s0, v0.t
  vlse32.v v31, (t6), zero
# vsse32.v
  vsse32.v v1, (a1), a2
  vsse32.v v24, (sp), s0, v0.t
  vsse32.v v31, (t6), zero
# vluxei32.v
  vluxei32.v v1, (a1), v2
  vluxei32.v v24, (sp), v16, v0.t
  vluxei32.v v31, (t6), v30
# vsuxei32.v
  vsuxei32.v v1, (a1), v2
  vsuxei32.v v24, (sp), v16, v0.t
  vsuxei32.v v31, (t6), v30
# vloxei32.v
  vloxei32.v v1, (a1), v2
  vloxei32.v v24, (sp), v16, v0.t
  vloxei32.v v31, (t6), v30
# vsoxei32.v
  vsoxei32.v v1, (a1), v2
  vsoxei32.v v24, (sp), v16, v0.t
  vsoxei32.v v31, (t6), v30
# vle64.v
  vle64.v v1, (a1)
  vle64.v v24, (sp), v0.t
  vle64.v v31, (t6)
# vse64.v
  vse64.v v1, (a1)
  vse64.v v24, (sp), v0.t
  vse64.v v31, (t6)
# vlse64.v
  vlse64.v v1, (a1), a2
  vlse64.v v24, (sp), s0, v0.t
  vlse64.v v31, (t6), zero
# vsse64.v
  vsse64.v v1, (a1), a2
  vsse64.v v24, (sp), s0, v0.t
  vsse64.v v31, (t6), zero
# vluxei64.v
  vluxei64.v v1, (a1), v2
  vluxei64.v v24, (sp), v16, v0.t
  vluxei64.v v31, (t6), v30
# vsuxei64.v
  vsuxei64.v v1, (a1), v2
  vsuxei64.v v24, (sp), v16, v0.t
  vsuxei64.v v31, (t6), v30
# vloxei64.v
  vloxei64.v v1, (a1), v2
  vloxei64.v v24, (sp), v16, v0.t
  vloxei64.v v31, (t6), v30
# vsoxei64.v
  vsoxei64.v v1, (a1), v2
  vsoxei64.v v24, (sp), v16, v0.t
  vsoxei64.v v31, (t6), v30
# vlm.v
  vlm.v v1, (a1)
  vlm.v v24, (sp)
  vlm.v v31, (t6)
# vsm.v
  vsm.v v1, (a1)
  vsm.v v24, (sp)
  vsm.v v31, (t6)
# vadd.vv
  vadd.vv v1, v2, v3
  vadd.vv v24, v16, v8, v0.t
  vadd.vv v31, v30, v29
# vadd.vx
  vadd.vx v1, v2, a1
  vadd.vx v24, v16, sp, v0.t
  vadd.vx v31, v30, t6
# vadd.vi
  vadd.vi v1, v2, 5
  vadd.vi v24, v16, -16, v0.t
  vadd.vi v31, v30, 15
# vsub.vv
  vsub.vv v1, v2, v3
  vsub.vv v24, v16, v8, v0.t
  vsub.vv v31, v30, v29
# vsub.vx
  vsub.vx v1, v2, a1
  vsub.vx v24, v16, sp, v0.t
  vsub.vx v31, v30, t6
# vrsub.vx
  vrsub.vx v1, v2, a1
  vrsub.vx v24, v16, sp, v0.t
  vrsub.vx v31, v30, t6
# vrsub.vi
  vrsub.vi v1, v2, 5
  vrsub.vi v24, v16, -16, v0.t
  vrsub.vi v31, v30, 15
# vminu.vv
  vminu.vv v1, v2, v3
  vminu.vv v24, v16, v8, v0.t
  vminu.vv v31, v30, v29
# vminu.vx
  vminu.vx v1, v2, a1
  vminu.vx v24, v16, sp, v0.t
  vminu.vx v31, v30, t6
# vmin.vv
  vmin.vv v1, v2, v3
  vmin.vv v24, v16, v8, v0.t
  vmin.vv v31, v30, v29
# vmin.vx
  vmin.vx v1, v2, a1
  vmin.vx v24, v16, sp, v0.t
  vmin.vx v31, v30, t6
# vmaxu.vv
  vmaxu.vv v1, v2, v3
  vmaxu.vv v24, v16, v8, v0.t
  vmaxu.vv v31, v30, v29
# vmaxu.vx
  vmaxu.vx v1, v2, a1
  vmaxu.vx v24, v16, sp, v0.t
  vmaxu.vx v31, v30, t6
# vmax.vv
  vmax.vv v1, v2, v3
  vmax.vv v24, v16, v8, v0.t
  vmax.vv v31, v30, v29
# vmax.vx
  vmax.vx v1, v2, a1
  vmax.vx v24, v16, sp, v0.t
  vmax.vx v31, v30, t6
# vand.vv
  vand.vv v1, v2, v3
  vand.vv v24, v16, v8, v0.t
  vand.vv v31, v30, v29
# vand.vx
  vand.vx v1, v2, a1
  vand.vx v24, v16, sp, v0.t
  vand.vx v31, v30, t6
# vand.vi
  vand.vi v1, v2, 5
  vand.vi v24, v16, -16, v0.t
  vand.vi v31, v30, 15
# vor.vv
  vor.vv v1, v2, v3
  vor.vv v24, v16, v8, v0.t
  vor.vv v31, v30, v29
# vor.vx
  vor.vx v1, v2, a1
  vor.vx v24, v16, sp, v0.t
  vor.vx v31, v30, t6
# vor.vi
  vor.vi v1, v2, 5
  vor.vi v24, v16, -16, v0.t
  vor.vi v31, v30, 15
# vxor.vv
  vxor.vv v1, v2, v3
  vxor.vv v24, v16, v8, v0.t
  vxor.vv v31, v30, v29
# vxor.vx
  vxor.vx v1, v2, a1
  vxor.vx v24, v16, sp, v0.t
  vxor.vx v31, v30, t6
# vxor.vi
  vxor.vi v1, v2, 5
  vxor.vi v24, v16, -16, v0.t
  vxor.vi v31, v30, 15
# vsll.vv
  vsll.vv v1, v2, v3
  vsll.vv v24, v16, v8, v0.t
  vsll.vv v31, v30, v29
# vsll.vx
  vsll.vx v1, v2, a1
  vsll.vx v24, v16, sp, v0.t
  vsll.vx v31, v30, t6
# vsll.vi
  vsll.vi v1, v2, 0
  vsll.vi v24, v16, 31, v0.t
  vsll.vi v31, v30, 7
# vsrl.vv
  vsrl.vv v1, v2, v3
  vsrl.vv v24, v16, v8, v0.t
  vsrl.vv v31, v30, v29
# vsrl.vx
  vsrl.vx v1, v2, a1
  vsrl.vx v24, v16, sp, v0.t
  vsrl.vx v31, v30, t6
# vsrl.vi
  vsrl.vi v1, v2, 0
  vsrl.vi v24, v16, 31, v0.t
  vsrl.vi v31, v30, 7
# vsra.vv
  vsra.vv v1, v2, v3
  vsra.vv v24, v16, v8, v0.t
  vsra.vv v31, v30, v29
# vsra.vx
  vsra.vx v1, v2, a1
  vsra.vx v24, v16, sp, v0.t
  vsra.vx v31, v30, t6
# vsra.vi
  vsra.vi v1, v2, 0
  vsra.vi v24, v16, 31, v0.t
  vsra.vi v31, v30, 7
# vmulhu.vv
  vmulhu.vv v1, v2, v3
  vmulhu.vv v24, v16, v8, v0.t
  vmulhu.vv v31, v30, v29
# vmulhu.vx
  vmulhu.vx v1, v2, a1
  vmulhu.vx v24, v16, sp, v0.t
  vmulhu.vx v31, v30, t6
# vmul.vv
  vmul.vv v1, v2, v3
  vmul.vv v24, v16, v8, v0.t
  vmul.vv v31, v30, v29
# vmul.vx
  vmul.vx v1, v2, a1
  vmul.vx v24, v16, sp, v0.t
  vmul.vx v31, v30, t6
# vmulh.vv
  vmulh.vv v1, v2, v3
  vmulh.vv v24, v16, v8, v0.t
  vmulh.vv v31, v30, v29
# vmulh.vx
  vmulh.vx v1, v2, a1
  vmulh.vx v24, v16, sp, v0.t
  vmulh.vx v31, v30, t6
# vdivu.vv
  vdivu.vv v1, v2, v3
  vdivu.vv v24, v16, v8, v0.t
  vdivu.vv v31, v30, v29
# vdivu.vx
  vdivu.vx v1, v2, a1
  vdivu.vx v24, v16, sp, v0.t
  vdivu.vx v31, v30, t6
# vdiv.vv
  vdiv.vv v1, v2, v3
  vdiv.vv v24, v16, v8, v0.t
  vdiv.vv v31, v30, v29
# vdiv.vx
  vdiv.vx v1, v2, a1
  vdiv.vx v24, v16, sp, v0.t
  vdiv.vx v31, v30, t6
# vremu.vv
  vremu.vv v1, v2, v3
  vremu.vv v24, v16, v8, v0.t
  vremu.vv v31, v30, v29
# vremu.vx
  vremu.vx v1, v2, a1
  vremu.vx v24, v16, sp, v0.t
  vremu.vx v31, v30, t6
# vrem.vv
  vrem.vv v1, v2, v3
  vrem.vv v24, v16, v8, v0.t
  vrem.vv v31, v30, v29
# vrem.vx
  vrem.vx v1, v2, a1
  vrem.vx v24, v16, sp, v0.t
  vrem.vx v31, v30, t6
# vmadd.vv
  vmadd.vv v1, v3, v2
  vmadd.vv v24, v8, v16, v0.t
  vmadd.vv v31, v29, v30
# vmadd.vx
  vmadd.vx v1, a1, v2
  vmadd.vx v24, sp, v16, v0.t
  vmadd.vx v31, t6, v30
# vnmsub.vv
  vnmsub.vv v1, v3, v2
  vnmsub.vv v24, v8, v16, v0.t
  vnmsub.vv v31, v29, v30
# vnmsub.vx
  vnmsub.vx v1, a1, v2
  vnmsub.vx v24, sp, v16, v0.t
  vnmsub.vx v31, t6, v30
# vmacc.vv
  vmacc.vv v1, v3, v2
  vmacc.vv v24, v8, v16, v0.t
  vmacc.vv v31, v29, v30
# vmacc.vx
  vmacc.vx v1, a1, v2
  vmacc.vx v24, sp, v16, v0.t
  vmacc.vx v31, t6, v30
# vnmsac.vv
  vnmsac.vv v1, v3, v2
  vnmsac.vv v24, v8, v16, v0.t
  vnmsac.vv v31, v29, v30
# vnmsac.vx
  vnmsac.vx v1, a1, v2
  vnmsac.vx v24, sp, v16, v0.t
  vnmsac.vx v31, t6, v30
# vmerge.vvm
  vmerge.vvm v1, v2, v3, v0
  vmerge.vvm v24, v16, v8, v0
  vmerge.vvm v31, v30, v29, v0
# vmerge.vxm
  vmerge.vxm v1, v2, a1, v0
  vmerge.vxm v24, v16, sp, v0
  vmerge.vxm v31, v30, t6, v0
# vmerge.vim
  vmerge.vim v1, v2, 5, v0
  vmerge.vim v24, v16, -16, v0
  vmerge.vim v31, v30, 15, v0
# vid.v
  vid.v v1
  vid.v v24, v0.t
  vid.v v31
# vmseq.vv
  vmseq.vv v1, v2, v3
  vmseq.vv v24, v16, v8, v0.t
  vmseq.vv v31, v30, v29
# vmseq.vx
  vmseq.vx v1, v2, a1
  vmseq.vx v24, v16, sp, v0.t
  vmseq.vx v31, v30, t6
# vmseq.vi
  vmseq.vi v1, v2, 5
  vmseq.vi v24, v16, -16, v0.t
  vmseq.vi v31, v30, 15
# vmsne.vv
  vmsne.vv v1, v2, v3
  vmsne.vv v24, v16, v8, v0.t
  vmsne.vv v31, v30, v29
# vmsne.vx
  vmsne.vx v1, v2, a1
  vmsne.vx v24, v16, sp, v0.t
  vmsne.vx v31, v30, t6
# vmsne.vi
  vmsne.vi v1, v2, 5
  vmsne.vi v24, v16, -16, v0.t
  vmsne.vi v31, v30, 15
# vmsltu.vv
  vmsltu.vv v1, v2, v3
  vmsltu.vv v24, v16, v8, v0.t
  vmsltu.vv v31, v30, v29
# vmsltu.vx
  vmsltu.vx v1, v2, a1
  vmsltu.vx v24, v16, sp, v0.t
  vmsltu.vx v31, v30, t6
# vmslt.vv
  vmslt.vv v1, v2, v3
  vmslt.vv v24, v16, v8, v0.t
  vmslt.vv v31, v30, v29
# vmslt.vx
  vmslt.vx v1, v2, a1
  vmslt.vx v24, v16, sp, v0.t
  vmslt.vx v31, v30, t6
# vmsleu.vv
  vmsleu.vv v1, v2, v3
  vmsleu.vv v24, v16, v8, v0.t
  vmsleu.vv v31, v30, v29
# vmsleu.vx
  vmsleu.vx v1, v2, a1
  vmsleu.vx v24, v16, sp, v0.t
  vmsleu.vx v31, v30, t6
# vmsleu.vi
  vmsleu.vi v1, v2, 5
  vmsleu.vi v24, v16, -16, v0.t
  vmsleu.vi v31, v30, 15
# vmsle.vv
  vmsle.vv v1, v2, v3
  vmsle.vv v24, v16, v8, v0.t
  vmsle.vv v31, v30, v29
# vmsle.vx
  vmsle.vx v1, v2, a1
  vmsle.vx v24, v16, sp, v0.t
  vmsle.vx v31, v30, t6
# vmsle.vi
  vmsle.vi v1, v2, 5
  vmsle.vi v24, v16, -16, v0.t
  vmsle.vi v31, v30, 15
# vmsgtu.vx
  vmsgtu.vx v1, v2, a1
  vmsgtu.vx v24, v16, sp, v0.t
  vmsgtu.vx v31, v30, t6
# vmsgtu.vi
  vmsgtu.vi v1, v2, 5
  vmsgtu.vi v24, v16, -16, v0.t
  vmsgtu.vi v31, v30, 15
# vmsgt.vx
  vmsgt.vx v1, v2, a1
  vmsgt.vx v24, v16, sp, v0.t
  vmsgt.vx v31, v30, t6
# vmsgt.vi
  vmsgt.vi v1, v2, 5
  vmsgt.vi v24, v16, -16, v0.t
  vmsgt.vi v31, v30, 15
# vmandn.mm
  vmandn.mm v1, v2, v3
  vmandn.mm v24, v16, v8
  vmandn.mm v31, v30, v29
# vmand.mm
  vmand.mm v1, v2, v3
  vmand.mm v24, v16, v8
  vmand.mm v31, v30, v29
# vmor.mm
  vmor.mm v1, v2, v3
  vmor.mm v24, v16, v8
  vmor.mm v31, v30, v29
# vmxor.mm
  vmxor.mm v1, v2, v3
  vmxor.mm v24, v16, v8
  vmxor.mm v31, v30, v29
# vmorn.mm
  vmorn.mm v1, v2, v3
  vmorn.mm v24, v16, v8
  vmorn.mm v31, v30, v29
# vmnand.mm
  vmnand.mm v1, v2, v3
  vmnand.mm v24, v16, v8
  vmnand.mm v31, v30, v29
# vmnor.mm
  vmnor.mm v1, v2, v3
  vmnor.mm v24, v16, v8
  vmnor.mm v31, v30, v29
# vmxnor.mm
  vmxnor.mm v1, v2, v3
  vmxnor.mm v24, v16, v8
  vmxnor.mm v31, v30, v29
# vcpop.m
  vcpop.m a0, v2
  vcpop.m t0, v16, v0.t
  vcpop.m x31, v30
# vfirst.m
  vfirst.m a0, v2
  vfirst.m t0, v16, v0.t
  vfirst.m x31, v30
# vmsbf.m
  vmsbf.m v1, v2
  vmsbf.m v24, v16, v0.t
  vmsbf.m v31, v30
# vmsof.m
  vmsof.m v1, v2
  vmsof.m v24, v16, v0.t
  vmsof.m v31, v30
# vmsif.m
  vmsif.m v1, v2
  vmsif.m v24, v16, v0.t
  vmsif.m v31, v30
# viota.m
  viota.m v1, v2
  viota.m v24, v16, v0.t
  viota.m v31, v30
# vfadd.vv
  vfadd.vv v1, v2, v3
  vfadd.vv v24, v16, v8, v0.t
  vfadd.vv v31, v30, v29
# vfadd.vf
  vfadd.vf v1, v2, fa1
  vfadd.vf v24, v16, ft0, v0.t
  vfadd.vf v31, v30, fs11
# vfsub.vv
  vfsub.vv v1, v2, v3
  vfsub.vv v24, v16, v8, v0.t
  vfsub.vv v31, v30, v29
# vfsub.vf
  vfsub.vf v1, v2, fa1
  vfsub.vf v24, v16, ft0, v0.t
  vfsub.vf v31, v30, fs11
# vfrsub.vf
  vfrsub.vf v1, v2, fa1
  vfrsub.vf v24, v16, ft0, v0.t
  vfrsub.vf v31, v30, fs11
# vfmul.vv
  vfmul.vv v1, v2, v3
  vfmul.vv v24, v16, v8, v0.t
  vfmul.vv v31, v30, v29
# vfmul.vf
  vfmul.vf v1, v2, fa1
  vfmul.vf v24, v16, ft0, v0.t
  vfmul.vf v31, v30, fs11
# vfdiv.vv
  vfdiv.vv v1, v2, v3
  vfdiv.vv v24, v16, v8, v0.t
  vfdiv.vv v31, v30, v29
# vfdiv.vf
  vfdiv.vf v1, v2, fa1
  vfdiv.vf v24, v16, ft0, v0.t
  vfdiv.vf v31, v30, fs11
# vfrdiv.vf
  vfrdiv.vf v1, v2, fa1
  vfrdiv.vf v24, v16, ft0, v0.t
  vfrdiv.vf v31, v30, fs11
# vfmin.vv
  vfmin.vv v1, v2, v3
  vfmin.vv v24, v16, v8, v0.t
  vfmin.vv v31, v30, v29
# vfmin.vf
  vfmin.vf v1, v2, fa1
  vfmin.vf v24, v16, ft0, v0.t
  vfmin.vf v31, v30, fs11
# vfmax.vv
  vfmax.vv v1, v2, v3
  vfmax.vv v24, v16, v8, v0.t
  vfmax.vv v31, v30, v29
# vfmax.vf
  vfmax.vf v1, v2, fa1
  vfmax.vf v24, v16, ft0, v0.t
  vfmax.vf v31, v30, fs11
# vfsgnj.vv
  vfsgnj.vv v1, v2, v3
  vfsgnj.vv v24, v16, v8, v0.t
  vfsgnj.vv v31, v30, v29
# vfsgnj.vf
  vfsgnj.vf v1, v2, fa1
  vfsgnj.vf v24, v16, ft0, v0.t
  vfsgnj.vf v31, v30, fs11
# vfsgnjn.vv
  vfsgnjn.vv v1, v2, v3
  vfsgnjn.vv v24, v16, v8, v0.t
  vfsgnjn.vv v31, v30, v29
# vfsgnjn.vf
  vfsgnjn.vf v1, v2, fa1
  vfsgnjn.vf v24, v16, ft0, v0.t
  vfsgnjn.vf v31, v30, fs11
# vfsgnjx.vv
  vfsgnjx.vv v1, v2, v3
  vfsgnjx.vv v24, v16, v8, v0.t
  vfsgnjx.vv v31, v30, v29
# vfsgnjx.vf
  vfsgnjx.vf v1, v2, fa1
  vfsgnjx.vf v24, v16, ft0, v0.t
  vfsgnjx.vf v31, v30, fs11
# vfmadd.vv
  vfmadd.vv v1, v3, v2
  vfmadd.vv v24, v8, v16, v0.t
  vfmadd.vv v31, v29, v30
# vfmadd.vf
  vfmadd.vf v1, fa1, v2
  vfmadd.vf v24, ft0, v16, v0.t
  vfmadd.vf v31, fs11, v30
# vfnmadd.vv
  vfnmadd.vv v1, v3, v2
  vfnmadd.vv v24, v8, v16, v0.t
  vfnmadd.vv v31, v29, v30
# vfnmadd.vf
  vfnmadd.vf v1, fa1, v2
  vfnmadd.vf v24, ft0, v16, v0.t
  vfnmadd.vf v31, fs11, v30
# vfmsub.vv
  vfmsub.vv v1, v3, v2
  vfmsub.vv v24, v8, v16, v0.t
  vfmsub.vv v31, v29, v30
# vfmsub.vf
  vfmsub.vf v1, fa1, v2
  vfmsub.vf v24, ft0, v16, v0.t
  vfmsub.vf v31, fs11, v30
# vfnmsub.vv
  vfnmsub.vv v1, v3, v2
  vfnmsub.vv v24, v8, v16, v0.t
  vfnmsub.vv v31, v29, v30
# vfnmsub.vf
  vfnmsub.vf v1, fa1, v2
  vfnmsub.vf v24, ft0, v16, v0.t
  vfnmsub.vf v31, fs11, v30
# vfmacc.vv
  vfmacc.vv v1, v3, v2
  vfmacc.vv v24, v8, v16, v0.t
  vfmacc.vv v31, v29, v30
# vfmacc.vf
  vfmacc.vf v1, fa1, v2
  vfmacc.vf v24, ft0, v16, v0.t
  vfmacc.vf v31, fs11, v30
# vfnmacc.vv
  vfnmacc.vv v1, v3, v2
  vfnmacc.vv v24, v8, v16, v0.t
  vfnmacc.vv v31, v29, v30
# vfnmacc.vf
  vfnmacc.vf v1, fa1, v2
  vfnmacc.vf v24, ft0, v16, v0.t
  vfnmacc.vf v31, fs11, v30
# vfmsac.vv
  vfmsac.vv v1, v3, v2
  vfmsac.vv v24, v8, v16, v0.t
  vfmsac.vv v31, v29, v30
# vfmsac.vf
  vfmsac.vf v1, fa1, v2
  vfmsac.vf v24, ft0, v16, v0.t
  vfmsac.vf v31, fs11, v30
# vfnmsac.vv
  vfnmsac.vv v1, v3, v2
  vfnmsac.vv v24, v8, v16, v0.t
  vfnmsac.vv v31, v29, v30
# vfnmsac.vf
  vfnmsac.vf v1, fa1, v2
  vfnmsac.vf v24, ft0, v16, v0.t
  vfnmsac.vf v31, fs11, v30
# vfsqrt.v
  vfsqrt.v v1, v2
  vfsqrt.v v24, v16, v0.t
  vfsqrt.v v31, v30
# vfcvt.xu.f.v
  vfcvt.xu.f.v v1, v2
  vfcvt.xu.f.v v24, v16, v0.t
  vfcvt.xu.f.v v31, v30
# vfcvt.x.f.v
  vfcvt.x.f.v v1, v2
  vfcvt.x.f.v v24, v16, v0.t
  vfcvt.x.f.v v31, v30
# vfcvt.f.xu.v
  vfcvt.f.xu.v v1, v2
  vfcvt.f.xu.v v24, v16, v0.t
  vfcvt.f.xu.v v31, v30
# vfcvt.f.x.v
  vfcvt.f.x.v v1, v2
  vfcvt.f.x.v v24, v16, v0.t
  vfcvt.f.x.v v31, v30
# vfcvt.rtz.x.f.v
  vfcvt.rtz.x.f.v v1, v2
  vfcvt.rtz.x.f.v v24, v16, v0.t
  vfcvt.rtz.x.f.v v31, v30
# vmfeq.vv
  vmfeq.vv v1, v2, v3
  vmfeq.vv v24, v16, v8, v0.t
  vmfeq.vv v31, v30, v29
# vmfeq.vf
  vmfeq.vf v1, v2, fa1
  vmfeq.vf v24, v16, ft0, v0.t
  vmfeq.vf v31, v30, fs11
# vmfle.vv
  vmfle.vv v1, v2, v3
  vmfle.vv v24, v16, v8, v0.t
  vmfle.vv v31, v30, v29
# vmfle.vf
  vmfle.vf v1, v2, fa1
  vmfle.vf v24, v16, ft0, v0.t
  vmfle.vf v31, v30, fs11
# vmflt.vv
  vmflt.vv v1, v2, v3
  vmflt.vv v24, v16, v8, v0.t
  vmflt.vv v31, v30, v29
# vmflt.vf
  vmflt.vf v1, v2, fa1
  vmflt.vf v24, v16, ft0, v0.t
  vmflt.vf v31, v30, fs11
# vmfne.vv
  vmfne.vv v1, v2, v3
  vmfne.vv v24, v16, v8, v0.t
  vmfne.vv v31, v30, v29
# vmfne.vf
  vmfne.vf v1, v2, fa1
  vmfne.vf v24, v16, ft0, v0.t
  vmfne.vf v31, v30, fs11
# vmfgt.vf
  vmfgt.vf v1, v2, fa1
  vmfgt.vf v24, v16, ft0, v0.t
  vmfgt.vf v31, v30, fs11
# vmfge.vf
  vmfge.vf v1, v2, fa1
  vmfge.vf v24, v16, ft0, v0.t
  vmfge.vf v31, v30, fs11
# vfmerge.vfm
  vfmerge.vfm v1, v2, fa1, v0
  vfmerge.vfm v24, v16, ft0, v0
  vfmerge.vfm v31, v30, fs11, v0
# vmv.v.v
  vmv.v.v v1, v3
  vmv.v.v v24, v8
  vmv.v.v v31, v29
# vmv.v.x
  vmv.v.x v1, a1
  vmv.v.x v24, sp
  vmv.v.x v31, t6
# vmv.v.i
  vmv.v.i v1, 5
  vmv.v.i v24, -16
  vmv.v.i v31, 15
# vfmv.v.f
  vfmv.v.f v1, fa1
  vfmv.v.f v24, ft0
  vfmv.v.f v31, fs11
# vmv.x.s
  vmv.x.s a0, v2
  vmv.x.s t0, v16
  vmv.x.s x31, v30
# vfmv.f.s
  vfmv.f.s fa0, v2
  vfmv.f.s ft11, v16
  vfmv.f.s f8, v30
# vmv.s.x
  vmv.s.x v1, a1
  vmv.s.x v24, sp
  vmv.s.x v31, t6
# vfmv.s.f
  vfmv.s.f v1, fa1
  vfmv.s.f v24, ft0
  vfmv.s.f v31, fs11
# vredsum.vs
  vredsum.vs v1, v2, v3
  vredsum.vs v24, v16, v8, v0.t
  vredsum.vs v31, v30, v29
# vredand.vs
  vredand.vs v1, v2, v3
  vredand.vs v24, v16, v8, v0.t
  vredand.vs v31, v30, v29
# vredor.vs
  vredor.vs v1, v2, v3
  vredor.vs v24, v16, v8, v0.t
  vredor.vs v31, v30, v29
# vredxor.vs
  vredxor.vs v1, v2, v3
  vredxor.vs v24, v16, v8, v0.t
  vredxor.vs v31, v30, v29
# vredminu.vs
  vredminu.vs v1, v2, v3
  vredminu.vs v24, v16, v8, v0.t
  vredminu.vs v31, v30, v29
# vredmin.vs
  vredmin.vs v1, v2, v3
  vredmin.vs v24, v16, v8, v0.t
  vredmin.vs v31, v30, v29
# vredmaxu.vs
  vredmaxu.vs v1, v2, v3
  vredmaxu.vs v24, v16, v8, v0.t
  vredmaxu.vs v31, v30, v29
# vredmax.vs
  vredmax.vs v1, v2, v3
  vredmax.vs v24, v16, v8, v0.t
  vredmax.vs v31, v30, v29
# vfredusum.vs
  vfredusum.vs v1, v2, v3
  vfredusum.vs v24, v16, v8, v0.t
  vfredusum.vs v31, v30, v29
# vfredosum.vs
  vfredosum.vs v1, v2, v3
  vfredosum.vs v24, v16, v8, v0.t
  vfredosum.vs v31, v30, v29
# vfredmin.vs
  vfredmin.vs v1, v2, v3
  vfredmin.vs v24, v16, v8, v0.t
  vfredmin.vs v31, v30, v29
# vfredmax.vs
  vfredmax.vs v1, v2, v3
  vfredmax.vs v24, v16, v8, v0.t
  vfredmax.vs v31, v30, v29
# vslideup.vx
  vslideup.vx v1, v2, a1
  vslideup.vx v24, v16, sp, v0.t
  vslideup.vx v31, v30, t6
# vslideup.vi
  vslideup.vi v1, v2, 0
  vslideup.vi v24, v16, 31, v0.t
  vslideup.vi v31, v30, 7
# vslidedown.vx
  vslidedown.vx v1, v2, a1
  vslidedown.vx v24, v16, sp, v0.t
  vslidedown.vx v31, v30, t6
# vslidedown.vi
  vslidedown.vi v1, v2, 0
  vslidedown.vi v24, v16, 31, v0.t
  vslidedown.vi v31, v30, 7
# vslide1up.vx
  vslide1up.vx v1, v2, a1
  vslide1up.vx v24, v16, sp, v0.t
  vslide1up.vx v31, v30, t6
# vslide1down.vx
  vslide1down.vx v1, v2, a1
  vslide1down.vx v24, v16, sp, v0.t
  vslide1down.vx v31, v30, t6
# vfslide1up.vf
  vfslide1up.vf v1, v2, fa1
  vfslide1up.vf v24, v16, ft0, v0.t
  vfslide1up.vf v31, v30, fs11
# vfslide1down.vf
  vfslide1down.vf v1, v2, fa1
  vfslide1down.vf v24, v16, ft0, v0.t
  vfslide1down.vf v31, v30, fs11
# vrgather.vv
  vrgather.vv v1, v2, v3
  vrgather.vv v24, v16, v8, v0.t
  vrgather.vv v31, v30, v29
# vrgather.vx
  vrgather.vx v1, v2, a1
  vrgather.vx v24, v16, sp, v0.t
  vrgather.vx v31, v30, t6
# vrgather.vi
  vrgather.vi v1, v2, 0
  vrgather.vi v24, v16, 31, v0.t
  vrgather.vi v31, v30, 7
# vcompress.vm
  vcompress.vm v1, v2, v3
  vcompress.vm v24, v16, v8
  vcompress.vm v31, v30, v29
# vsetvli
  vsetvli a0, a1, e32, m4, ta, ma
  vsetvli t0, sp, e8, mf8, tu, mu
  vsetvli x31, t6, e64, m1, ta, mu
# vsetivli
  vsetivli a0, 0, e32, m4, ta, ma
  vsetivli t0, 31, e8, mf8, tu, mu
  vsetivli x31, 8, e64, m1, ta, mu
# vsetvl
  vsetvl a0, a1, a2
  vsetvl t0, sp, s0
  vsetvl x31, t6, zero
# pseudo-instructions
  nop
  mv a0, a1
  li a0, 0
  li a1, -2048
  li a2, 2047
  li t1, -4096
  neg a0, a1
  j back
  jal fwd
  jr t0
  jalr a0
  ret
  beqz a0, back
  bnez a1, fwd
  bgez a2, back
  bltz a3, back
  blez a4, back
  bgtz a5, back
  bgt a0, a1, back
  ble a0, a1, back
  bgtu a0, a1, back
  bleu a0, a1, back
  vneg.v v1, v2
  vneg.v v1, v2, v0.t
  vnot.v v1, v2
  vnot.v v1, v2, v0.t
  vfneg.v v1, v2
  vfabs.v v1, v2, v0.t
  vmnot.m v1, v2
  vmmv.m v1, v2
  vmclr.m v3
  vmset.m v4
  vmsgt.vv v1, v2, v3
  vmsgtu.vv v1, v2, v3, v0.t
  vmsge.vv v1, v2, v3
  vmsgeu.vv v1, v2, v3
  vmfgt.vv v1, v2, v3
  vmfge.vv v1, v2, v3, v0.t
  vmslt.vi v1, v2, -15
  vmslt.vi v1, v2, 16
  vmsltu.vi v1, v2, 5
  vmsltu.vi v1, v2, 0
  vmsge.vi v1, v2, 5
  vmsgeu.vi v1, v2, 5
  vmsgeu.vi v1, v2, 0
  vmsge.vx v1, v2, a0
  vmsgeu.vx v1, v2, a0
  vmsge.vx v1, v2, a0, v0.t
  vfsgnj.vv v1, v2, v2
  vmand.mm v5, v5, v5
  vmxor.mm v1, v2, v2
fwd:
  ecall
