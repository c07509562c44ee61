# Chimeline reference corpus for GNU binutils (riscv64-linux-gnu-as -march=rv64gcv).
# Our own: generated from the instruction table by generate-corpus.ts; no words copied from elsewhere.
.option norvc
.text
back:
# add
1:
  add a0, a1, a2
  add t0, sp, s0
  add x31, t6, zero
1:
# sub
1:
  sub a0, a1, a2
  sub t0, sp, s0
  sub x31, t6, zero
1:
# sll
1:
  sll a0, a1, a2
  sll t0, sp, s0
  sll x31, t6, zero
1:
# slt
1:
  slt a0, a1, a2
  slt t0, sp, s0
  slt x31, t6, zero
1:
# sltu
1:
  sltu a0, a1, a2
  sltu t0, sp, s0
  sltu x31, t6, zero
1:
# xor
1:
  xor a0, a1, a2
  xor t0, sp, s0
  xor x31, t6, zero
1:
# srl
1:
  srl a0, a1, a2
  srl t0, sp, s0
  srl x31, t6, zero
1:
# sra
1:
  sra a0, a1, a2
  sra t0, sp, s0
  sra x31, t6, zero
1:
# or
1:
  or a0, a1, a2
  or t0, sp, s0
  or x31, t6, zero
1:
# and
1:
  and a0, a1, a2
  and t0, sp, s0
  and x31, t6, zero
1:
# mul
1:
  mul a0, a1, a2
  mul t0, sp, s0
  mul x31, t6, zero
1:
# mulh
1:
  mulh a0, a1, a2
  mulh t0, sp, s0
  mulh x31, t6, zero
1:
# mulhsu
1:
  mulhsu a0, a1, a2
  mulhsu t0, sp, s0
  mulhsu x31, t6, zero
1:
# mulhu
1:
  mulhu a0, a1, a2
  mulhu t0, sp, s0
  mulhu x31, t6, zero
1:
# div
1:
  div a0, a1, a2
  div t0, sp, s0
  div x31, t6, zero
1:
# divu
1:
  divu a0, a1, a2
  divu t0, sp, s0
  divu x31, t6, zero
1:
# rem
1:
  rem a0, a1, a2
  rem t0, sp, s0
  rem x31, t6, zero
1:
# remu
1:
  remu a0, a1, a2
  remu t0, sp, s0
  remu x31, t6, zero
1:
# addw
1:
  addw a0, a1, a2
  addw t0, sp, s0
  addw x31, t6, zero
1:
# subw
1:
  subw a0, a1, a2
  subw t0, sp, s0
  subw x31, t6, zero
1:
# sllw
1:
  sllw a0, a1, a2
  sllw t0, sp, s0
  sllw x31, t6, zero
1:
# srlw
1:
  srlw a0, a1, a2
  srlw t0, sp, s0
  srlw x31, t6, zero
1:
# sraw
1:
  sraw a0, a1, a2
  sraw t0, sp, s0
  sraw x31, t6, zero
1:
# mulw
1:
  mulw a0, a1, a2
  mulw t0, sp, s0
  mulw x31, t6, zero
1:
# divw
1:
  divw a0, a1, a2
  divw t0, sp, s0
  divw x31, t6, zero
1:
# divuw
1:
  divuw a0, a1, a2
  divuw t0, sp, s0
  divuw x31, t6, zero
1:
# remw
1:
  remw a0, a1, a2
  remw t0, sp, s0
  remw x31, t6, zero
1:
# remuw
1:
  remuw a0, a1, a2
  remuw t0, sp, s0
  remuw x31, t6, zero
1:
# addi
1:
  addi a0, a1, 0
  addi t0, sp, -2048
  addi x31, t6, 2047
1:
# slti
1:
  slti a0, a1, 0
  slti t0, sp, -2048
  slti x31, t6, 2047
1:
# sltiu
1:
  sltiu a0, a1, 0
  sltiu t0, sp, -2048
  sltiu x31, t6, 2047
1:
# xori
1:
  xori a0, a1, 0
  xori t0, sp, -2048
  xori x31, t6, 2047
1:
# ori
1:
  ori a0, a1, 0
  ori t0, sp, -2048
  ori x31, t6, 2047
1:
# andi
1:
  andi a0, a1, 0
  andi t0, sp, -2048
  andi x31, t6, 2047
1:
# slli
1:
  slli a0, a1, 1
  slli t0, sp, 63
  slli x31, t6, 0
1:
# srli
1:
  srli a0, a1, 1
  srli t0, sp, 63
  srli x31, t6, 0
1:
# srai
1:
  srai a0, a1, 1
  srai t0, sp, 63
  srai x31, t6, 0
1:
# addiw
1:
  addiw a0, a1, 0
  addiw t0, sp, -2048
  addiw x31, t6, 2047
1:
# slliw
1:
  slliw a0, a1, 1
  slliw t0, sp, 31
  slliw x31, t6, 0
1:
# srliw
1:
  srliw a0, a1, 1
  srliw t0, sp, 31
  srliw x31, t6, 0
1:
# sraiw
1:
  sraiw a0, a1, 1
  sraiw t0, sp, 31
  sraiw x31, t6, 0
1:
# lui
1:
  lui a0, 0x12345
  lui t0, 0xfffff
  lui x31, 0
1:
# auipc
1:
  auipc a0, 0x12345
  auipc t0, 0xfffff
  auipc x31, 0
1:
# beq
1:
  beq a1, a2, 1b
  beq sp, s0, 1f
  beq t6, zero, 1b
1:
# bne
1:
  bne a1, a2, 1b
  bne sp, s0, 1f
  bne t6, zero, 1b
1:
# blt
1:
  blt a1, a2, 1b
  blt sp, s0, 1f
  blt t6, zero, 1b
1:
# bge
1:
  bge a1, a2, 1b
  bge sp, s0, 1f
  bge t6, zero, 1b
1:
# bltu
1:
  bltu a1, a2, 1b
  bltu sp, s0, 1f
  bltu t6, zero, 1b
1:
# bgeu
1:
  bgeu a1, a2, 1b
  bgeu sp, s0, 1f
  bgeu t6, zero, 1b
1:
# jal
1:
  jal a0, back
  jal t0, fwd
  jal x31, back
1:
# jalr
1:
  jalr a0, 8(a1)
  jalr t0, -2048(sp)
  jalr x31, 2047(t6)
1:
# lb
1:
  lb a0, 8(a1)
  lb t0, -2048(sp)
  lb x31, 2047(t6)
1:
# lh
1:
  lh a0, 8(a1)
  lh t0, -2048(sp)
  lh x31, 2047(t6)
1:
# lw
1:
  lw a0, 8(a1)
  lw t0, -2048(sp)
  lw x31, 2047(t6)
1:
# ld
1:
  ld a0, 8(a1)
  ld t0, -2048(sp)
  ld x31, 2047(t6)
1:
# lbu
1:
  lbu a0, 8(a1)
  lbu t0, -2048(sp)
  lbu x31, 2047(t6)
1:
# lhu
1:
  lhu a0, 8(a1)
  lhu t0, -2048(sp)
  lhu x31, 2047(t6)
1:
# lwu
1:
  lwu a0, 8(a1)
  lwu t0, -2048(sp)
  lwu x31, 2047(t6)
1:
# sb
1:
  sb a2, 8(a1)
  sb s0, -2048(sp)
  sb zero, 2047(t6)
1:
# sh
1:
  sh a2, 8(a1)
  sh s0, -2048(sp)
  sh zero, 2047(t6)
1:
# sw
1:
  sw a2, 8(a1)
  sw s0, -2048(sp)
  sw zero, 2047(t6)
1:
# sd
1:
  sd a2, 8(a1)
  sd s0, -2048(sp)
  sd zero, 2047(t6)
1:
# fence
1:
  fence rw, w
  fence iorw, iorw
  fence r, o
1:
# fence.i
1:
  fence.i
1:
# ecall
1:
  ecall
1:
# ebreak
1:
  ebreak
1:
# csrrw
1:
  csrrw a0, vl, a1
  csrrw t0, fcsr, sp
  csrrw x31, 0x7c0, t6
1:
# csrrs
1:
  csrrs a0, vl, a1
  csrrs t0, fcsr, sp
  csrrs x31, 0x7c0, t6
1:
# csrrc
1:
  csrrc a0, vl, a1
  csrrc t0, fcsr, sp
  csrrc x31, 0x7c0, t6
1:
# csrrwi
1:
  csrrwi a0, vl, 0
  csrrwi t0, fcsr, 31
  csrrwi x31, 0x7c0, 7
1:
# csrrsi
1:
  csrrsi a0, vl, 0
  csrrsi t0, fcsr, 31
  csrrsi x31, 0x7c0, 7
1:
# csrrci
1:
  csrrci a0, vl, 0
  csrrci t0, fcsr, 31
  csrrci x31, 0x7c0, 7
1:
# lr.w
1:
  lr.w a0, (a1)
  lr.w t0, (sp)
  lr.w x31, (t6)
1:
# sc.w
1:
  sc.w a0, a2, (a1)
  sc.w t0, s0, (sp)
  sc.w x31, zero, (t6)
1:
# amoswap.w
1:
  amoswap.w a0, a2, (a1)
  amoswap.w t0, s0, (sp)
  amoswap.w x31, zero, (t6)
1:
# amoadd.w
1:
  amoadd.w a0, a2, (a1)
  amoadd.w t0, s0, (sp)
  amoadd.w x31, zero, (t6)
1:
# amoxor.w
1:
  amoxor.w a0, a2, (a1)
  amoxor.w t0, s0, (sp)
  amoxor.w x31, zero, (t6)
1:
# amoand.w
1:
  amoand.w a0, a2, (a1)
  amoand.w t0, s0, (sp)
  amoand.w x31, zero, (t6)
1:
# amoor.w
1:
  amoor.w a0, a2, (a1)
  amoor.w t0, s0, (sp)
  amoor.w x31, zero, (t6)
1:
# amomin.w
1:
  amomin.w a0, a2, (a1)
  amomin.w t0, s0, (sp)
  amomin.w x31, zero, (t6)
1:
# amomax.w
1:
  amomax.w a0, a2, (a1)
  amomax.w t0, s0, (sp)
  amomax.w x31, zero, (t6)
1:
# amominu.w
1:
  amominu.w a0, a2, (a1)
  amominu.w t0, s0, (sp)
  amominu.w x31, zero, (t6)
1:
# amomaxu.w
1:
  amomaxu.w a0, a2, (a1)
  amomaxu.w t0, s0, (sp)
  amomaxu.w x31, zero, (t6)
1:
# lr.w.aq
1:
  lr.w.aq a0, (a1)
  lr.w.aq t0, (sp)
  lr.w.aq x31, (t6)
1:
# sc.w.aq
1:
  sc.w.aq a0, a2, (a1)
  sc.w.aq t0, s0, (sp)
  sc.w.aq x31, zero, (t6)
1:
# amoswap.w.aq
1:
  amoswap.w.aq a0, a2, (a1)
  amoswap.w.aq t0, s0, (sp)
  amoswap.w.aq x31, zero, (t6)
1:
# amoadd.w.aq
1:
  amoadd.w.aq a0, a2, (a1)
  amoadd.w.aq t0, s0, (sp)
  amoadd.w.aq x31, zero, (t6)
1:
# amoxor.w.aq
1:
  amoxor.w.aq a0, a2, (a1)
  amoxor.w.aq t0, s0, (sp)
  amoxor.w.aq x31, zero, (t6)
1:
# amoand.w.aq
1:
  amoand.w.aq a0, a2, (a1)
  amoand.w.aq t0, s0, (sp)
  amoand.w.aq x31, zero, (t6)
1:
# amoor.w.aq
1:
  amoor.w.aq a0, a2, (a1)
  amoor.w.aq t0, s0, (sp)
  amoor.w.aq x31, zero, (t6)
1:
# amomin.w.aq
1:
  amomin.w.aq a0, a2, (a1)
  amomin.w.aq t0, s0, (sp)
  amomin.w.aq x31, zero, (t6)
1:
# amomax.w.aq
1:
  amomax.w.aq a0, a2, (a1)
  amomax.w.aq t0, s0, (sp)
  amomax.w.aq x31, zero, (t6)
1:
# amominu.w.aq
1:
  amominu.w.aq a0, a2, (a1)
  amominu.w.aq t0, s0, (sp)
  amominu.w.aq x31, zero, (t6)
1:
# amomaxu.w.aq
1:
  amomaxu.w.aq a0, a2, (a1)
  amomaxu.w.aq t0, s0, (sp)
  amomaxu.w.aq x31, zero, (t6)
1:
# lr.w.rl
1:
  lr.w.rl a0, (a1)
  lr.w.rl t0, (sp)
  lr.w.rl x31, (t6)
1:
# sc.w.rl
1:
  sc.w.rl a0, a2, (a1)
  sc.w.rl t0, s0, (sp)
  sc.w.rl x31, zero, (t6)
1:
# amoswap.w.rl
1:
  amoswap.w.rl a0, a2, (a1)
  amoswap.w.rl t0, s0, (sp)
  amoswap.w.rl x31, zero, (t6)
1:
# amoadd.w.rl
1:
  amoadd.w.rl a0, a2, (a1)
  amoadd.w.rl t0, s0, (sp)
  amoadd.w.rl x31, zero, (t6)
1:
# amoxor.w.rl
1:
  amoxor.w.rl a0, a2, (a1)
  amoxor.w.rl t0, s0, (sp)
  amoxor.w.rl x31, zero, (t6)
1:
# amoand.w.rl
1:
  amoand.w.rl a0, a2, (a1)
  amoand.w.rl t0, s0, (sp)
  amoand.w.rl x31, zero, (t6)
1:
# amoor.w.rl
1:
  amoor.w.rl a0, a2, (a1)
  amoor.w.rl t0, s0, (sp)
  amoor.w.rl x31, zero, (t6)
1:
# amomin.w.rl
1:
  amomin.w.rl a0, a2, (a1)
  amomin.w.rl t0, s0, (sp)
  amomin.w.rl x31, zero, (t6)
1:
# amomax.w.rl
1:
  amomax.w.rl a0, a2, (a1)
  amomax.w.rl t0, s0, (sp)
  amomax.w.rl x31, zero, (t6)
1:
# amominu.w.rl
1:
  amominu.w.rl a0, a2, (a1)
  amominu.w.rl t0, s0, (sp)
  amominu.w.rl x31, zero, (t6)
1:
# amomaxu.w.rl
1:
  amomaxu.w.rl a0, a2, (a1)
  amomaxu.w.rl t0, s0, (sp)
  amomaxu.w.rl x31, zero, (t6)
1:
# lr.w.aqrl
1:
  lr.w.aqrl a0, (a1)
  lr.w.aqrl t0, (sp)
  lr.w.aqrl x31, (t6)
1:
# sc.w.aqrl
1:
  sc.w.aqrl a0, a2, (a1)
  sc.w.aqrl t0, s0, (sp)
  sc.w.aqrl x31, zero, (t6)
1:
# amoswap.w.aqrl
1:
  amoswap.w.aqrl a0, a2, (a1)
  amoswap.w.aqrl t0, s0, (sp)
  amoswap.w.aqrl x31, zero, (t6)
1:
# amoadd.w.aqrl
1:
  amoadd.w.aqrl a0, a2, (a1)
  amoadd.w.aqrl t0, s0, (sp)
  amoadd.w.aqrl x31, zero, (t6)
1:
# amoxor.w.aqrl
1:
  amoxor.w.aqrl a0, a2, (a1)
  amoxor.w.aqrl t0, s0, (sp)
  amoxor.w.aqrl x31, zero, (t6)
1:
# amoand.w.aqrl
1:
  amoand.w.aqrl a0, a2, (a1)
  amoand.w.aqrl t0, s0, (sp)
  amoand.w.aqrl x31, zero, (t6)
1:
# amoor.w.aqrl
1:
  amoor.w.aqrl a0, a2, (a1)
  amoor.w.aqrl t0, s0, (sp)
  amoor.w.aqrl x31, zero, (t6)
1:
# amomin.w.aqrl
1:
  amomin.w.aqrl a0, a2, (a1)
  amomin.w.aqrl t0, s0, (sp)
  amomin.w.aqrl x31, zero, (t6)
1:
# amomax.w.aqrl
1:
  amomax.w.aqrl a0, a2, (a1)
  amomax.w.aqrl t0, s0, (sp)
  amomax.w.aqrl x31, zero, (t6)
1:
# amominu.w.aqrl
1:
  amominu.w.aqrl a0, a2, (a1)
  amominu.w.aqrl t0, s0, (sp)
  amominu.w.aqrl x31, zero, (t6)
1:
# amomaxu.w.aqrl
1:
  amomaxu.w.aqrl a0, a2, (a1)
  amomaxu.w.aqrl t0, s0, (sp)
  amomaxu.w.aqrl x31, zero, (t6)
1:
# lr.d
1:
  lr.d a0, (a1)
  lr.d t0, (sp)
  lr.d x31, (t6)
1:
# sc.d
1:
  sc.d a0, a2, (a1)
  sc.d t0, s0, (sp)
  sc.d x31, zero, (t6)
1:
# amoswap.d
1:
  amoswap.d a0, a2, (a1)
  amoswap.d t0, s0, (sp)
  amoswap.d x31, zero, (t6)
1:
# amoadd.d
1:
  amoadd.d a0, a2, (a1)
  amoadd.d t0, s0, (sp)
  amoadd.d x31, zero, (t6)
1:
# amoxor.d
1:
  amoxor.d a0, a2, (a1)
  amoxor.d t0, s0, (sp)
  amoxor.d x31, zero, (t6)
1:
# amoand.d
1:
  amoand.d a0, a2, (a1)
  amoand.d t0, s0, (sp)
  amoand.d x31, zero, (t6)
1:
# amoor.d
1:
  amoor.d a0, a2, (a1)
  amoor.d t0, s0, (sp)
  amoor.d x31, zero, (t6)
1:
# amomin.d
1:
  amomin.d a0, a2, (a1)
  amomin.d t0, s0, (sp)
  amomin.d x31, zero, (t6)
1:
# amomax.d
1:
  amomax.d a0, a2, (a1)
  amomax.d t0, s0, (sp)
  amomax.d x31, zero, (t6)
1:
# amominu.d
1:
  amominu.d a0, a2, (a1)
  amominu.d t0, s0, (sp)
  amominu.d x31, zero, (t6)
1:
# amomaxu.d
1:
  amomaxu.d a0, a2, (a1)
  amomaxu.d t0, s0, (sp)
  amomaxu.d x31, zero, (t6)
1:
# lr.d.aq
1:
  lr.d.aq a0, (a1)
  lr.d.aq t0, (sp)
  lr.d.aq x31, (t6)
1:
# sc.d.aq
1:
  sc.d.aq a0, a2, (a1)
  sc.d.aq t0, s0, (sp)
  sc.d.aq x31, zero, (t6)
1:
# amoswap.d.aq
1:
  amoswap.d.aq a0, a2, (a1)
  amoswap.d.aq t0, s0, (sp)
  amoswap.d.aq x31, zero, (t6)
1:
# amoadd.d.aq
1:
  amoadd.d.aq a0, a2, (a1)
  amoadd.d.aq t0, s0, (sp)
  amoadd.d.aq x31, zero, (t6)
1:
# amoxor.d.aq
1:
  amoxor.d.aq a0, a2, (a1)
  amoxor.d.aq t0, s0, (sp)
  amoxor.d.aq x31, zero, (t6)
1:
# amoand.d.aq
1:
  amoand.d.aq a0, a2, (a1)
  amoand.d.aq t0, s0, (sp)
  amoand.d.aq x31, zero, (t6)
1:
# amoor.d.aq
1:
  amoor.d.aq a0, a2, (a1)
  amoor.d.aq t0, s0, (sp)
  amoor.d.aq x31, zero, (t6)
1:
# amomin.d.aq
1:
  amomin.d.aq a0, a2, (a1)
  amomin.d.aq t0, s0, (sp)
  amomin.d.aq x31, zero, (t6)
1:
# amomax.d.aq
1:
  amomax.d.aq a0, a2, (a1)
  amomax.d.aq t0, s0, (sp)
  amomax.d.aq x31, zero, (t6)
1:
# amominu.d.aq
1:
  amominu.d.aq a0, a2, (a1)
  amominu.d.aq t0, s0, (sp)
  amominu.d.aq x31, zero, (t6)
1:
# amomaxu.d.aq
1:
  amomaxu.d.aq a0, a2, (a1)
  amomaxu.d.aq t0, s0, (sp)
  amomaxu.d.aq x31, zero, (t6)
1:
# lr.d.rl
1:
  lr.d.rl a0, (a1)
  lr.d.rl t0, (sp)
  lr.d.rl x31, (t6)
1:
# sc.d.rl
1:
  sc.d.rl a0, a2, (a1)
  sc.d.rl t0, s0, (sp)
  sc.d.rl x31, zero, (t6)
1:
# amoswap.d.rl
1:
  amoswap.d.rl a0, a2, (a1)
  amoswap.d.rl t0, s0, (sp)
  amoswap.d.rl x31, zero, (t6)
1:
# amoadd.d.rl
1:
  amoadd.d.rl a0, a2, (a1)
  amoadd.d.rl t0, s0, (sp)
  amoadd.d.rl x31, zero, (t6)
1:
# amoxor.d.rl
1:
  amoxor.d.rl a0, a2, (a1)
  amoxor.d.rl t0, s0, (sp)
  amoxor.d.rl x31, zero, (t6)
1:
# amoand.d.rl
1:
  amoand.d.rl a0, a2, (a1)
  amoand.d.rl t0, s0, (sp)
  amoand.d.rl x31, zero, (t6)
1:
# amoor.d.rl
1:
  amoor.d.rl a0, a2, (a1)
  amoor.d.rl t0, s0, (sp)
  amoor.d.rl x31, zero, (t6)
1:
# amomin.d.rl
1:
  amomin.d.rl a0, a2, (a1)
  amomin.d.rl t0, s0, (sp)
  amomin.d.rl x31, zero, (t6)
1:
# amomax.d.rl
1:
  amomax.d.rl a0, a2, (a1)
  amomax.d.rl t0, s0, (sp)
  amomax.d.rl x31, zero, (t6)
1:
# amominu.d.rl
1:
  amominu.d.rl a0, a2, (a1)
  amominu.d.rl t0, s0, (sp)
  amominu.d.rl x31, zero, (t6)
1:
# amomaxu.d.rl
1:
  amomaxu.d.rl a0, a2, (a1)
  amomaxu.d.rl t0, s0, (sp)
  amomaxu.d.rl x31, zero, (t6)
1:
# lr.d.aqrl
1:
  lr.d.aqrl a0, (a1)
  lr.d.aqrl t0, (sp)
  lr.d.aqrl x31, (t6)
1:
# sc.d.aqrl
1:
  sc.d.aqrl a0, a2, (a1)
  sc.d.aqrl t0, s0, (sp)
  sc.d.aqrl x31, zero, (t6)
1:
# amoswap.d.aqrl
1:
  amoswap.d.aqrl a0, a2, (a1)
  amoswap.d.aqrl t0, s0, (sp)
  amoswap.d.aqrl x31, zero, (t6)
1:
# amoadd.d.aqrl
1:
  amoadd.d.aqrl a0, a2, (a1)
  amoadd.d.aqrl t0, s0, (sp)
  amoadd.d.aqrl x31, zero, (t6)
1:
# amoxor.d.aqrl
1:
  amoxor.d.aqrl a0, a2, (a1)
  amoxor.d.aqrl t0, s0, (sp)
  amoxor.d.aqrl x31, zero, (t6)
1:
# amoand.d.aqrl
1:
  amoand.d.aqrl a0, a2, (a1)
  amoand.d.aqrl t0, s0, (sp)
  amoand.d.aqrl x31, zero, (t6)
1:
# amoor.d.aqrl
1:
  amoor.d.aqrl a0, a2, (a1)
  amoor.d.aqrl t0, s0, (sp)
  amoor.d.aqrl x31, zero, (t6)
1:
# amomin.d.aqrl
1:
  amomin.d.aqrl a0, a2, (a1)
  amomin.d.aqrl t0, s0, (sp)
  amomin.d.aqrl x31, zero, (t6)
1:
# amomax.d.aqrl
1:
  amomax.d.aqrl a0, a2, (a1)
  amomax.d.aqrl t0, s0, (sp)
  amomax.d.aqrl x31, zero, (t6)
1:
# amominu.d.aqrl
1:
  amominu.d.aqrl a0, a2, (a1)
  amominu.d.aqrl t0, s0, (sp)
  amominu.d.aqrl x31, zero, (t6)
1:
# amomaxu.d.aqrl
1:
  amomaxu.d.aqrl a0, a2, (a1)
  amomaxu.d.aqrl t0, s0, (sp)
  amomaxu.d.aqrl x31, zero, (t6)
1:
# flw
1:
  flw fa0, 8(a1)
  flw ft11, -2048(sp)
  flw f8, 2047(t6)
1:
# fld
1:
  fld fa0, 8(a1)
  fld ft11, -2048(sp)
  fld f8, 2047(t6)
1:
# fsw
1:
  fsw fa2, 8(a1)
  fsw f31, -2048(sp)
  fsw fs1, 2047(t6)
1:
# fsd
1:
  fsd fa2, 8(a1)
  fsd f31, -2048(sp)
  fsd fs1, 2047(t6)
1:
# fmadd.s
1:
  fmadd.s fa0, fa1, fa2, fa3
  fmadd.s ft11, ft0, f31, ft1, rtz
  fmadd.s f8, fs11, fs1, f30, rne
1:
# fmsub.s
1:
  fmsub.s fa0, fa1, fa2, fa3
  fmsub.s ft11, ft0, f31, ft1, rtz
  fmsub.s f8, fs11, fs1, f30, rne
1:
# fnmsub.s
1:
  fnmsub.s fa0, fa1, fa2, fa3
  fnmsub.s ft11, ft0, f31, ft1, rtz
  fnmsub.s f8, fs11, fs1, f30, rne
1:
# fnmadd.s
1:
  fnmadd.s fa0, fa1, fa2, fa3
  fnmadd.s ft11, ft0, f31, ft1, rtz
  fnmadd.s f8, fs11, fs1, f30, rne
1:
# fadd.s
1:
  fadd.s fa0, fa1, fa2
  fadd.s ft11, ft0, f31, rtz
  fadd.s f8, fs11, fs1, rne
1:
# fsub.s
1:
  fsub.s fa0, fa1, fa2
  fsub.s ft11, ft0, f31, rtz
  fsub.s f8, fs11, fs1, rne
1:
# fmul.s
1:
  fmul.s fa0, fa1, fa2
  fmul.s ft11, ft0, f31, rtz
  fmul.s f8, fs11, fs1, rne
1:
# fdiv.s
1:
  fdiv.s fa0, fa1, fa2
  fdiv.s ft11, ft0, f31, rtz
  fdiv.s f8, fs11, fs1, rne
1:
# fsqrt.s
1:
  fsqrt.s fa0, fa1
  fsqrt.s ft11, ft0, rtz
  fsqrt.s f8, fs11, rne
1:
# fsgnj.s
1:
  fsgnj.s fa0, fa1, fa2
  fsgnj.s ft11, ft0, f31
  fsgnj.s f8, fs11, fs1
1:
# fsgnjn.s
1:
  fsgnjn.s fa0, fa1, fa2
  fsgnjn.s ft11, ft0, f31
  fsgnjn.s f8, fs11, fs1
1:
# fsgnjx.s
1:
  fsgnjx.s fa0, fa1, fa2
  fsgnjx.s ft11, ft0, f31
  fsgnjx.s f8, fs11, fs1
1:
# fmin.s
1:
  fmin.s fa0, fa1, fa2
  fmin.s ft11, ft0, f31
  fmin.s f8, fs11, fs1
1:
# fmax.s
1:
  fmax.s fa0, fa1, fa2
  fmax.s ft11, ft0, f31
  fmax.s f8, fs11, fs1
1:
# fle.s
1:
  fle.s a0, fa1, fa2
  fle.s t0, ft0, f31
  fle.s x31, fs11, fs1
1:
# flt.s
1:
  flt.s a0, fa1, fa2
  flt.s t0, ft0, f31
  flt.s x31, fs11, fs1
1:
# feq.s
1:
  feq.s a0, fa1, fa2
  feq.s t0, ft0, f31
  feq.s x31, fs11, fs1
1:
# fclass.s
1:
  fclass.s a0, fa1
  fclass.s t0, ft0
  fclass.s x31, fs11
1:
# fcvt.w.s
1:
  fcvt.w.s a0, fa1
  fcvt.w.s t0, ft0, rtz
  fcvt.w.s x31, fs11, rne
1:
# fcvt.s.w
1:
  fcvt.s.w fa0, a1
  fcvt.s.w ft11, sp, rtz
  fcvt.s.w f8, t6, rne
1:
# fcvt.wu.s
1:
  fcvt.wu.s a0, fa1
  fcvt.wu.s t0, ft0, rtz
  fcvt.wu.s x31, fs11, rne
1:
# fcvt.s.wu
1:
  fcvt.s.wu fa0, a1
  fcvt.s.wu ft11, sp, rtz
  fcvt.s.wu f8, t6, rne
1:
# fcvt.l.s
1:
  fcvt.l.s a0, fa1
  fcvt.l.s t0, ft0, rtz
  fcvt.l.s x31, fs11, rne
1:
# fcvt.s.l
1:
  fcvt.s.l fa0, a1
  fcvt.s.l ft11, sp, rtz
  fcvt.s.l f8, t6, rne
1:
# fcvt.lu.s
1:
  fcvt.lu.s a0, fa1
  fcvt.lu.s t0, ft0, rtz
  fcvt.lu.s x31, fs11, rne
1:
# fcvt.s.lu
1:
  fcvt.s.lu fa0, a1
  fcvt.s.lu ft11, sp, rtz
  fcvt.s.lu f8, t6, rne
1:
# fmadd.d
1:
  fmadd.d fa0, fa1, fa2, fa3
  fmadd.d ft11, ft0, f31, ft1, rtz
  fmadd.d f8, fs11, fs1, f30, rne
1:
# fmsub.d
1:
  fmsub.d fa0, fa1, fa2, fa3
  fmsub.d ft11, ft0, f31, ft1, rtz
  fmsub.d f8, fs11, fs1, f30, rne
1:
# fnmsub.d
1:
  fnmsub.d fa0, fa1, fa2, fa3
  fnmsub.d ft11, ft0, f31, ft1, rtz
  fnmsub.d f8, fs11, fs1, f30, rne
1:
# fnmadd.d
1:
  fnmadd.d fa0, fa1, fa2, fa3
  fnmadd.d ft11, ft0, f31, ft1, rtz
  fnmadd.d f8, fs11, fs1, f30, rne
1:
# fadd.d
1:
  fadd.d fa0, fa1, fa2
  fadd.d ft11, ft0, f31, rtz
  fadd.d f8, fs11, fs1, rne
1:
# fsub.d
1:
  fsub.d fa0, fa1, fa2
  fsub.d ft11, ft0, f31, rtz
  fsub.d f8, fs11, fs1, rne
1:
# fmul.d
1:
  fmul.d fa0, fa1, fa2
  fmul.d ft11, ft0, f31, rtz
  fmul.d f8, fs11, fs1, rne
1:
# fdiv.d
1:
  fdiv.d fa0, fa1, fa2
  fdiv.d ft11, ft0, f31, rtz
  fdiv.d f8, fs11, fs1, rne
1:
# fsqrt.d
1:
  fsqrt.d fa0, fa1
  fsqrt.d ft11, ft0, rtz
  fsqrt.d f8, fs11, rne
1:
# fsgnj.d
1:
  fsgnj.d fa0, fa1, fa2
  fsgnj.d ft11, ft0, f31
  fsgnj.d f8, fs11, fs1
1:
# fsgnjn.d
1:
  fsgnjn.d fa0, fa1, fa2
  fsgnjn.d ft11, ft0, f31
  fsgnjn.d f8, fs11, fs1
1:
# fsgnjx.d
1:
  fsgnjx.d fa0, fa1, fa2
  fsgnjx.d ft11, ft0, f31
  fsgnjx.d f8, fs11, fs1
1:
# fmin.d
1:
  fmin.d fa0, fa1, fa2
  fmin.d ft11, ft0, f31
  fmin.d f8, fs11, fs1
1:
# fmax.d
1:
  fmax.d fa0, fa1, fa2
  fmax.d ft11, ft0, f31
  fmax.d f8, fs11, fs1
1:
# fle.d
1:
  fle.d a0, fa1, fa2
  fle.d t0, ft0, f31
  fle.d x31, fs11, fs1
1:
# flt.d
1:
  flt.d a0, fa1, fa2
  flt.d t0, ft0, f31
  flt.d x31, fs11, fs1
1:
# feq.d
1:
  feq.d a0, fa1, fa2
  feq.d t0, ft0, f31
  feq.d x31, fs11, fs1
1:
# fclass.d
1:
  fclass.d a0, fa1
  fclass.d t0, ft0
  fclass.d x31, fs11
1:
# fcvt.w.d
1:
  fcvt.w.d a0, fa1
  fcvt.w.d t0, ft0, rtz
  fcvt.w.d x31, fs11, rne
1:
# fcvt.d.w
1:
  fcvt.d.w fa0, a1
  fcvt.d.w ft11, sp
  fcvt.d.w f8, t6
1:
# fcvt.wu.d
1:
  fcvt.wu.d a0, fa1
  fcvt.wu.d t0, ft0, rtz
  fcvt.wu.d x31, fs11, rne
1:
# fcvt.d.wu
1:
  fcvt.d.wu fa0, a1
  fcvt.d.wu ft11, sp
  fcvt.d.wu f8, t6
1:
# fcvt.l.d
1:
  fcvt.l.d a0, fa1
  fcvt.l.d t0, ft0, rtz
  fcvt.l.d x31, fs11, rne
1:
# fcvt.d.l
1:
  fcvt.d.l fa0, a1
  fcvt.d.l ft11, sp, rtz
  fcvt.d.l f8, t6, rne
1:
# fcvt.lu.d
1:
  fcvt.lu.d a0, fa1
  fcvt.lu.d t0, ft0, rtz
  fcvt.lu.d x31, fs11, rne
1:
# fcvt.d.lu
1:
  fcvt.d.lu fa0, a1
  fcvt.d.lu ft11, sp, rtz
  fcvt.d.lu f8, t6, rne
1:
# fcvt.s.d
1:
  fcvt.s.d fa0, fa1
  fcvt.s.d ft11, ft0, rtz
  fcvt.s.d f8, fs11, rne
1:
# fcvt.d.s
1:
  fcvt.d.s fa0, fa1
  fcvt.d.s ft11, ft0
  fcvt.d.s f8, fs11
1:
# fmv.x.w
1:
  fmv.x.w a0, fa1
  fmv.x.w t0, ft0
  fmv.x.w x31, fs11
1:
# fmv.w.x
1:
  fmv.w.x fa0, a1
  fmv.w.x ft11, sp
  fmv.w.x f8, t6
1:
# fmv.x.d
1:
  fmv.x.d a0, fa1
  fmv.x.d t0, ft0
  fmv.x.d x31, fs11
1:
# fmv.d.x
1:
  fmv.d.x fa0, a1
  fmv.d.x ft11, sp
  fmv.d.x f8, t6
1:
# vle8.v
1:
  vle8.v v1, (a1)
  vle8.v v24, (sp), v0.t
  vle8.v v31, (t6)
1:
# vse8.v
1:
  vse8.v v1, (a1)
  vse8.v v24, (sp), v0.t
  vse8.v v31, (t6)
1:
# vlse8.v
1:
  vlse8.v v1, (a1), a2
  vlse8.v v24, (sp), s0, v0.t
  vlse8.v v31, (t6), zero
1:
# vsse8.v
1:
  vsse8.v v1, (a1), a2
  vsse8.v v24, (sp), s0, v0.t
  vsse8.v v31, (t6), zero
1:
# vluxei8.v
1:
  vluxei8.v v1, (a1), v2
  vluxei8.v v24, (sp), v16, v0.t
  vluxei8.v v31, (t6), v30
1:
# vsuxei8.v
1:
  vsuxei8.v v1, (a1), v2
  vsuxei8.v v24, (sp), v16, v0.t
  vsuxei8.v v31, (t6), v30
1:
# vloxei8.v
1:
  vloxei8.v v1, (a1), v2
  vloxei8.v v24, (sp), v16, v0.t
  vloxei8.v v31, (t6), v30
1:
# vsoxei8.v
1:
  vsoxei8.v v1, (a1), v2
  vsoxei8.v v24, (sp), v16, v0.t
  vsoxei8.v v31, (t6), v30
1:
# vle16.v
1:
  vle16.v v1, (a1)
  vle16.v v24, (sp), v0.t
  vle16.v v31, (t6)
1:
# vse16.v
1:
  vse16.v v1, (a1)
  vse16.v v24, (sp), v0.t
  vse16.v v31, (t6)
1:
# vlse16.v
1:
  vlse16.v v1, (a1), a2
  vlse16.v v24, (sp), s0, v0.t
  vlse16.v v31, (t6), zero
1:
# vsse16.v
1:
  vsse16.v v1, (a1), a2
  vsse16.v v24, (sp), s0, v0.t
  vsse16.v v31, (t6), zero
1:
# vluxei16.v
1:
  vluxei16.v v1, (a1), v2
  vluxei16.v v24, (sp), v16, v0.t
  vluxei16.v v31, (t6), v30
1:
# vsuxei16.v
1:
  vsuxei16.v v1, (a1), v2
  vsuxei16.v v24, (sp), v16, v0.t
  vsuxei16.v v31, (t6), v30
1:
# vloxei16.v
1:
  vloxei16.v v1, (a1), v2
  vloxei16.v v24, (sp), v16, v0.t
  vloxei16.v v31, (t6), v30
1:
# vsoxei16.v
1:
  vsoxei16.v v1, (a1), v2
  vsoxei16.v v24, (sp), v16, v0.t
  vsoxei16.v v31, (t6), v30
1:
# vle32.v
1:
  vle32.v v1, (a1)
  vle32.v v24, (sp), v0.t
  vle32.v v31, (t6)
1:
# vse32.v
1:
  vse32.v v1, (a1)
  vse32.v v24, (sp), v0.t
  vse32.v v31, (t6)
1:
# vlse32.v
1:
  vlse32.v v1, (a1), a2
  vlse32.v v24, (sp), s0, v0.t
  vlse32.v v31, (t6), zero
1:
# vsse32.v
1:
  vsse32.v v1, (a1), a2
  vsse32.v v24, (sp), s0, v0.t
  vsse32.v v31, (t6), zero
1:
# vluxei32.v
1:
  vluxei32.v v1, (a1), v2
  vluxei32.v v24, (sp), v16, v0.t
  vluxei32.v v31, (t6), v30
1:
# vsuxei32.v
1:
  vsuxei32.v v1, (a1), v2
  vsuxei32.v v24, (sp), v16, v0.t
  vsuxei32.v v31, (t6), v30
1:
# vloxei32.v
1:
  vloxei32.v v1, (a1), v2
  vloxei32.v v24, (sp), v16, v0.t
  vloxei32.v v31, (t6), v30
1:
# vsoxei32.v
1:
  vsoxei32.v v1, (a1), v2
  vsoxei32.v v24, (sp), v16, v0.t
  vsoxei32.v v31, (t6), v30
1:
# vle64.v
1:
  vle64.v v1, (a1)
  vle64.v v24, (sp), v0.t
  vle64.v v31, (t6)
1:
# vse64.v
1:
  vse64.v v1, (a1)
  vse64.v v24, (sp), v0.t
  vse64.v v31, (t6)
1:
# vlse64.v
1:
  vlse64.v v1, (a1), a2
  vlse64.v v24, (sp), s0, v0.t
  vlse64.v v31, (t6), zero
1:
# vsse64.v
1:
  vsse64.v v1, (a1), a2
  vsse64.v v24, (sp), s0, v0.t
  vsse64.v v31, (t6), zero
1:
# vluxei64.v
1:
  vluxei64.v v1, (a1), v2
  vluxei64.v v24, (sp), v16, v0.t
  vluxei64.v v31, (t6), v30
1:
# vsuxei64.v
1:
  vsuxei64.v v1, (a1), v2
  vsuxei64.v v24, (sp), v16, v0.t
  vsuxei64.v v31, (t6), v30
1:
# vloxei64.v
1:
  vloxei64.v v1, (a1), v2
  vloxei64.v v24, (sp), v16, v0.t
  vloxei64.v v31, (t6), v30
1:
# vsoxei64.v
1:
  vsoxei64.v v1, (a1), v2
  vsoxei64.v v24, (sp), v16, v0.t
  vsoxei64.v v31, (t6), v30
1:
# vle8ff.v
1:
  vle8ff.v v1, (a1)
  vle8ff.v v24, (sp), v0.t
  vle8ff.v v31, (t6)
1:
# vlseg2e8.v
1:
  vlseg2e8.v v1, (a1)
  vlseg2e8.v v24, (sp), v0.t
  vlseg2e8.v v31, (t6)
1:
# vlseg2e8ff.v
1:
  vlseg2e8ff.v v1, (a1)
  vlseg2e8ff.v v24, (sp), v0.t
  vlseg2e8ff.v v31, (t6)
1:
# vsseg2e8.v
1:
  vsseg2e8.v v1, (a1)
  vsseg2e8.v v24, (sp), v0.t
  vsseg2e8.v v31, (t6)
1:
# vlsseg2e8.v
1:
  vlsseg2e8.v v1, (a1), a2
  vlsseg2e8.v v24, (sp), s0, v0.t
  vlsseg2e8.v v31, (t6), zero
1:
# vssseg2e8.v
1:
  vssseg2e8.v v1, (a1), a2
  vssseg2e8.v v24, (sp), s0, v0.t
  vssseg2e8.v v31, (t6), zero
1:
# vluxseg2ei8.v
1:
  vluxseg2ei8.v v1, (a1), v2
  vluxseg2ei8.v v24, (sp), v16, v0.t
  vluxseg2ei8.v v31, (t6), v30
1:
# vsuxseg2ei8.v
1:
  vsuxseg2ei8.v v1, (a1), v2
  vsuxseg2ei8.v v24, (sp), v16, v0.t
  vsuxseg2ei8.v v31, (t6), v30
1:
# vloxseg2ei8.v
1:
  vloxseg2ei8.v v1, (a1), v2
  vloxseg2ei8.v v24, (sp), v16, v0.t
  vloxseg2ei8.v v31, (t6), v30
1:
# vsoxseg2ei8.v
1:
  vsoxseg2ei8.v v1, (a1), v2
  vsoxseg2ei8.v v24, (sp), v16, v0.t
  vsoxseg2ei8.v v31, (t6), v30
1:
# vlseg3e8.v
1:
  vlseg3e8.v v1, (a1)
  vlseg3e8.v v24, (sp), v0.t
  vlseg3e8.v v31, (t6)
1:
# vlseg3e8ff.v
1:
  vlseg3e8ff.v v1, (a1)
  vlseg3e8ff.v v24, (sp), v0.t
  vlseg3e8ff.v v31, (t6)
1:
# vsseg3e8.v
1:
  vsseg3e8.v v1, (a1)
  vsseg3e8.v v24, (sp), v0.t
  vsseg3e8.v v31, (t6)
1:
# vlsseg3e8.v
1:
  vlsseg3e8.v v1, (a1), a2
  vlsseg3e8.v v24, (sp), s0, v0.t
  vlsseg3e8.v v31, (t6), zero
1:
# vssseg3e8.v
1:
  vssseg3e8.v v1, (a1), a2
  vssseg3e8.v v24, (sp), s0, v0.t
  vssseg3e8.v v31, (t6), zero
1:
# vluxseg3ei8.v
1:
  vluxseg3ei8.v v1, (a1), v2
  vluxseg3ei8.v v24, (sp), v16, v0.t
  vluxseg3ei8.v v31, (t6), v30
1:
# vsuxseg3ei8.v
1:
  vsuxseg3ei8.v v1, (a1), v2
  vsuxseg3ei8.v v24, (sp), v16, v0.t
  vsuxseg3ei8.v v31, (t6), v30
1:
# vloxseg3ei8.v
1:
  vloxseg3ei8.v v1, (a1), v2
  vloxseg3ei8.v v24, (sp), v16, v0.t
  vloxseg3ei8.v v31, (t6), v30
1:
# vsoxseg3ei8.v
1:
  vsoxseg3ei8.v v1, (a1), v2
  vsoxseg3ei8.v v24, (sp), v16, v0.t
  vsoxseg3ei8.v v31, (t6), v30
1:
# vlseg4e8.v
1:
  vlseg4e8.v v1, (a1)
  vlseg4e8.v v24, (sp), v0.t
  vlseg4e8.v v31, (t6)
1:
# vlseg4e8ff.v
1:
  vlseg4e8ff.v v1, (a1)
  vlseg4e8ff.v v24, (sp), v0.t
  vlseg4e8ff.v v31, (t6)
1:
# vsseg4e8.v
1:
  vsseg4e8.v v1, (a1)
  vsseg4e8.v v24, (sp), v0.t
  vsseg4e8.v v31, (t6)
1:
# vlsseg4e8.v
1:
  vlsseg4e8.v v1, (a1), a2
  vlsseg4e8.v v24, (sp), s0, v0.t
  vlsseg4e8.v v31, (t6), zero
1:
# vssseg4e8.v
1:
  vssseg4e8.v v1, (a1), a2
  vssseg4e8.v v24, (sp), s0, v0.t
  vssseg4e8.v v31, (t6), zero
1:
# vluxseg4ei8.v
1:
  vluxseg4ei8.v v1, (a1), v2
  vluxseg4ei8.v v24, (sp), v16, v0.t
  vluxseg4ei8.v v31, (t6), v30
1:
# vsuxseg4ei8.v
1:
  vsuxseg4ei8.v v1, (a1), v2
  vsuxseg4ei8.v v24, (sp), v16, v0.t
  vsuxseg4ei8.v v31, (t6), v30
1:
# vloxseg4ei8.v
1:
  vloxseg4ei8.v v1, (a1), v2
  vloxseg4ei8.v v24, (sp), v16, v0.t
  vloxseg4ei8.v v31, (t6), v30
1:
# vsoxseg4ei8.v
1:
  vsoxseg4ei8.v v1, (a1), v2
  vsoxseg4ei8.v v24, (sp), v16, v0.t
  vsoxseg4ei8.v v31, (t6), v30
1:
# vlseg5e8.v
1:
  vlseg5e8.v v1, (a1)
  vlseg5e8.v v24, (sp), v0.t
  vlseg5e8.v v31, (t6)
1:
# vlseg5e8ff.v
1:
  vlseg5e8ff.v v1, (a1)
  vlseg5e8ff.v v24, (sp), v0.t
  vlseg5e8ff.v v31, (t6)
1:
# vsseg5e8.v
1:
  vsseg5e8.v v1, (a1)
  vsseg5e8.v v24, (sp), v0.t
  vsseg5e8.v v31, (t6)
1:
# vlsseg5e8.v
1:
  vlsseg5e8.v v1, (a1), a2
  vlsseg5e8.v v24, (sp), s0, v0.t
  vlsseg5e8.v v31, (t6), zero
1:
# vssseg5e8.v
1:
  vssseg5e8.v v1, (a1), a2
  vssseg5e8.v v24, (sp), s0, v0.t
  vssseg5e8.v v31, (t6), zero
1:
# vluxseg5ei8.v
1:
  vluxseg5ei8.v v1, (a1), v2
  vluxseg5ei8.v v24, (sp), v16, v0.t
  vluxseg5ei8.v v31, (t6), v30
1:
# vsuxseg5ei8.v
1:
  vsuxseg5ei8.v v1, (a1), v2
  vsuxseg5ei8.v v24, (sp), v16, v0.t
  vsuxseg5ei8.v v31, (t6), v30
1:
# vloxseg5ei8.v
1:
  vloxseg5ei8.v v1, (a1), v2
  vloxseg5ei8.v v24, (sp), v16, v0.t
  vloxseg5ei8.v v31, (t6), v30
1:
# vsoxseg5ei8.v
1:
  vsoxseg5ei8.v v1, (a1), v2
  vsoxseg5ei8.v v24, (sp), v16, v0.t
  vsoxseg5ei8.v v31, (t6), v30
1:
# vlseg6e8.v
1:
  vlseg6e8.v v1, (a1)
  vlseg6e8.v v24, (sp), v0.t
  vlseg6e8.v v31, (t6)
1:
# vlseg6e8ff.v
1:
  vlseg6e8ff.v v1, (a1)
  vlseg6e8ff.v v24, (sp), v0.t
  vlseg6e8ff.v v31, (t6)
1:
# vsseg6e8.v
1:
  vsseg6e8.v v1, (a1)
  vsseg6e8.v v24, (sp), v0.t
  vsseg6e8.v v31, (t6)
1:
# vlsseg6e8.v
1:
  vlsseg6e8.v v1, (a1), a2
  vlsseg6e8.v v24, (sp), s0, v0.t
  vlsseg6e8.v v31, (t6), zero
1:
# vssseg6e8.v
1:
  vssseg6e8.v v1, (a1), a2
  vssseg6e8.v v24, (sp), s0, v0.t
  vssseg6e8.v v31, (t6), zero
1:
# vluxseg6ei8.v
1:
  vluxseg6ei8.v v1, (a1), v2
  vluxseg6ei8.v v24, (sp), v16, v0.t
  vluxseg6ei8.v v31, (t6), v30
1:
# vsuxseg6ei8.v
1:
  vsuxseg6ei8.v v1, (a1), v2
  vsuxseg6ei8.v v24, (sp), v16, v0.t
  vsuxseg6ei8.v v31, (t6), v30
1:
# vloxseg6ei8.v
1:
  vloxseg6ei8.v v1, (a1), v2
  vloxseg6ei8.v v24, (sp), v16, v0.t
  vloxseg6ei8.v v31, (t6), v30
1:
# vsoxseg6ei8.v
1:
  vsoxseg6ei8.v v1, (a1), v2
  vsoxseg6ei8.v v24, (sp), v16, v0.t
  vsoxseg6ei8.v v31, (t6), v30
1:
# vlseg7e8.v
1:
  vlseg7e8.v v1, (a1)
  vlseg7e8.v v24, (sp), v0.t
  vlseg7e8.v v31, (t6)
1:
# vlseg7e8ff.v
1:
  vlseg7e8ff.v v1, (a1)
  vlseg7e8ff.v v24, (sp), v0.t
  vlseg7e8ff.v v31, (t6)
1:
# vsseg7e8.v
1:
  vsseg7e8.v v1, (a1)
  vsseg7e8.v v24, (sp), v0.t
  vsseg7e8.v v31, (t6)
1:
# vlsseg7e8.v
1:
  vlsseg7e8.v v1, (a1), a2
  vlsseg7e8.v v24, (sp), s0, v0.t
  vlsseg7e8.v v31, (t6), zero
1:
# vssseg7e8.v
1:
  vssseg7e8.v v1, (a1), a2
  vssseg7e8.v v24, (sp), s0, v0.t
  vssseg7e8.v v31, (t6), zero
1:
# vluxseg7ei8.v
1:
  vluxseg7ei8.v v1, (a1), v2
  vluxseg7ei8.v v24, (sp), v16, v0.t
  vluxseg7ei8.v v31, (t6), v30
1:
# vsuxseg7ei8.v
1:
  vsuxseg7ei8.v v1, (a1), v2
  vsuxseg7ei8.v v24, (sp), v16, v0.t
  vsuxseg7ei8.v v31, (t6), v30
1:
# vloxseg7ei8.v
1:
  vloxseg7ei8.v v1, (a1), v2
  vloxseg7ei8.v v24, (sp), v16, v0.t
  vloxseg7ei8.v v31, (t6), v30
1:
# vsoxseg7ei8.v
1:
  vsoxseg7ei8.v v1, (a1), v2
  vsoxseg7ei8.v v24, (sp), v16, v0.t
  vsoxseg7ei8.v v31, (t6), v30
1:
# vlseg8e8.v
1:
  vlseg8e8.v v1, (a1)
  vlseg8e8.v v24, (sp), v0.t
  vlseg8e8.v v31, (t6)
1:
# vlseg8e8ff.v
1:
  vlseg8e8ff.v v1, (a1)
  vlseg8e8ff.v v24, (sp), v0.t
  vlseg8e8ff.v v31, (t6)
1:
# vsseg8e8.v
1:
  vsseg8e8.v v1, (a1)
  vsseg8e8.v v24, (sp), v0.t
  vsseg8e8.v v31, (t6)
1:
# vlsseg8e8.v
1:
  vlsseg8e8.v v1, (a1), a2
  vlsseg8e8.v v24, (sp), s0, v0.t
  vlsseg8e8.v v31, (t6), zero
1:
# vssseg8e8.v
1:
  vssseg8e8.v v1, (a1), a2
  vssseg8e8.v v24, (sp), s0, v0.t
  vssseg8e8.v v31, (t6), zero
1:
# vluxseg8ei8.v
1:
  vluxseg8ei8.v v1, (a1), v2
  vluxseg8ei8.v v24, (sp), v16, v0.t
  vluxseg8ei8.v v31, (t6), v30
1:
# vsuxseg8ei8.v
1:
  vsuxseg8ei8.v v1, (a1), v2
  vsuxseg8ei8.v v24, (sp), v16, v0.t
  vsuxseg8ei8.v v31, (t6), v30
1:
# vloxseg8ei8.v
1:
  vloxseg8ei8.v v1, (a1), v2
  vloxseg8ei8.v v24, (sp), v16, v0.t
  vloxseg8ei8.v v31, (t6), v30
1:
# vsoxseg8ei8.v
1:
  vsoxseg8ei8.v v1, (a1), v2
  vsoxseg8ei8.v v24, (sp), v16, v0.t
  vsoxseg8ei8.v v31, (t6), v30
1:
# vl1re8.v
1:
  vl1re8.v v1, (a1)
  vl1re8.v v24, (sp)
  vl1re8.v v31, (t6)
1:
# vl2re8.v
1:
  vl2re8.v v1, (a1)
  vl2re8.v v24, (sp)
  vl2re8.v v31, (t6)
1:
# vl4re8.v
1:
  vl4re8.v v1, (a1)
  vl4re8.v v24, (sp)
  vl4re8.v v31, (t6)
1:
# vl8re8.v
1:
  vl8re8.v v1, (a1)
  vl8re8.v v24, (sp)
  vl8re8.v v31, (t6)
1:
# vle16ff.v
1:
  vle16ff.v v1, (a1)
  vle16ff.v v24, (sp), v0.t
  vle16ff.v v31, (t6)
1:
# vlseg2e16.v
1:
  vlseg2e16.v v1, (a1)
  vlseg2e16.v v24, (sp), v0.t
  vlseg2e16.v v31, (t6)
1:
# vlseg2e16ff.v
1:
  vlseg2e16ff.v v1, (a1)
  vlseg2e16ff.v v24, (sp), v0.t
  vlseg2e16ff.v v31, (t6)
1:
# vsseg2e16.v
1:
  vsseg2e16.v v1, (a1)
  vsseg2e16.v v24, (sp), v0.t
  vsseg2e16.v v31, (t6)
1:
# vlsseg2e16.v
1:
  vlsseg2e16.v v1, (a1), a2
  vlsseg2e16.v v24, (sp), s0, v0.t
  vlsseg2e16.v v31, (t6), zero
1:
# vssseg2e16.v
1:
  vssseg2e16.v v1, (a1), a2
  vssseg2e16.v v24, (sp), s0, v0.t
  vssseg2e16.v v31, (t6), zero
1:
# vluxseg2ei16.v
1:
  vluxseg2ei16.v v1, (a1), v2
  vluxseg2ei16.v v24, (sp), v16, v0.t
  vluxseg2ei16.v v31, (t6), v30
1:
# vsuxseg2ei16.v
1:
  vsuxseg2ei16.v v1, (a1), v2
  vsuxseg2ei16.v v24, (sp), v16, v0.t
  vsuxseg2ei16.v v31, (t6), v30
1:
# vloxseg2ei16.v
1:
  vloxseg2ei16.v v1, (a1), v2
  vloxseg2ei16.v v24, (sp), v16, v0.t
  vloxseg2ei16.v v31, (t6), v30
1:
# vsoxseg2ei16.v
1:
  vsoxseg2ei16.v v1, (a1), v2
  vsoxseg2ei16.v v24, (sp), v16, v0.t
  vsoxseg2ei16.v v31, (t6), v30
1:
# vlseg3e16.v
1:
  vlseg3e16.v v1, (a1)
  vlseg3e16.v v24, (sp), v0.t
  vlseg3e16.v v31, (t6)
1:
# vlseg3e16ff.v
1:
  vlseg3e16ff.v v1, (a1)
  vlseg3e16ff.v v24, (sp), v0.t
  vlseg3e16ff.v v31, (t6)
1:
# vsseg3e16.v
1:
  vsseg3e16.v v1, (a1)
  vsseg3e16.v v24, (sp), v0.t
  vsseg3e16.v v31, (t6)
1:
# vlsseg3e16.v
1:
  vlsseg3e16.v v1, (a1), a2
  vlsseg3e16.v v24, (sp), s0, v0.t
  vlsseg3e16.v v31, (t6), zero
1:
# vssseg3e16.v
1:
  vssseg3e16.v v1, (a1), a2
  vssseg3e16.v v24, (sp), s0, v0.t
  vssseg3e16.v v31, (t6), zero
1:
# vluxseg3ei16.v
1:
  vluxseg3ei16.v v1, (a1), v2
  vluxseg3ei16.v v24, (sp), v16, v0.t
  vluxseg3ei16.v v31, (t6), v30
1:
# vsuxseg3ei16.v
1:
  vsuxseg3ei16.v v1, (a1), v2
  vsuxseg3ei16.v v24, (sp), v16, v0.t
  vsuxseg3ei16.v v31, (t6), v30
1:
# vloxseg3ei16.v
1:
  vloxseg3ei16.v v1, (a1), v2
  vloxseg3ei16.v v24, (sp), v16, v0.t
  vloxseg3ei16.v v31, (t6), v30
1:
# vsoxseg3ei16.v
1:
  vsoxseg3ei16.v v1, (a1), v2
  vsoxseg3ei16.v v24, (sp), v16, v0.t
  vsoxseg3ei16.v v31, (t6), v30
1:
# vlseg4e16.v
1:
  vlseg4e16.v v1, (a1)
  vlseg4e16.v v24, (sp), v0.t
  vlseg4e16.v v31, (t6)
1:
# vlseg4e16ff.v
1:
  vlseg4e16ff.v v1, (a1)
  vlseg4e16ff.v v24, (sp), v0.t
  vlseg4e16ff.v v31, (t6)
1:
# vsseg4e16.v
1:
  vsseg4e16.v v1, (a1)
  vsseg4e16.v v24, (sp), v0.t
  vsseg4e16.v v31, (t6)
1:
# vlsseg4e16.v
1:
  vlsseg4e16.v v1, (a1), a2
  vlsseg4e16.v v24, (sp), s0, v0.t
  vlsseg4e16.v v31, (t6), zero
1:
# vssseg4e16.v
1:
  vssseg4e16.v v1, (a1), a2
  vssseg4e16.v v24, (sp), s0, v0.t
  vssseg4e16.v v31, (t6), zero
1:
# vluxseg4ei16.v
1:
  vluxseg4ei16.v v1, (a1), v2
  vluxseg4ei16.v v24, (sp), v16, v0.t
  vluxseg4ei16.v v31, (t6), v30
1:
# vsuxseg4ei16.v
1:
  vsuxseg4ei16.v v1, (a1), v2
  vsuxseg4ei16.v v24, (sp), v16, v0.t
  vsuxseg4ei16.v v31, (t6), v30
1:
# vloxseg4ei16.v
1:
  vloxseg4ei16.v v1, (a1), v2
  vloxseg4ei16.v v24, (sp), v16, v0.t
  vloxseg4ei16.v v31, (t6), v30
1:
# vsoxseg4ei16.v
1:
  vsoxseg4ei16.v v1, (a1), v2
  vsoxseg4ei16.v v24, (sp), v16, v0.t
  vsoxseg4ei16.v v31, (t6), v30
1:
# vlseg5e16.v
1:
  vlseg5e16.v v1, (a1)
  vlseg5e16.v v24, (sp), v0.t
  vlseg5e16.v v31, (t6)
1:
# vlseg5e16ff.v
1:
  vlseg5e16ff.v v1, (a1)
  vlseg5e16ff.v v24, (sp), v0.t
  vlseg5e16ff.v v31, (t6)
1:
# vsseg5e16.v
1:
  vsseg5e16.v v1, (a1)
  vsseg5e16.v v24, (sp), v0.t
  vsseg5e16.v v31, (t6)
1:
# vlsseg5e16.v
1:
  vlsseg5e16.v v1, (a1), a2
  vlsseg5e16.v v24, (sp), s0, v0.t
  vlsseg5e16.v v31, (t6), zero
1:
# vssseg5e16.v
1:
  vssseg5e16.v v1, (a1), a2
  vssseg5e16.v v24, (sp), s0, v0.t
  vssseg5e16.v v31, (t6), zero
1:
# vluxseg5ei16.v
1:
  vluxseg5ei16.v v1, (a1), v2
  vluxseg5ei16.v v24, (sp), v16, v0.t
  vluxseg5ei16.v v31, (t6), v30
1:
# vsuxseg5ei16.v
1:
  vsuxseg5ei16.v v1, (a1), v2
  vsuxseg5ei16.v v24, (sp), v16, v0.t
  vsuxseg5ei16.v v31, (t6), v30
1:
# vloxseg5ei16.v
1:
  vloxseg5ei16.v v1, (a1), v2
  vloxseg5ei16.v v24, (sp), v16, v0.t
  vloxseg5ei16.v v31, (t6), v30
1:
# vsoxseg5ei16.v
1:
  vsoxseg5ei16.v v1, (a1), v2
  vsoxseg5ei16.v v24, (sp), v16, v0.t
  vsoxseg5ei16.v v31, (t6), v30
1:
# vlseg6e16.v
1:
  vlseg6e16.v v1, (a1)
  vlseg6e16.v v24, (sp), v0.t
  vlseg6e16.v v31, (t6)
1:
# vlseg6e16ff.v
1:
  vlseg6e16ff.v v1, (a1)
  vlseg6e16ff.v v24, (sp), v0.t
  vlseg6e16ff.v v31, (t6)
1:
# vsseg6e16.v
1:
  vsseg6e16.v v1, (a1)
  vsseg6e16.v v24, (sp), v0.t
  vsseg6e16.v v31, (t6)
1:
# vlsseg6e16.v
1:
  vlsseg6e16.v v1, (a1), a2
  vlsseg6e16.v v24, (sp), s0, v0.t
  vlsseg6e16.v v31, (t6), zero
1:
# vssseg6e16.v
1:
  vssseg6e16.v v1, (a1), a2
  vssseg6e16.v v24, (sp), s0, v0.t
  vssseg6e16.v v31, (t6), zero
1:
# vluxseg6ei16.v
1:
  vluxseg6ei16.v v1, (a1), v2
  vluxseg6ei16.v v24, (sp), v16, v0.t
  vluxseg6ei16.v v31, (t6), v30
1:
# vsuxseg6ei16.v
1:
  vsuxseg6ei16.v v1, (a1), v2
  vsuxseg6ei16.v v24, (sp), v16, v0.t
  vsuxseg6ei16.v v31, (t6), v30
1:
# vloxseg6ei16.v
1:
  vloxseg6ei16.v v1, (a1), v2
  vloxseg6ei16.v v24, (sp), v16, v0.t
  vloxseg6ei16.v v31, (t6), v30
1:
# vsoxseg6ei16.v
1:
  vsoxseg6ei16.v v1, (a1), v2
  vsoxseg6ei16.v v24, (sp), v16, v0.t
  vsoxseg6ei16.v v31, (t6), v30
1:
# vlseg7e16.v
1:
  vlseg7e16.v v1, (a1)
  vlseg7e16.v v24, (sp), v0.t
  vlseg7e16.v v31, (t6)
1:
# vlseg7e16ff.v
1:
  vlseg7e16ff.v v1, (a1)
  vlseg7e16ff.v v24, (sp), v0.t
  vlseg7e16ff.v v31, (t6)
1:
# vsseg7e16.v
1:
  vsseg7e16.v v1, (a1)
  vsseg7e16.v v24, (sp), v0.t
  vsseg7e16.v v31, (t6)
1:
# vlsseg7e16.v
1:
  vlsseg7e16.v v1, (a1), a2
  vlsseg7e16.v v24, (sp), s0, v0.t
  vlsseg7e16.v v31, (t6), zero
1:
# vssseg7e16.v
1:
  vssseg7e16.v v1, (a1), a2
  vssseg7e16.v v24, (sp), s0, v0.t
  vssseg7e16.v v31, (t6), zero
1:
# vluxseg7ei16.v
1:
  vluxseg7ei16.v v1, (a1), v2
  vluxseg7ei16.v v24, (sp), v16, v0.t
  vluxseg7ei16.v v31, (t6), v30
1:
# vsuxseg7ei16.v
1:
  vsuxseg7ei16.v v1, (a1), v2
  vsuxseg7ei16.v v24, (sp), v16, v0.t
  vsuxseg7ei16.v v31, (t6), v30
1:
# vloxseg7ei16.v
1:
  vloxseg7ei16.v v1, (a1), v2
  vloxseg7ei16.v v24, (sp), v16, v0.t
  vloxseg7ei16.v v31, (t6), v30
1:
# vsoxseg7ei16.v
1:
  vsoxseg7ei16.v v1, (a1), v2
  vsoxseg7ei16.v v24, (sp), v16, v0.t
  vsoxseg7ei16.v v31, (t6), v30
1:
# vlseg8e16.v
1:
  vlseg8e16.v v1, (a1)
  vlseg8e16.v v24, (sp), v0.t
  vlseg8e16.v v31, (t6)
1:
# vlseg8e16ff.v
1:
  vlseg8e16ff.v v1, (a1)
  vlseg8e16ff.v v24, (sp), v0.t
  vlseg8e16ff.v v31, (t6)
1:
# vsseg8e16.v
1:
  vsseg8e16.v v1, (a1)
  vsseg8e16.v v24, (sp), v0.t
  vsseg8e16.v v31, (t6)
1:
# vlsseg8e16.v
1:
  vlsseg8e16.v v1, (a1), a2
  vlsseg8e16.v v24, (sp), s0, v0.t
  vlsseg8e16.v v31, (t6), zero
1:
# vssseg8e16.v
1:
  vssseg8e16.v v1, (a1), a2
  vssseg8e16.v v24, (sp), s0, v0.t
  vssseg8e16.v v31, (t6), zero
1:
# vluxseg8ei16.v
1:
  vluxseg8ei16.v v1, (a1), v2
  vluxseg8ei16.v v24, (sp), v16, v0.t
  vluxseg8ei16.v v31, (t6), v30
1:
# vsuxseg8ei16.v
1:
  vsuxseg8ei16.v v1, (a1), v2
  vsuxseg8ei16.v v24, (sp), v16, v0.t
  vsuxseg8ei16.v v31, (t6), v30
1:
# vloxseg8ei16.v
1:
  vloxseg8ei16.v v1, (a1), v2
  vloxseg8ei16.v v24, (sp), v16, v0.t
  vloxseg8ei16.v v31, (t6), v30
1:
# vsoxseg8ei16.v
1:
  vsoxseg8ei16.v v1, (a1), v2
  vsoxseg8ei16.v v24, (sp), v16, v0.t
  vsoxseg8ei16.v v31, (t6), v30
1:
# vl1re16.v
1:
  vl1re16.v v1, (a1)
  vl1re16.v v24, (sp)
  vl1re16.v v31, (t6)
1:
# vl2re16.v
1:
  vl2re16.v v1, (a1)
  vl2re16.v v24, (sp)
  vl2re16.v v31, (t6)
1:
# vl4re16.v
1:
  vl4re16.v v1, (a1)
  vl4re16.v v24, (sp)
  vl4re16.v v31, (t6)
1:
# vl8re16.v
1:
  vl8re16.v v1, (a1)
  vl8re16.v v24, (sp)
  vl8re16.v v31, (t6)
1:
# vle32ff.v
1:
  vle32ff.v v1, (a1)
  vle32ff.v v24, (sp), v0.t
  vle32ff.v v31, (t6)
1:
# vlseg2e32.v
1:
  vlseg2e32.v v1, (a1)
  vlseg2e32.v v24, (sp), v0.t
  vlseg2e32.v v31, (t6)
1:
# vlseg2e32ff.v
1:
  vlseg2e32ff.v v1, (a1)
  vlseg2e32ff.v v24, (sp), v0.t
  vlseg2e32ff.v v31, (t6)
1:
# vsseg2e32.v
1:
  vsseg2e32.v v1, (a1)
  vsseg2e32.v v24, (sp), v0.t
  vsseg2e32.v v31, (t6)
1:
# vlsseg2e32.v
1:
  vlsseg2e32.v v1, (a1), a2
  vlsseg2e32.v v24, (sp), s0, v0.t
  vlsseg2e32.v v31, (t6), zero
1:
# vssseg2e32.v
1:
  vssseg2e32.v v1, (a1), a2
  vssseg2e32.v v24, (sp), s0, v0.t
  vssseg2e32.v v31, (t6), zero
1:
# vluxseg2ei32.v
1:
  vluxseg2ei32.v v1, (a1), v2
  vluxseg2ei32.v v24, (sp), v16, v0.t
  vluxseg2ei32.v v31, (t6), v30
1:
# vsuxseg2ei32.v
1:
  vsuxseg2ei32.v v1, (a1), v2
  vsuxseg2ei32.v v24, (sp), v16, v0.t
  vsuxseg2ei32.v v31, (t6), v30
1:
# vloxseg2ei32.v
1:
  vloxseg2ei32.v v1, (a1), v2
  vloxseg2ei32.v v24, (sp), v16, v0.t
  vloxseg2ei32.v v31, (t6), v30
1:
# vsoxseg2ei32.v
1:
  vsoxseg2ei32.v v1, (a1), v2
  vsoxseg2ei32.v v24, (sp), v16, v0.t
  vsoxseg2ei32.v v31, (t6), v30
1:
# vlseg3e32.v
1:
  vlseg3e32.v v1, (a1)
  vlseg3e32.v v24, (sp), v0.t
  vlseg3e32.v v31, (t6)
1:
# vlseg3e32ff.v
1:
  vlseg3e32ff.v v1, (a1)
  vlseg3e32ff.v v24, (sp), v0.t
  vlseg3e32ff.v v31, (t6)
1:
# vsseg3e32.v
1:
  vsseg3e32.v v1, (a1)
  vsseg3e32.v v24, (sp), v0.t
  vsseg3e32.v v31, (t6)
1:
# vlsseg3e32.v
1:
  vlsseg3e32.v v1, (a1), a2
  vlsseg3e32.v v24, (sp), s0, v0.t
  vlsseg3e32.v v31, (t6), zero
1:
# vssseg3e32.v
1:
  vssseg3e32.v v1, (a1), a2
  vssseg3e32.v v24, (sp), s0, v0.t
  vssseg3e32.v v31, (t6), zero
1:
# vluxseg3ei32.v
1:
  vluxseg3ei32.v v1, (a1), v2
  vluxseg3ei32.v v24, (sp), v16, v0.t
  vluxseg3ei32.v v31, (t6), v30
1:
# vsuxseg3ei32.v
1:
  vsuxseg3ei32.v v1, (a1), v2
  vsuxseg3ei32.v v24, (sp), v16, v0.t
  vsuxseg3ei32.v v31, (t6), v30
1:
# vloxseg3ei32.v
1:
  vloxseg3ei32.v v1, (a1), v2
  vloxseg3ei32.v v24, (sp), v16, v0.t
  vloxseg3ei32.v v31, (t6), v30
1:
# vsoxseg3ei32.v
1:
  vsoxseg3ei32.v v1, (a1), v2
  vsoxseg3ei32.v v24, (sp), v16, v0.t
  vsoxseg3ei32.v v31, (t6), v30
1:
# vlseg4e32.v
1:
  vlseg4e32.v v1, (a1)
  vlseg4e32.v v24, (sp), v0.t
  vlseg4e32.v v31, (t6)
1:
# vlseg4e32ff.v
1:
  vlseg4e32ff.v v1, (a1)
  vlseg4e32ff.v v24, (sp), v0.t
  vlseg4e32ff.v v31, (t6)
1:
# vsseg4e32.v
1:
  vsseg4e32.v v1, (a1)
  vsseg4e32.v v24, (sp), v0.t
  vsseg4e32.v v31, (t6)
1:
# vlsseg4e32.v
1:
  vlsseg4e32.v v1, (a1), a2
  vlsseg4e32.v v24, (sp), s0, v0.t
  vlsseg4e32.v v31, (t6), zero
1:
# vssseg4e32.v
1:
  vssseg4e32.v v1, (a1), a2
  vssseg4e32.v v24, (sp), s0, v0.t
  vssseg4e32.v v31, (t6), zero
1:
# vluxseg4ei32.v
1:
  vluxseg4ei32.v v1, (a1), v2
  vluxseg4ei32.v v24, (sp), v16, v0.t
  vluxseg4ei32.v v31, (t6), v30
1:
# vsuxseg4ei32.v
1:
  vsuxseg4ei32.v v1, (a1), v2
  vsuxseg4ei32.v v24, (sp), v16, v0.t
  vsuxseg4ei32.v v31, (t6), v30
1:
# vloxseg4ei32.v
1:
  vloxseg4ei32.v v1, (a1), v2
  vloxseg4ei32.v v24, (sp), v16, v0.t
  vloxseg4ei32.v v31, (t6), v30
1:
# vsoxseg4ei32.v
1:
  vsoxseg4ei32.v v1, (a1), v2
  vsoxseg4ei32.v v24, (sp), v16, v0.t
  vsoxseg4ei32.v v31, (t6), v30
1:
# vlseg5e32.v
1:
  vlseg5e32.v v1, (a1)
  vlseg5e32.v v24, (sp), v0.t
  vlseg5e32.v v31, (t6)
1:
# vlseg5e32ff.v
1:
  vlseg5e32ff.v v1, (a1)
  vlseg5e32ff.v v24, (sp), v0.t
  vlseg5e32ff.v v31, (t6)
1:
# vsseg5e32.v
1:
  vsseg5e32.v v1, (a1)
  vsseg5e32.v v24, (sp), v0.t
  vsseg5e32.v v31, (t6)
1:
# vlsseg5e32.v
1:
  vlsseg5e32.v v1, (a1), a2
  vlsseg5e32.v v24, (sp), s0, v0.t
  vlsseg5e32.v v31, (t6), zero
1:
# vssseg5e32.v
1:
  vssseg5e32.v v1, (a1), a2
  vssseg5e32.v v24, (sp), s0, v0.t
  vssseg5e32.v v31, (t6), zero
1:
# vluxseg5ei32.v
1:
  vluxseg5ei32.v v1, (a1), v2
  vluxseg5ei32.v v24, (sp), v16, v0.t
  vluxseg5ei32.v v31, (t6), v30
1:
# vsuxseg5ei32.v
1:
  vsuxseg5ei32.v v1, (a1), v2
  vsuxseg5ei32.v v24, (sp), v16, v0.t
  vsuxseg5ei32.v v31, (t6), v30
1:
# vloxseg5ei32.v
1:
  vloxseg5ei32.v v1, (a1), v2
  vloxseg5ei32.v v24, (sp), v16, v0.t
  vloxseg5ei32.v v31, (t6), v30
1:
# vsoxseg5ei32.v
1:
  vsoxseg5ei32.v v1, (a1), v2
  vsoxseg5ei32.v v24, (sp), v16, v0.t
  vsoxseg5ei32.v v31, (t6), v30
1:
# vlseg6e32.v
1:
  vlseg6e32.v v1, (a1)
  vlseg6e32.v v24, (sp), v0.t
  vlseg6e32.v v31, (t6)
1:
# vlseg6e32ff.v
1:
  vlseg6e32ff.v v1, (a1)
  vlseg6e32ff.v v24, (sp), v0.t
  vlseg6e32ff.v v31, (t6)
1:
# vsseg6e32.v
1:
  vsseg6e32.v v1, (a1)
  vsseg6e32.v v24, (sp), v0.t
  vsseg6e32.v v31, (t6)
1:
# vlsseg6e32.v
1:
  vlsseg6e32.v v1, (a1), a2
  vlsseg6e32.v v24, (sp), s0, v0.t
  vlsseg6e32.v v31, (t6), zero
1:
# vssseg6e32.v
1:
  vssseg6e32.v v1, (a1), a2
  vssseg6e32.v v24, (sp), s0, v0.t
  vssseg6e32.v v31, (t6), zero
1:
# vluxseg6ei32.v
1:
  vluxseg6ei32.v v1, (a1), v2
  vluxseg6ei32.v v24, (sp), v16, v0.t
  vluxseg6ei32.v v31, (t6), v30
1:
# vsuxseg6ei32.v
1:
  vsuxseg6ei32.v v1, (a1), v2
  vsuxseg6ei32.v v24, (sp), v16, v0.t
  vsuxseg6ei32.v v31, (t6), v30
1:
# vloxseg6ei32.v
1:
  vloxseg6ei32.v v1, (a1), v2
  vloxseg6ei32.v v24, (sp), v16, v0.t
  vloxseg6ei32.v v31, (t6), v30
1:
# vsoxseg6ei32.v
1:
  vsoxseg6ei32.v v1, (a1), v2
  vsoxseg6ei32.v v24, (sp), v16, v0.t
  vsoxseg6ei32.v v31, (t6), v30
1:
# vlseg7e32.v
1:
  vlseg7e32.v v1, (a1)
  vlseg7e32.v v24, (sp), v0.t
  vlseg7e32.v v31, (t6)
1:
# vlseg7e32ff.v
1:
  vlseg7e32ff.v v1, (a1)
  vlseg7e32ff.v v24, (sp), v0.t
  vlseg7e32ff.v v31, (t6)
1:
# vsseg7e32.v
1:
  vsseg7e32.v v1, (a1)
  vsseg7e32.v v24, (sp), v0.t
  vsseg7e32.v v31, (t6)
1:
# vlsseg7e32.v
1:
  vlsseg7e32.v v1, (a1), a2
  vlsseg7e32.v v24, (sp), s0, v0.t
  vlsseg7e32.v v31, (t6), zero
1:
# vssseg7e32.v
1:
  vssseg7e32.v v1, (a1), a2
  vssseg7e32.v v24, (sp), s0, v0.t
  vssseg7e32.v v31, (t6), zero
1:
# vluxseg7ei32.v
1:
  vluxseg7ei32.v v1, (a1), v2
  vluxseg7ei32.v v24, (sp), v16, v0.t
  vluxseg7ei32.v v31, (t6), v30
1:
# vsuxseg7ei32.v
1:
  vsuxseg7ei32.v v1, (a1), v2
  vsuxseg7ei32.v v24, (sp), v16, v0.t
  vsuxseg7ei32.v v31, (t6), v30
1:
# vloxseg7ei32.v
1:
  vloxseg7ei32.v v1, (a1), v2
  vloxseg7ei32.v v24, (sp), v16, v0.t
  vloxseg7ei32.v v31, (t6), v30
1:
# vsoxseg7ei32.v
1:
  vsoxseg7ei32.v v1, (a1), v2
  vsoxseg7ei32.v v24, (sp), v16, v0.t
  vsoxseg7ei32.v v31, (t6), v30
1:
# vlseg8e32.v
1:
  vlseg8e32.v v1, (a1)
  vlseg8e32.v v24, (sp), v0.t
  vlseg8e32.v v31, (t6)
1:
# vlseg8e32ff.v
1:
  vlseg8e32ff.v v1, (a1)
  vlseg8e32ff.v v24, (sp), v0.t
  vlseg8e32ff.v v31, (t6)
1:
# vsseg8e32.v
1:
  vsseg8e32.v v1, (a1)
  vsseg8e32.v v24, (sp), v0.t
  vsseg8e32.v v31, (t6)
1:
# vlsseg8e32.v
1:
  vlsseg8e32.v v1, (a1), a2
  vlsseg8e32.v v24, (sp), s0, v0.t
  vlsseg8e32.v v31, (t6), zero
1:
# vssseg8e32.v
1:
  vssseg8e32.v v1, (a1), a2
  vssseg8e32.v v24, (sp), s0, v0.t
  vssseg8e32.v v31, (t6), zero
1:
# vluxseg8ei32.v
1:
  vluxseg8ei32.v v1, (a1), v2
  vluxseg8ei32.v v24, (sp), v16, v0.t
  vluxseg8ei32.v v31, (t6), v30
1:
# vsuxseg8ei32.v
1:
  vsuxseg8ei32.v v1, (a1), v2
  vsuxseg8ei32.v v24, (sp), v16, v0.t
  vsuxseg8ei32.v v31, (t6), v30
1:
# vloxseg8ei32.v
1:
  vloxseg8ei32.v v1, (a1), v2
  vloxseg8ei32.v v24, (sp), v16, v0.t
  vloxseg8ei32.v v31, (t6), v30
1:
# vsoxseg8ei32.v
1:
  vsoxseg8ei32.v v1, (a1), v2
  vsoxseg8ei32.v v24, (sp), v16, v0.t
  vsoxseg8ei32.v v31, (t6), v30
1:
# vl1re32.v
1:
  vl1re32.v v1, (a1)
  vl1re32.v v24, (sp)
  vl1re32.v v31, (t6)
1:
# vl2re32.v
1:
  vl2re32.v v1, (a1)
  vl2re32.v v24, (sp)
  vl2re32.v v31, (t6)
1:
# vl4re32.v
1:
  vl4re32.v v1, (a1)
  vl4re32.v v24, (sp)
  vl4re32.v v31, (t6)
1:
# vl8re32.v
1:
  vl8re32.v v1, (a1)
  vl8re32.v v24, (sp)
  vl8re32.v v31, (t6)
1:
# vle64ff.v
1:
  vle64ff.v v1, (a1)
  vle64ff.v v24, (sp), v0.t
  vle64ff.v v31, (t6)
1:
# vlseg2e64.v
1:
  vlseg2e64.v v1, (a1)
  vlseg2e64.v v24, (sp), v0.t
  vlseg2e64.v v31, (t6)
1:
# vlseg2e64ff.v
1:
  vlseg2e64ff.v v1, (a1)
  vlseg2e64ff.v v24, (sp), v0.t
  vlseg2e64ff.v v31, (t6)
1:
# vsseg2e64.v
1:
  vsseg2e64.v v1, (a1)
  vsseg2e64.v v24, (sp), v0.t
  vsseg2e64.v v31, (t6)
1:
# vlsseg2e64.v
1:
  vlsseg2e64.v v1, (a1), a2
  vlsseg2e64.v v24, (sp), s0, v0.t
  vlsseg2e64.v v31, (t6), zero
1:
# vssseg2e64.v
1:
  vssseg2e64.v v1, (a1), a2
  vssseg2e64.v v24, (sp), s0, v0.t
  vssseg2e64.v v31, (t6), zero
1:
# vluxseg2ei64.v
1:
  vluxseg2ei64.v v1, (a1), v2
  vluxseg2ei64.v v24, (sp), v16, v0.t
  vluxseg2ei64.v v31, (t6), v30
1:
# vsuxseg2ei64.v
1:
  vsuxseg2ei64.v v1, (a1), v2
  vsuxseg2ei64.v v24, (sp), v16, v0.t
  vsuxseg2ei64.v v31, (t6), v30
1:
# vloxseg2ei64.v
1:
  vloxseg2ei64.v v1, (a1), v2
  vloxseg2ei64.v v24, (sp), v16, v0.t
  vloxseg2ei64.v v31, (t6), v30
1:
# vsoxseg2ei64.v
1:
  vsoxseg2ei64.v v1, (a1), v2
  vsoxseg2ei64.v v24, (sp), v16, v0.t
  vsoxseg2ei64.v v31, (t6), v30
1:
# vlseg3e64.v
1:
  vlseg3e64.v v1, (a1)
  vlseg3e64.v v24, (sp), v0.t
  vlseg3e64.v v31, (t6)
1:
# vlseg3e64ff.v
1:
  vlseg3e64ff.v v1, (a1)
  vlseg3e64ff.v v24, (sp), v0.t
  vlseg3e64ff.v v31, (t6)
1:
# vsseg3e64.v
1:
  vsseg3e64.v v1, (a1)
  vsseg3e64.v v24, (sp), v0.t
  vsseg3e64.v v31, (t6)
1:
# vlsseg3e64.v
1:
  vlsseg3e64.v v1, (a1), a2
  vlsseg3e64.v v24, (sp), s0, v0.t
  vlsseg3e64.v v31, (t6), zero
1:
# vssseg3e64.v
1:
  vssseg3e64.v v1, (a1), a2
  vssseg3e64.v v24, (sp), s0, v0.t
  vssseg3e64.v v31, (t6), zero
1:
# vluxseg3ei64.v
1:
  vluxseg3ei64.v v1, (a1), v2
  vluxseg3ei64.v v24, (sp), v16, v0.t
  vluxseg3ei64.v v31, (t6), v30
1:
# vsuxseg3ei64.v
1:
  vsuxseg3ei64.v v1, (a1), v2
  vsuxseg3ei64.v v24, (sp), v16, v0.t
  vsuxseg3ei64.v v31, (t6), v30
1:
# vloxseg3ei64.v
1:
  vloxseg3ei64.v v1, (a1), v2
  vloxseg3ei64.v v24, (sp), v16, v0.t
  vloxseg3ei64.v v31, (t6), v30
1:
# vsoxseg3ei64.v
1:
  vsoxseg3ei64.v v1, (a1), v2
  vsoxseg3ei64.v v24, (sp), v16, v0.t
  vsoxseg3ei64.v v31, (t6), v30
1:
# vlseg4e64.v
1:
  vlseg4e64.v v1, (a1)
  vlseg4e64.v v24, (sp), v0.t
  vlseg4e64.v v31, (t6)
1:
# vlseg4e64ff.v
1:
  vlseg4e64ff.v v1, (a1)
  vlseg4e64ff.v v24, (sp), v0.t
  vlseg4e64ff.v v31, (t6)
1:
# vsseg4e64.v
1:
  vsseg4e64.v v1, (a1)
  vsseg4e64.v v24, (sp), v0.t
  vsseg4e64.v v31, (t6)
1:
# vlsseg4e64.v
1:
  vlsseg4e64.v v1, (a1), a2
  vlsseg4e64.v v24, (sp), s0, v0.t
  vlsseg4e64.v v31, (t6), zero
1:
# vssseg4e64.v
1:
  vssseg4e64.v v1, (a1), a2
  vssseg4e64.v v24, (sp), s0, v0.t
  vssseg4e64.v v31, (t6), zero
1:
# vluxseg4ei64.v
1:
  vluxseg4ei64.v v1, (a1), v2
  vluxseg4ei64.v v24, (sp), v16, v0.t
  vluxseg4ei64.v v31, (t6), v30
1:
# vsuxseg4ei64.v
1:
  vsuxseg4ei64.v v1, (a1), v2
  vsuxseg4ei64.v v24, (sp), v16, v0.t
  vsuxseg4ei64.v v31, (t6), v30
1:
# vloxseg4ei64.v
1:
  vloxseg4ei64.v v1, (a1), v2
  vloxseg4ei64.v v24, (sp), v16, v0.t
  vloxseg4ei64.v v31, (t6), v30
1:
# vsoxseg4ei64.v
1:
  vsoxseg4ei64.v v1, (a1), v2
  vsoxseg4ei64.v v24, (sp), v16, v0.t
  vsoxseg4ei64.v v31, (t6), v30
1:
# vlseg5e64.v
1:
  vlseg5e64.v v1, (a1)
  vlseg5e64.v v24, (sp), v0.t
  vlseg5e64.v v31, (t6)
1:
# vlseg5e64ff.v
1:
  vlseg5e64ff.v v1, (a1)
  vlseg5e64ff.v v24, (sp), v0.t
  vlseg5e64ff.v v31, (t6)
1:
# vsseg5e64.v
1:
  vsseg5e64.v v1, (a1)
  vsseg5e64.v v24, (sp), v0.t
  vsseg5e64.v v31, (t6)
1:
# vlsseg5e64.v
1:
  vlsseg5e64.v v1, (a1), a2
  vlsseg5e64.v v24, (sp), s0, v0.t
  vlsseg5e64.v v31, (t6), zero
1:
# vssseg5e64.v
1:
  vssseg5e64.v v1, (a1), a2
  vssseg5e64.v v24, (sp), s0, v0.t
  vssseg5e64.v v31, (t6), zero
1:
# vluxseg5ei64.v
1:
  vluxseg5ei64.v v1, (a1), v2
  vluxseg5ei64.v v24, (sp), v16, v0.t
  vluxseg5ei64.v v31, (t6), v30
1:
# vsuxseg5ei64.v
1:
  vsuxseg5ei64.v v1, (a1), v2
  vsuxseg5ei64.v v24, (sp), v16, v0.t
  vsuxseg5ei64.v v31, (t6), v30
1:
# vloxseg5ei64.v
1:
  vloxseg5ei64.v v1, (a1), v2
  vloxseg5ei64.v v24, (sp), v16, v0.t
  vloxseg5ei64.v v31, (t6), v30
1:
# vsoxseg5ei64.v
1:
  vsoxseg5ei64.v v1, (a1), v2
  vsoxseg5ei64.v v24, (sp), v16, v0.t
  vsoxseg5ei64.v v31, (t6), v30
1:
# vlseg6e64.v
1:
  vlseg6e64.v v1, (a1)
  vlseg6e64.v v24, (sp), v0.t
  vlseg6e64.v v31, (t6)
1:
# vlseg6e64ff.v
1:
  vlseg6e64ff.v v1, (a1)
  vlseg6e64ff.v v24, (sp), v0.t
  vlseg6e64ff.v v31, (t6)
1:
# vsseg6e64.v
1:
  vsseg6e64.v v1, (a1)
  vsseg6e64.v v24, (sp), v0.t
  vsseg6e64.v v31, (t6)
1:
# vlsseg6e64.v
1:
  vlsseg6e64.v v1, (a1), a2
  vlsseg6e64.v v24, (sp), s0, v0.t
  vlsseg6e64.v v31, (t6), zero
1:
# vssseg6e64.v
1:
  vssseg6e64.v v1, (a1), a2
  vssseg6e64.v v24, (sp), s0, v0.t
  vssseg6e64.v v31, (t6), zero
1:
# vluxseg6ei64.v
1:
  vluxseg6ei64.v v1, (a1), v2
  vluxseg6ei64.v v24, (sp), v16, v0.t
  vluxseg6ei64.v v31, (t6), v30
1:
# vsuxseg6ei64.v
1:
  vsuxseg6ei64.v v1, (a1), v2
  vsuxseg6ei64.v v24, (sp), v16, v0.t
  vsuxseg6ei64.v v31, (t6), v30
1:
# vloxseg6ei64.v
1:
  vloxseg6ei64.v v1, (a1), v2
  vloxseg6ei64.v v24, (sp), v16, v0.t
  vloxseg6ei64.v v31, (t6), v30
1:
# vsoxseg6ei64.v
1:
  vsoxseg6ei64.v v1, (a1), v2
  vsoxseg6ei64.v v24, (sp), v16, v0.t
  vsoxseg6ei64.v v31, (t6), v30
1:
# vlseg7e64.v
1:
  vlseg7e64.v v1, (a1)
  vlseg7e64.v v24, (sp), v0.t
  vlseg7e64.v v31, (t6)
1:
# vlseg7e64ff.v
1:
  vlseg7e64ff.v v1, (a1)
  vlseg7e64ff.v v24, (sp), v0.t
  vlseg7e64ff.v v31, (t6)
1:
# vsseg7e64.v
1:
  vsseg7e64.v v1, (a1)
  vsseg7e64.v v24, (sp), v0.t
  vsseg7e64.v v31, (t6)
1:
# vlsseg7e64.v
1:
  vlsseg7e64.v v1, (a1), a2
  vlsseg7e64.v v24, (sp), s0, v0.t
  vlsseg7e64.v v31, (t6), zero
1:
# vssseg7e64.v
1:
  vssseg7e64.v v1, (a1), a2
  vssseg7e64.v v24, (sp), s0, v0.t
  vssseg7e64.v v31, (t6), zero
1:
# vluxseg7ei64.v
1:
  vluxseg7ei64.v v1, (a1), v2
  vluxseg7ei64.v v24, (sp), v16, v0.t
  vluxseg7ei64.v v31, (t6), v30
1:
# vsuxseg7ei64.v
1:
  vsuxseg7ei64.v v1, (a1), v2
  vsuxseg7ei64.v v24, (sp), v16, v0.t
  vsuxseg7ei64.v v31, (t6), v30
1:
# vloxseg7ei64.v
1:
  vloxseg7ei64.v v1, (a1), v2
  vloxseg7ei64.v v24, (sp), v16, v0.t
  vloxseg7ei64.v v31, (t6), v30
1:
# vsoxseg7ei64.v
1:
  vsoxseg7ei64.v v1, (a1), v2
  vsoxseg7ei64.v v24, (sp), v16, v0.t
  vsoxseg7ei64.v v31, (t6), v30
1:
# vlseg8e64.v
1:
  vlseg8e64.v v1, (a1)
  vlseg8e64.v v24, (sp), v0.t
  vlseg8e64.v v31, (t6)
1:
# vlseg8e64ff.v
1:
  vlseg8e64ff.v v1, (a1)
  vlseg8e64ff.v v24, (sp), v0.t
  vlseg8e64ff.v v31, (t6)
1:
# vsseg8e64.v
1:
  vsseg8e64.v v1, (a1)
  vsseg8e64.v v24, (sp), v0.t
  vsseg8e64.v v31, (t6)
1:
# vlsseg8e64.v
1:
  vlsseg8e64.v v1, (a1), a2
  vlsseg8e64.v v24, (sp), s0, v0.t
  vlsseg8e64.v v31, (t6), zero
1:
# vssseg8e64.v
1:
  vssseg8e64.v v1, (a1), a2
  vssseg8e64.v v24, (sp), s0, v0.t
  vssseg8e64.v v31, (t6), zero
1:
# vluxseg8ei64.v
1:
  vluxseg8ei64.v v1, (a1), v2
  vluxseg8ei64.v v24, (sp), v16, v0.t
  vluxseg8ei64.v v31, (t6), v30
1:
# vsuxseg8ei64.v
1:
  vsuxseg8ei64.v v1, (a1), v2
  vsuxseg8ei64.v v24, (sp), v16, v0.t
  vsuxseg8ei64.v v31, (t6), v30
1:
# vloxseg8ei64.v
1:
  vloxseg8ei64.v v1, (a1), v2
  vloxseg8ei64.v v24, (sp), v16, v0.t
  vloxseg8ei64.v v31, (t6), v30
1:
# vsoxseg8ei64.v
1:
  vsoxseg8ei64.v v1, (a1), v2
  vsoxseg8ei64.v v24, (sp), v16, v0.t
  vsoxseg8ei64.v v31, (t6), v30
1:
# vl1re64.v
1:
  vl1re64.v v1, (a1)
  vl1re64.v v24, (sp)
  vl1re64.v v31, (t6)
1:
# vl2re64.v
1:
  vl2re64.v v1, (a1)
  vl2re64.v v24, (sp)
  vl2re64.v v31, (t6)
1:
# vl4re64.v
1:
  vl4re64.v v1, (a1)
  vl4re64.v v24, (sp)
  vl4re64.v v31, (t6)
1:
# vl8re64.v
1:
  vl8re64.v v1, (a1)
  vl8re64.v v24, (sp)
  vl8re64.v v31, (t6)
1:
# vs1r.v
1:
  vs1r.v v1, (a1)
  vs1r.v v24, (sp)
  vs1r.v v31, (t6)
1:
# vs2r.v
1:
  vs2r.v v1, (a1)
  vs2r.v v24, (sp)
  vs2r.v v31, (t6)
1:
# vs4r.v
1:
  vs4r.v v1, (a1)
  vs4r.v v24, (sp)
  vs4r.v v31, (t6)
1:
# vs8r.v
1:
  vs8r.v v1, (a1)
  vs8r.v v24, (sp)
  vs8r.v v31, (t6)
1:
# vlm.v
1:
  vlm.v v1, (a1)
  vlm.v v24, (sp)
  vlm.v v31, (t6)
1:
# vsm.v
1:
  vsm.v v1, (a1)
  vsm.v v24, (sp)
  vsm.v v31, (t6)
1:
# vadd.vv
1:
  vadd.vv v1, v2, v3
  vadd.vv v24, v16, v8, v0.t
  vadd.vv v31, v30, v29
1:
# vadd.vx
1:
  vadd.vx v1, v2, a1
  vadd.vx v24, v16, sp, v0.t
  vadd.vx v31, v30, t6
1:
# vadd.vi
1:
  vadd.vi v1, v2, 5
  vadd.vi v24, v16, -16, v0.t
  vadd.vi v31, v30, 15
1:
# vsub.vv
1:
  vsub.vv v1, v2, v3
  vsub.vv v24, v16, v8, v0.t
  vsub.vv v31, v30, v29
1:
# vsub.vx
1:
  vsub.vx v1, v2, a1
  vsub.vx v24, v16, sp, v0.t
  vsub.vx v31, v30, t6
1:
# vrsub.vx
1:
  vrsub.vx v1, v2, a1
  vrsub.vx v24, v16, sp, v0.t
  vrsub.vx v31, v30, t6
1:
# vrsub.vi
1:
  vrsub.vi v1, v2, 5
  vrsub.vi v24, v16, -16, v0.t
  vrsub.vi v31, v30, 15
1:
# vminu.vv
1:
  vminu.vv v1, v2, v3
  vminu.vv v24, v16, v8, v0.t
  vminu.vv v31, v30, v29
1:
# vminu.vx
1:
  vminu.vx v1, v2, a1
  vminu.vx v24, v16, sp, v0.t
  vminu.vx v31, v30, t6
1:
# vmin.vv
1:
  vmin.vv v1, v2, v3
  vmin.vv v24, v16, v8, v0.t
  vmin.vv v31, v30, v29
1:
# vmin.vx
1:
  vmin.vx v1, v2, a1
  vmin.vx v24, v16, sp, v0.t
  vmin.vx v31, v30, t6
1:
# vmaxu.vv
1:
  vmaxu.vv v1, v2, v3
  vmaxu.vv v24, v16, v8, v0.t
  vmaxu.vv v31, v30, v29
1:
# vmaxu.vx
1:
  vmaxu.vx v1, v2, a1
  vmaxu.vx v24, v16, sp, v0.t
  vmaxu.vx v31, v30, t6
1:
# vmax.vv
1:
  vmax.vv v1, v2, v3
  vmax.vv v24, v16, v8, v0.t
  vmax.vv v31, v30, v29
1:
# vmax.vx
1:
  vmax.vx v1, v2, a1
  vmax.vx v24, v16, sp, v0.t
  vmax.vx v31, v30, t6
1:
# vand.vv
1:
  vand.vv v1, v2, v3
  vand.vv v24, v16, v8, v0.t
  vand.vv v31, v30, v29
1:
# vand.vx
1:
  vand.vx v1, v2, a1
  vand.vx v24, v16, sp, v0.t
  vand.vx v31, v30, t6
1:
# vand.vi
1:
  vand.vi v1, v2, 5
  vand.vi v24, v16, -16, v0.t
  vand.vi v31, v30, 15
1:
# vor.vv
1:
  vor.vv v1, v2, v3
  vor.vv v24, v16, v8, v0.t
  vor.vv v31, v30, v29
1:
# vor.vx
1:
  vor.vx v1, v2, a1
  vor.vx v24, v16, sp, v0.t
  vor.vx v31, v30, t6
1:
# vor.vi
1:
  vor.vi v1, v2, 5
  vor.vi v24, v16, -16, v0.t
  vor.vi v31, v30, 15
1:
# vxor.vv
1:
  vxor.vv v1, v2, v3
  vxor.vv v24, v16, v8, v0.t
  vxor.vv v31, v30, v29
1:
# vxor.vx
1:
  vxor.vx v1, v2, a1
  vxor.vx v24, v16, sp, v0.t
  vxor.vx v31, v30, t6
1:
# vxor.vi
1:
  vxor.vi v1, v2, 5
  vxor.vi v24, v16, -16, v0.t
  vxor.vi v31, v30, 15
1:
# vsll.vv
1:
  vsll.vv v1, v2, v3
  vsll.vv v24, v16, v8, v0.t
  vsll.vv v31, v30, v29
1:
# vsll.vx
1:
  vsll.vx v1, v2, a1
  vsll.vx v24, v16, sp, v0.t
  vsll.vx v31, v30, t6
1:
# vsll.vi
1:
  vsll.vi v1, v2, 0
  vsll.vi v24, v16, 31, v0.t
  vsll.vi v31, v30, 7
1:
# vsrl.vv
1:
  vsrl.vv v1, v2, v3
  vsrl.vv v24, v16, v8, v0.t
  vsrl.vv v31, v30, v29
1:
# vsrl.vx
1:
  vsrl.vx v1, v2, a1
  vsrl.vx v24, v16, sp, v0.t
  vsrl.vx v31, v30, t6
1:
# vsrl.vi
1:
  vsrl.vi v1, v2, 0
  vsrl.vi v24, v16, 31, v0.t
  vsrl.vi v31, v30, 7
1:
# vsra.vv
1:
  vsra.vv v1, v2, v3
  vsra.vv v24, v16, v8, v0.t
  vsra.vv v31, v30, v29
1:
# vsra.vx
1:
  vsra.vx v1, v2, a1
  vsra.vx v24, v16, sp, v0.t
  vsra.vx v31, v30, t6
1:
# vsra.vi
1:
  vsra.vi v1, v2, 0
  vsra.vi v24, v16, 31, v0.t
  vsra.vi v31, v30, 7
1:
# vmulhu.vv
1:
  vmulhu.vv v1, v2, v3
  vmulhu.vv v24, v16, v8, v0.t
  vmulhu.vv v31, v30, v29
1:
# vmulhu.vx
1:
  vmulhu.vx v1, v2, a1
  vmulhu.vx v24, v16, sp, v0.t
  vmulhu.vx v31, v30, t6
1:
# vmul.vv
1:
  vmul.vv v1, v2, v3
  vmul.vv v24, v16, v8, v0.t
  vmul.vv v31, v30, v29
1:
# vmul.vx
1:
  vmul.vx v1, v2, a1
  vmul.vx v24, v16, sp, v0.t
  vmul.vx v31, v30, t6
1:
# vmulh.vv
1:
  vmulh.vv v1, v2, v3
  vmulh.vv v24, v16, v8, v0.t
  vmulh.vv v31, v30, v29
1:
# vmulh.vx
1:
  vmulh.vx v1, v2, a1
  vmulh.vx v24, v16, sp, v0.t
  vmulh.vx v31, v30, t6
1:
# vdivu.vv
1:
  vdivu.vv v1, v2, v3
  vdivu.vv v24, v16, v8, v0.t
  vdivu.vv v31, v30, v29
1:
# vdivu.vx
1:
  vdivu.vx v1, v2, a1
  vdivu.vx v24, v16, sp, v0.t
  vdivu.vx v31, v30, t6
1:
# vdiv.vv
1:
  vdiv.vv v1, v2, v3
  vdiv.vv v24, v16, v8, v0.t
  vdiv.vv v31, v30, v29
1:
# vdiv.vx
1:
  vdiv.vx v1, v2, a1
  vdiv.vx v24, v16, sp, v0.t
  vdiv.vx v31, v30, t6
1:
# vremu.vv
1:
  vremu.vv v1, v2, v3
  vremu.vv v24, v16, v8, v0.t
  vremu.vv v31, v30, v29
1:
# vremu.vx
1:
  vremu.vx v1, v2, a1
  vremu.vx v24, v16, sp, v0.t
  vremu.vx v31, v30, t6
1:
# vrem.vv
1:
  vrem.vv v1, v2, v3
  vrem.vv v24, v16, v8, v0.t
  vrem.vv v31, v30, v29
1:
# vrem.vx
1:
  vrem.vx v1, v2, a1
  vrem.vx v24, v16, sp, v0.t
  vrem.vx v31, v30, t6
1:
# vmadd.vv
1:
  vmadd.vv v1, v3, v2
  vmadd.vv v24, v8, v16, v0.t
  vmadd.vv v31, v29, v30
1:
# vmadd.vx
1:
  vmadd.vx v1, a1, v2
  vmadd.vx v24, sp, v16, v0.t
  vmadd.vx v31, t6, v30
1:
# vnmsub.vv
1:
  vnmsub.vv v1, v3, v2
  vnmsub.vv v24, v8, v16, v0.t
  vnmsub.vv v31, v29, v30
1:
# vnmsub.vx
1:
  vnmsub.vx v1, a1, v2
  vnmsub.vx v24, sp, v16, v0.t
  vnmsub.vx v31, t6, v30
1:
# vmacc.vv
1:
  vmacc.vv v1, v3, v2
  vmacc.vv v24, v8, v16, v0.t
  vmacc.vv v31, v29, v30
1:
# vmacc.vx
1:
  vmacc.vx v1, a1, v2
  vmacc.vx v24, sp, v16, v0.t
  vmacc.vx v31, t6, v30
1:
# vnmsac.vv
1:
  vnmsac.vv v1, v3, v2
  vnmsac.vv v24, v8, v16, v0.t
  vnmsac.vv v31, v29, v30
1:
# vnmsac.vx
1:
  vnmsac.vx v1, a1, v2
  vnmsac.vx v24, sp, v16, v0.t
  vnmsac.vx v31, t6, v30
1:
# vmerge.vvm
1:
  vmerge.vvm v1, v2, v3, v0
  vmerge.vvm v24, v16, v8, v0
  vmerge.vvm v31, v30, v29, v0
1:
# vmerge.vxm
1:
  vmerge.vxm v1, v2, a1, v0
  vmerge.vxm v24, v16, sp, v0
  vmerge.vxm v31, v30, t6, v0
1:
# vmerge.vim
1:
  vmerge.vim v1, v2, 5, v0
  vmerge.vim v24, v16, -16, v0
  vmerge.vim v31, v30, 15, v0
1:
# vid.v
1:
  vid.v v1
  vid.v v24, v0.t
  vid.v v31
1:
# vmseq.vv
1:
  vmseq.vv v1, v2, v3
  vmseq.vv v24, v16, v8, v0.t
  vmseq.vv v31, v30, v29
1:
# vmseq.vx
1:
  vmseq.vx v1, v2, a1
  vmseq.vx v24, v16, sp, v0.t
  vmseq.vx v31, v30, t6
1:
# vmseq.vi
1:
  vmseq.vi v1, v2, 5
  vmseq.vi v24, v16, -16, v0.t
  vmseq.vi v31, v30, 15
1:
# vmsne.vv
1:
  vmsne.vv v1, v2, v3
  vmsne.vv v24, v16, v8, v0.t
  vmsne.vv v31, v30, v29
1:
# vmsne.vx
1:
  vmsne.vx v1, v2, a1
  vmsne.vx v24, v16, sp, v0.t
  vmsne.vx v31, v30, t6
1:
# vmsne.vi
1:
  vmsne.vi v1, v2, 5
  vmsne.vi v24, v16, -16, v0.t
  vmsne.vi v31, v30, 15
1:
# vmsltu.vv
1:
  vmsltu.vv v1, v2, v3
  vmsltu.vv v24, v16, v8, v0.t
  vmsltu.vv v31, v30, v29
1:
# vmsltu.vx
1:
  vmsltu.vx v1, v2, a1
  vmsltu.vx v24, v16, sp, v0.t
  vmsltu.vx v31, v30, t6
1:
# vmslt.vv
1:
  vmslt.vv v1, v2, v3
  vmslt.vv v24, v16, v8, v0.t
  vmslt.vv v31, v30, v29
1:
# vmslt.vx
1:
  vmslt.vx v1, v2, a1
  vmslt.vx v24, v16, sp, v0.t
  vmslt.vx v31, v30, t6
1:
# vmsleu.vv
1:
  vmsleu.vv v1, v2, v3
  vmsleu.vv v24, v16, v8, v0.t
  vmsleu.vv v31, v30, v29
1:
# vmsleu.vx
1:
  vmsleu.vx v1, v2, a1
  vmsleu.vx v24, v16, sp, v0.t
  vmsleu.vx v31, v30, t6
1:
# vmsleu.vi
1:
  vmsleu.vi v1, v2, 5
  vmsleu.vi v24, v16, -16, v0.t
  vmsleu.vi v31, v30, 15
1:
# vmsle.vv
1:
  vmsle.vv v1, v2, v3
  vmsle.vv v24, v16, v8, v0.t
  vmsle.vv v31, v30, v29
1:
# vmsle.vx
1:
  vmsle.vx v1, v2, a1
  vmsle.vx v24, v16, sp, v0.t
  vmsle.vx v31, v30, t6
1:
# vmsle.vi
1:
  vmsle.vi v1, v2, 5
  vmsle.vi v24, v16, -16, v0.t
  vmsle.vi v31, v30, 15
1:
# vmsgtu.vx
1:
  vmsgtu.vx v1, v2, a1
  vmsgtu.vx v24, v16, sp, v0.t
  vmsgtu.vx v31, v30, t6
1:
# vmsgtu.vi
1:
  vmsgtu.vi v1, v2, 5
  vmsgtu.vi v24, v16, -16, v0.t
  vmsgtu.vi v31, v30, 15
1:
# vmsgt.vx
1:
  vmsgt.vx v1, v2, a1
  vmsgt.vx v24, v16, sp, v0.t
  vmsgt.vx v31, v30, t6
1:
# vmsgt.vi
1:
  vmsgt.vi v1, v2, 5
  vmsgt.vi v24, v16, -16, v0.t
  vmsgt.vi v31, v30, 15
1:
# vmandn.mm
1:
  vmandn.mm v1, v2, v3
  vmandn.mm v24, v16, v8
  vmandn.mm v31, v30, v29
1:
# vmand.mm
1:
  vmand.mm v1, v2, v3
  vmand.mm v24, v16, v8
  vmand.mm v31, v30, v29
1:
# vmor.mm
1:
  vmor.mm v1, v2, v3
  vmor.mm v24, v16, v8
  vmor.mm v31, v30, v29
1:
# vmxor.mm
1:
  vmxor.mm v1, v2, v3
  vmxor.mm v24, v16, v8
  vmxor.mm v31, v30, v29
1:
# vmorn.mm
1:
  vmorn.mm v1, v2, v3
  vmorn.mm v24, v16, v8
  vmorn.mm v31, v30, v29
1:
# vmnand.mm
1:
  vmnand.mm v1, v2, v3
  vmnand.mm v24, v16, v8
  vmnand.mm v31, v30, v29
1:
# vmnor.mm
1:
  vmnor.mm v1, v2, v3
  vmnor.mm v24, v16, v8
  vmnor.mm v31, v30, v29
1:
# vmxnor.mm
1:
  vmxnor.mm v1, v2, v3
  vmxnor.mm v24, v16, v8
  vmxnor.mm v31, v30, v29
1:
# vcpop.m
1:
  vcpop.m a0, v2
  vcpop.m t0, v16, v0.t
  vcpop.m x31, v30
1:
# vfirst.m
1:
  vfirst.m a0, v2
  vfirst.m t0, v16, v0.t
  vfirst.m x31, v30
1:
# vmsbf.m
1:
  vmsbf.m v1, v2
  vmsbf.m v24, v16, v0.t
  vmsbf.m v31, v30
1:
# vmsof.m
1:
  vmsof.m v1, v2
  vmsof.m v24, v16, v0.t
  vmsof.m v31, v30
1:
# vmsif.m
1:
  vmsif.m v1, v2
  vmsif.m v24, v16, v0.t
  vmsif.m v31, v30
1:
# viota.m
1:
  viota.m v1, v2
  viota.m v24, v16, v0.t
  viota.m v31, v30
1:
# vfadd.vv
1:
  vfadd.vv v1, v2, v3
  vfadd.vv v24, v16, v8, v0.t
  vfadd.vv v31, v30, v29
1:
# vfadd.vf
1:
  vfadd.vf v1, v2, fa1
  vfadd.vf v24, v16, ft0, v0.t
  vfadd.vf v31, v30, fs11
1:
# vfsub.vv
1:
  vfsub.vv v1, v2, v3
  vfsub.vv v24, v16, v8, v0.t
  vfsub.vv v31, v30, v29
1:
# vfsub.vf
1:
  vfsub.vf v1, v2, fa1
  vfsub.vf v24, v16, ft0, v0.t
  vfsub.vf v31, v30, fs11
1:
# vfrsub.vf
1:
  vfrsub.vf v1, v2, fa1
  vfrsub.vf v24, v16, ft0, v0.t
  vfrsub.vf v31, v30, fs11
1:
# vfmul.vv
1:
  vfmul.vv v1, v2, v3
  vfmul.vv v24, v16, v8, v0.t
  vfmul.vv v31, v30, v29
1:
# vfmul.vf
1:
  vfmul.vf v1, v2, fa1
  vfmul.vf v24, v16, ft0, v0.t
  vfmul.vf v31, v30, fs11
1:
# vfdiv.vv
1:
  vfdiv.vv v1, v2, v3
  vfdiv.vv v24, v16, v8, v0.t
  vfdiv.vv v31, v30, v29
1:
# vfdiv.vf
1:
  vfdiv.vf v1, v2, fa1
  vfdiv.vf v24, v16, ft0, v0.t
  vfdiv.vf v31, v30, fs11
1:
# vfrdiv.vf
1:
  vfrdiv.vf v1, v2, fa1
  vfrdiv.vf v24, v16, ft0, v0.t
  vfrdiv.vf v31, v30, fs11
1:
# vfmin.vv
1:
  vfmin.vv v1, v2, v3
  vfmin.vv v24, v16, v8, v0.t
  vfmin.vv v31, v30, v29
1:
# vfmin.vf
1:
  vfmin.vf v1, v2, fa1
  vfmin.vf v24, v16, ft0, v0.t
  vfmin.vf v31, v30, fs11
1:
# vfmax.vv
1:
  vfmax.vv v1, v2, v3
  vfmax.vv v24, v16, v8, v0.t
  vfmax.vv v31, v30, v29
1:
# vfmax.vf
1:
  vfmax.vf v1, v2, fa1
  vfmax.vf v24, v16, ft0, v0.t
  vfmax.vf v31, v30, fs11
1:
# vfsgnj.vv
1:
  vfsgnj.vv v1, v2, v3
  vfsgnj.vv v24, v16, v8, v0.t
  vfsgnj.vv v31, v30, v29
1:
# vfsgnj.vf
1:
  vfsgnj.vf v1, v2, fa1
  vfsgnj.vf v24, v16, ft0, v0.t
  vfsgnj.vf v31, v30, fs11
1:
# vfsgnjn.vv
1:
  vfsgnjn.vv v1, v2, v3
  vfsgnjn.vv v24, v16, v8, v0.t
  vfsgnjn.vv v31, v30, v29
1:
# vfsgnjn.vf
1:
  vfsgnjn.vf v1, v2, fa1
  vfsgnjn.vf v24, v16, ft0, v0.t
  vfsgnjn.vf v31, v30, fs11
1:
# vfsgnjx.vv
1:
  vfsgnjx.vv v1, v2, v3
  vfsgnjx.vv v24, v16, v8, v0.t
  vfsgnjx.vv v31, v30, v29
1:
# vfsgnjx.vf
1:
  vfsgnjx.vf v1, v2, fa1
  vfsgnjx.vf v24, v16, ft0, v0.t
  vfsgnjx.vf v31, v30, fs11
1:
# vfmadd.vv
1:
  vfmadd.vv v1, v3, v2
  vfmadd.vv v24, v8, v16, v0.t
  vfmadd.vv v31, v29, v30
1:
# vfmadd.vf
1:
  vfmadd.vf v1, fa1, v2
  vfmadd.vf v24, ft0, v16, v0.t
  vfmadd.vf v31, fs11, v30
1:
# vfnmadd.vv
1:
  vfnmadd.vv v1, v3, v2
  vfnmadd.vv v24, v8, v16, v0.t
  vfnmadd.vv v31, v29, v30
1:
# vfnmadd.vf
1:
  vfnmadd.vf v1, fa1, v2
  vfnmadd.vf v24, ft0, v16, v0.t
  vfnmadd.vf v31, fs11, v30
1:
# vfmsub.vv
1:
  vfmsub.vv v1, v3, v2
  vfmsub.vv v24, v8, v16, v0.t
  vfmsub.vv v31, v29, v30
1:
# vfmsub.vf
1:
  vfmsub.vf v1, fa1, v2
  vfmsub.vf v24, ft0, v16, v0.t
  vfmsub.vf v31, fs11, v30
1:
# vfnmsub.vv
1:
  vfnmsub.vv v1, v3, v2
  vfnmsub.vv v24, v8, v16, v0.t
  vfnmsub.vv v31, v29, v30
1:
# vfnmsub.vf
1:
  vfnmsub.vf v1, fa1, v2
  vfnmsub.vf v24, ft0, v16, v0.t
  vfnmsub.vf v31, fs11, v30
1:
# vfmacc.vv
1:
  vfmacc.vv v1, v3, v2
  vfmacc.vv v24, v8, v16, v0.t
  vfmacc.vv v31, v29, v30
1:
# vfmacc.vf
1:
  vfmacc.vf v1, fa1, v2
  vfmacc.vf v24, ft0, v16, v0.t
  vfmacc.vf v31, fs11, v30
1:
# vfnmacc.vv
1:
  vfnmacc.vv v1, v3, v2
  vfnmacc.vv v24, v8, v16, v0.t
  vfnmacc.vv v31, v29, v30
1:
# vfnmacc.vf
1:
  vfnmacc.vf v1, fa1, v2
  vfnmacc.vf v24, ft0, v16, v0.t
  vfnmacc.vf v31, fs11, v30
1:
# vfmsac.vv
1:
  vfmsac.vv v1, v3, v2
  vfmsac.vv v24, v8, v16, v0.t
  vfmsac.vv v31, v29, v30
1:
# vfmsac.vf
1:
  vfmsac.vf v1, fa1, v2
  vfmsac.vf v24, ft0, v16, v0.t
  vfmsac.vf v31, fs11, v30
1:
# vfnmsac.vv
1:
  vfnmsac.vv v1, v3, v2
  vfnmsac.vv v24, v8, v16, v0.t
  vfnmsac.vv v31, v29, v30
1:
# vfnmsac.vf
1:
  vfnmsac.vf v1, fa1, v2
  vfnmsac.vf v24, ft0, v16, v0.t
  vfnmsac.vf v31, fs11, v30
1:
# vfsqrt.v
1:
  vfsqrt.v v1, v2
  vfsqrt.v v24, v16, v0.t
  vfsqrt.v v31, v30
1:
# vfcvt.xu.f.v
1:
  vfcvt.xu.f.v v1, v2
  vfcvt.xu.f.v v24, v16, v0.t
  vfcvt.xu.f.v v31, v30
1:
# vfcvt.x.f.v
1:
  vfcvt.x.f.v v1, v2
  vfcvt.x.f.v v24, v16, v0.t
  vfcvt.x.f.v v31, v30
1:
# vfcvt.f.xu.v
1:
  vfcvt.f.xu.v v1, v2
  vfcvt.f.xu.v v24, v16, v0.t
  vfcvt.f.xu.v v31, v30
1:
# vfcvt.f.x.v
1:
  vfcvt.f.x.v v1, v2
  vfcvt.f.x.v v24, v16, v0.t
  vfcvt.f.x.v v31, v30
1:
# vfcvt.rtz.x.f.v
1:
  vfcvt.rtz.x.f.v v1, v2
  vfcvt.rtz.x.f.v v24, v16, v0.t
  vfcvt.rtz.x.f.v v31, v30
1:
# vmfeq.vv
1:
  vmfeq.vv v1, v2, v3
  vmfeq.vv v24, v16, v8, v0.t
  vmfeq.vv v31, v30, v29
1:
# vmfeq.vf
1:
  vmfeq.vf v1, v2, fa1
  vmfeq.vf v24, v16, ft0, v0.t
  vmfeq.vf v31, v30, fs11
1:
# vmfle.vv
1:
  vmfle.vv v1, v2, v3
  vmfle.vv v24, v16, v8, v0.t
  vmfle.vv v31, v30, v29
1:
# vmfle.vf
1:
  vmfle.vf v1, v2, fa1
  vmfle.vf v24, v16, ft0, v0.t
  vmfle.vf v31, v30, fs11
1:
# vmflt.vv
1:
  vmflt.vv v1, v2, v3
  vmflt.vv v24, v16, v8, v0.t
  vmflt.vv v31, v30, v29
1:
# vmflt.vf
1:
  vmflt.vf v1, v2, fa1
  vmflt.vf v24, v16, ft0, v0.t
  vmflt.vf v31, v30, fs11
1:
# vmfne.vv
1:
  vmfne.vv v1, v2, v3
  vmfne.vv v24, v16, v8, v0.t
  vmfne.vv v31, v30, v29
1:
# vmfne.vf
1:
  vmfne.vf v1, v2, fa1
  vmfne.vf v24, v16, ft0, v0.t
  vmfne.vf v31, v30, fs11
1:
# vmfgt.vf
1:
  vmfgt.vf v1, v2, fa1
  vmfgt.vf v24, v16, ft0, v0.t
  vmfgt.vf v31, v30, fs11
1:
# vmfge.vf
1:
  vmfge.vf v1, v2, fa1
  vmfge.vf v24, v16, ft0, v0.t
  vmfge.vf v31, v30, fs11
1:
# vfmerge.vfm
1:
  vfmerge.vfm v1, v2, fa1, v0
  vfmerge.vfm v24, v16, ft0, v0
  vfmerge.vfm v31, v30, fs11, v0
1:
# vmv.v.v
1:
  vmv.v.v v1, v3
  vmv.v.v v24, v8
  vmv.v.v v31, v29
1:
# vmv.v.x
1:
  vmv.v.x v1, a1
  vmv.v.x v24, sp
  vmv.v.x v31, t6
1:
# vmv.v.i
1:
  vmv.v.i v1, 5
  vmv.v.i v24, -16
  vmv.v.i v31, 15
1:
# vfmv.v.f
1:
  vfmv.v.f v1, fa1
  vfmv.v.f v24, ft0
  vfmv.v.f v31, fs11
1:
# vmv.x.s
1:
  vmv.x.s a0, v2
  vmv.x.s t0, v16
  vmv.x.s x31, v30
1:
# vfmv.f.s
1:
  vfmv.f.s fa0, v2
  vfmv.f.s ft11, v16
  vfmv.f.s f8, v30
1:
# vmv.s.x
1:
  vmv.s.x v1, a1
  vmv.s.x v24, sp
  vmv.s.x v31, t6
1:
# vfmv.s.f
1:
  vfmv.s.f v1, fa1
  vfmv.s.f v24, ft0
  vfmv.s.f v31, fs11
1:
# vredsum.vs
1:
  vredsum.vs v1, v2, v3
  vredsum.vs v24, v16, v8, v0.t
  vredsum.vs v31, v30, v29
1:
# vredand.vs
1:
  vredand.vs v1, v2, v3
  vredand.vs v24, v16, v8, v0.t
  vredand.vs v31, v30, v29
1:
# vredor.vs
1:
  vredor.vs v1, v2, v3
  vredor.vs v24, v16, v8, v0.t
  vredor.vs v31, v30, v29
1:
# vredxor.vs
1:
  vredxor.vs v1, v2, v3
  vredxor.vs v24, v16, v8, v0.t
  vredxor.vs v31, v30, v29
1:
# vredminu.vs
1:
  vredminu.vs v1, v2, v3
  vredminu.vs v24, v16, v8, v0.t
  vredminu.vs v31, v30, v29
1:
# vredmin.vs
1:
  vredmin.vs v1, v2, v3
  vredmin.vs v24, v16, v8, v0.t
  vredmin.vs v31, v30, v29
1:
# vredmaxu.vs
1:
  vredmaxu.vs v1, v2, v3
  vredmaxu.vs v24, v16, v8, v0.t
  vredmaxu.vs v31, v30, v29
1:
# vredmax.vs
1:
  vredmax.vs v1, v2, v3
  vredmax.vs v24, v16, v8, v0.t
  vredmax.vs v31, v30, v29
1:
# vfredusum.vs
1:
  vfredusum.vs v1, v2, v3
  vfredusum.vs v24, v16, v8, v0.t
  vfredusum.vs v31, v30, v29
1:
# vfredosum.vs
1:
  vfredosum.vs v1, v2, v3
  vfredosum.vs v24, v16, v8, v0.t
  vfredosum.vs v31, v30, v29
1:
# vfredmin.vs
1:
  vfredmin.vs v1, v2, v3
  vfredmin.vs v24, v16, v8, v0.t
  vfredmin.vs v31, v30, v29
1:
# vfredmax.vs
1:
  vfredmax.vs v1, v2, v3
  vfredmax.vs v24, v16, v8, v0.t
  vfredmax.vs v31, v30, v29
1:
# vslideup.vx
1:
  vslideup.vx v1, v2, a1
  vslideup.vx v24, v16, sp, v0.t
  vslideup.vx v31, v30, t6
1:
# vslideup.vi
1:
  vslideup.vi v1, v2, 0
  vslideup.vi v24, v16, 31, v0.t
  vslideup.vi v31, v30, 7
1:
# vslidedown.vx
1:
  vslidedown.vx v1, v2, a1
  vslidedown.vx v24, v16, sp, v0.t
  vslidedown.vx v31, v30, t6
1:
# vslidedown.vi
1:
  vslidedown.vi v1, v2, 0
  vslidedown.vi v24, v16, 31, v0.t
  vslidedown.vi v31, v30, 7
1:
# vslide1up.vx
1:
  vslide1up.vx v1, v2, a1
  vslide1up.vx v24, v16, sp, v0.t
  vslide1up.vx v31, v30, t6
1:
# vslide1down.vx
1:
  vslide1down.vx v1, v2, a1
  vslide1down.vx v24, v16, sp, v0.t
  vslide1down.vx v31, v30, t6
1:
# vfslide1up.vf
1:
  vfslide1up.vf v1, v2, fa1
  vfslide1up.vf v24, v16, ft0, v0.t
  vfslide1up.vf v31, v30, fs11
1:
# vfslide1down.vf
1:
  vfslide1down.vf v1, v2, fa1
  vfslide1down.vf v24, v16, ft0, v0.t
  vfslide1down.vf v31, v30, fs11
1:
# vrgather.vv
1:
  vrgather.vv v1, v2, v3
  vrgather.vv v24, v16, v8, v0.t
  vrgather.vv v31, v30, v29
1:
# vrgather.vx
1:
  vrgather.vx v1, v2, a1
  vrgather.vx v24, v16, sp, v0.t
  vrgather.vx v31, v30, t6
1:
# vrgather.vi
1:
  vrgather.vi v1, v2, 0
  vrgather.vi v24, v16, 31, v0.t
  vrgather.vi v31, v30, 7
1:
# vcompress.vm
1:
  vcompress.vm v1, v2, v3
  vcompress.vm v24, v16, v8
  vcompress.vm v31, v30, v29
1:
# vadc.vvm
1:
  vadc.vvm v1, v2, v3, v0
  vadc.vvm v24, v16, v8, v0
  vadc.vvm v31, v30, v29, v0
1:
# vadc.vxm
1:
  vadc.vxm v1, v2, a1, v0
  vadc.vxm v24, v16, sp, v0
  vadc.vxm v31, v30, t6, v0
1:
# vadc.vim
1:
  vadc.vim v1, v2, 5, v0
  vadc.vim v24, v16, -16, v0
  vadc.vim v31, v30, 15, v0
1:
# vsbc.vvm
1:
  vsbc.vvm v1, v2, v3, v0
  vsbc.vvm v24, v16, v8, v0
  vsbc.vvm v31, v30, v29, v0
1:
# vsbc.vxm
1:
  vsbc.vxm v1, v2, a1, v0
  vsbc.vxm v24, v16, sp, v0
  vsbc.vxm v31, v30, t6, v0
1:
# vmadc.vvm
1:
  vmadc.vvm v1, v2, v3, v0
  vmadc.vvm v24, v16, v8, v0
  vmadc.vvm v31, v30, v29, v0
1:
# vmadc.vxm
1:
  vmadc.vxm v1, v2, a1, v0
  vmadc.vxm v24, v16, sp, v0
  vmadc.vxm v31, v30, t6, v0
1:
# vmadc.vim
1:
  vmadc.vim v1, v2, 5, v0
  vmadc.vim v24, v16, -16, v0
  vmadc.vim v31, v30, 15, v0
1:
# vmadc.vv
1:
  vmadc.vv v1, v2, v3
  vmadc.vv v24, v16, v8
  vmadc.vv v31, v30, v29
1:
# vmadc.vx
1:
  vmadc.vx v1, v2, a1
  vmadc.vx v24, v16, sp
  vmadc.vx v31, v30, t6
1:
# vmadc.vi
1:
  vmadc.vi v1, v2, 5
  vmadc.vi v24, v16, -16
  vmadc.vi v31, v30, 15
1:
# vmsbc.vvm
1:
  vmsbc.vvm v1, v2, v3, v0
  vmsbc.vvm v24, v16, v8, v0
  vmsbc.vvm v31, v30, v29, v0
1:
# vmsbc.vxm
1:
  vmsbc.vxm v1, v2, a1, v0
  vmsbc.vxm v24, v16, sp, v0
  vmsbc.vxm v31, v30, t6, v0
1:
# vmsbc.vv
1:
  vmsbc.vv v1, v2, v3
  vmsbc.vv v24, v16, v8
  vmsbc.vv v31, v30, v29
1:
# vmsbc.vx
1:
  vmsbc.vx v1, v2, a1
  vmsbc.vx v24, v16, sp
  vmsbc.vx v31, v30, t6
1:
# vmulhsu.vv
1:
  vmulhsu.vv v1, v2, v3
  vmulhsu.vv v24, v16, v8, v0.t
  vmulhsu.vv v31, v30, v29
1:
# vmulhsu.vx
1:
  vmulhsu.vx v1, v2, a1
  vmulhsu.vx v24, v16, sp, v0.t
  vmulhsu.vx v31, v30, t6
1:
# vzext.vf8
1:
  vzext.vf8 v1, v2
  vzext.vf8 v24, v16, v0.t
  vzext.vf8 v31, v30
1:
# vsext.vf8
1:
  vsext.vf8 v1, v2
  vsext.vf8 v24, v16, v0.t
  vsext.vf8 v31, v30
1:
# vzext.vf4
1:
  vzext.vf4 v1, v2
  vzext.vf4 v24, v16, v0.t
  vzext.vf4 v31, v30
1:
# vsext.vf4
1:
  vsext.vf4 v1, v2
  vsext.vf4 v24, v16, v0.t
  vsext.vf4 v31, v30
1:
# vzext.vf2
1:
  vzext.vf2 v1, v2
  vzext.vf2 v24, v16, v0.t
  vzext.vf2 v31, v30
1:
# vsext.vf2
1:
  vsext.vf2 v1, v2
  vsext.vf2 v24, v16, v0.t
  vsext.vf2 v31, v30
1:
# vwaddu.vv
1:
  vwaddu.vv v1, v2, v3
  vwaddu.vv v24, v16, v8, v0.t
  vwaddu.vv v31, v30, v29
1:
# vwaddu.vx
1:
  vwaddu.vx v1, v2, a1
  vwaddu.vx v24, v16, sp, v0.t
  vwaddu.vx v31, v30, t6
1:
# vwadd.vv
1:
  vwadd.vv v1, v2, v3
  vwadd.vv v24, v16, v8, v0.t
  vwadd.vv v31, v30, v29
1:
# vwadd.vx
1:
  vwadd.vx v1, v2, a1
  vwadd.vx v24, v16, sp, v0.t
  vwadd.vx v31, v30, t6
1:
# vwsubu.vv
1:
  vwsubu.vv v1, v2, v3
  vwsubu.vv v24, v16, v8, v0.t
  vwsubu.vv v31, v30, v29
1:
# vwsubu.vx
1:
  vwsubu.vx v1, v2, a1
  vwsubu.vx v24, v16, sp, v0.t
  vwsubu.vx v31, v30, t6
1:
# vwsub.vv
1:
  vwsub.vv v1, v2, v3
  vwsub.vv v24, v16, v8, v0.t
  vwsub.vv v31, v30, v29
1:
# vwsub.vx
1:
  vwsub.vx v1, v2, a1
  vwsub.vx v24, v16, sp, v0.t
  vwsub.vx v31, v30, t6
1:
# vwaddu.wv
1:
  vwaddu.wv v1, v2, v3
  vwaddu.wv v24, v16, v8, v0.t
  vwaddu.wv v31, v30, v29
1:
# vwaddu.wx
1:
  vwaddu.wx v1, v2, a1
  vwaddu.wx v24, v16, sp, v0.t
  vwaddu.wx v31, v30, t6
1:
# vwadd.wv
1:
  vwadd.wv v1, v2, v3
  vwadd.wv v24, v16, v8, v0.t
  vwadd.wv v31, v30, v29
1:
# vwadd.wx
1:
  vwadd.wx v1, v2, a1
  vwadd.wx v24, v16, sp, v0.t
  vwadd.wx v31, v30, t6
1:
# vwsubu.wv
1:
  vwsubu.wv v1, v2, v3
  vwsubu.wv v24, v16, v8, v0.t
  vwsubu.wv v31, v30, v29
1:
# vwsubu.wx
1:
  vwsubu.wx v1, v2, a1
  vwsubu.wx v24, v16, sp, v0.t
  vwsubu.wx v31, v30, t6
1:
# vwsub.wv
1:
  vwsub.wv v1, v2, v3
  vwsub.wv v24, v16, v8, v0.t
  vwsub.wv v31, v30, v29
1:
# vwsub.wx
1:
  vwsub.wx v1, v2, a1
  vwsub.wx v24, v16, sp, v0.t
  vwsub.wx v31, v30, t6
1:
# vwmulu.vv
1:
  vwmulu.vv v1, v2, v3
  vwmulu.vv v24, v16, v8, v0.t
  vwmulu.vv v31, v30, v29
1:
# vwmulu.vx
1:
  vwmulu.vx v1, v2, a1
  vwmulu.vx v24, v16, sp, v0.t
  vwmulu.vx v31, v30, t6
1:
# vwmulsu.vv
1:
  vwmulsu.vv v1, v2, v3
  vwmulsu.vv v24, v16, v8, v0.t
  vwmulsu.vv v31, v30, v29
1:
# vwmulsu.vx
1:
  vwmulsu.vx v1, v2, a1
  vwmulsu.vx v24, v16, sp, v0.t
  vwmulsu.vx v31, v30, t6
1:
# vwmul.vv
1:
  vwmul.vv v1, v2, v3
  vwmul.vv v24, v16, v8, v0.t
  vwmul.vv v31, v30, v29
1:
# vwmul.vx
1:
  vwmul.vx v1, v2, a1
  vwmul.vx v24, v16, sp, v0.t
  vwmul.vx v31, v30, t6
1:
# vwmaccu.vv
1:
  vwmaccu.vv v1, v3, v2
  vwmaccu.vv v24, v8, v16, v0.t
  vwmaccu.vv v31, v29, v30
1:
# vwmaccu.vx
1:
  vwmaccu.vx v1, a1, v2
  vwmaccu.vx v24, sp, v16, v0.t
  vwmaccu.vx v31, t6, v30
1:
# vwmacc.vv
1:
  vwmacc.vv v1, v3, v2
  vwmacc.vv v24, v8, v16, v0.t
  vwmacc.vv v31, v29, v30
1:
# vwmacc.vx
1:
  vwmacc.vx v1, a1, v2
  vwmacc.vx v24, sp, v16, v0.t
  vwmacc.vx v31, t6, v30
1:
# vwmaccus.vx
1:
  vwmaccus.vx v1, a1, v2
  vwmaccus.vx v24, sp, v16, v0.t
  vwmaccus.vx v31, t6, v30
1:
# vwmaccsu.vv
1:
  vwmaccsu.vv v1, v3, v2
  vwmaccsu.vv v24, v8, v16, v0.t
  vwmaccsu.vv v31, v29, v30
1:
# vwmaccsu.vx
1:
  vwmaccsu.vx v1, a1, v2
  vwmaccsu.vx v24, sp, v16, v0.t
  vwmaccsu.vx v31, t6, v30
1:
# vnsrl.wv
1:
  vnsrl.wv v1, v2, v3
  vnsrl.wv v24, v16, v8, v0.t
  vnsrl.wv v31, v30, v29
1:
# vnsrl.wx
1:
  vnsrl.wx v1, v2, a1
  vnsrl.wx v24, v16, sp, v0.t
  vnsrl.wx v31, v30, t6
1:
# vnsrl.wi
1:
  vnsrl.wi v1, v2, 0
  vnsrl.wi v24, v16, 31, v0.t
  vnsrl.wi v31, v30, 7
1:
# vnsra.wv
1:
  vnsra.wv v1, v2, v3
  vnsra.wv v24, v16, v8, v0.t
  vnsra.wv v31, v30, v29
1:
# vnsra.wx
1:
  vnsra.wx v1, v2, a1
  vnsra.wx v24, v16, sp, v0.t
  vnsra.wx v31, v30, t6
1:
# vnsra.wi
1:
  vnsra.wi v1, v2, 0
  vnsra.wi v24, v16, 31, v0.t
  vnsra.wi v31, v30, 7
1:
# vnclipu.wv
1:
  vnclipu.wv v1, v2, v3
  vnclipu.wv v24, v16, v8, v0.t
  vnclipu.wv v31, v30, v29
1:
# vnclipu.wx
1:
  vnclipu.wx v1, v2, a1
  vnclipu.wx v24, v16, sp, v0.t
  vnclipu.wx v31, v30, t6
1:
# vnclipu.wi
1:
  vnclipu.wi v1, v2, 0
  vnclipu.wi v24, v16, 31, v0.t
  vnclipu.wi v31, v30, 7
1:
# vnclip.wv
1:
  vnclip.wv v1, v2, v3
  vnclip.wv v24, v16, v8, v0.t
  vnclip.wv v31, v30, v29
1:
# vnclip.wx
1:
  vnclip.wx v1, v2, a1
  vnclip.wx v24, v16, sp, v0.t
  vnclip.wx v31, v30, t6
1:
# vnclip.wi
1:
  vnclip.wi v1, v2, 0
  vnclip.wi v24, v16, 31, v0.t
  vnclip.wi v31, v30, 7
1:
# vsaddu.vv
1:
  vsaddu.vv v1, v2, v3
  vsaddu.vv v24, v16, v8, v0.t
  vsaddu.vv v31, v30, v29
1:
# vsaddu.vx
1:
  vsaddu.vx v1, v2, a1
  vsaddu.vx v24, v16, sp, v0.t
  vsaddu.vx v31, v30, t6
1:
# vsaddu.vi
1:
  vsaddu.vi v1, v2, 5
  vsaddu.vi v24, v16, -16, v0.t
  vsaddu.vi v31, v30, 15
1:
# vsadd.vv
1:
  vsadd.vv v1, v2, v3
  vsadd.vv v24, v16, v8, v0.t
  vsadd.vv v31, v30, v29
1:
# vsadd.vx
1:
  vsadd.vx v1, v2, a1
  vsadd.vx v24, v16, sp, v0.t
  vsadd.vx v31, v30, t6
1:
# vsadd.vi
1:
  vsadd.vi v1, v2, 5
  vsadd.vi v24, v16, -16, v0.t
  vsadd.vi v31, v30, 15
1:
# vssubu.vv
1:
  vssubu.vv v1, v2, v3
  vssubu.vv v24, v16, v8, v0.t
  vssubu.vv v31, v30, v29
1:
# vssubu.vx
1:
  vssubu.vx v1, v2, a1
  vssubu.vx v24, v16, sp, v0.t
  vssubu.vx v31, v30, t6
1:
# vssub.vv
1:
  vssub.vv v1, v2, v3
  vssub.vv v24, v16, v8, v0.t
  vssub.vv v31, v30, v29
1:
# vssub.vx
1:
  vssub.vx v1, v2, a1
  vssub.vx v24, v16, sp, v0.t
  vssub.vx v31, v30, t6
1:
# vaaddu.vv
1:
  vaaddu.vv v1, v2, v3
  vaaddu.vv v24, v16, v8, v0.t
  vaaddu.vv v31, v30, v29
1:
# vaaddu.vx
1:
  vaaddu.vx v1, v2, a1
  vaaddu.vx v24, v16, sp, v0.t
  vaaddu.vx v31, v30, t6
1:
# vaadd.vv
1:
  vaadd.vv v1, v2, v3
  vaadd.vv v24, v16, v8, v0.t
  vaadd.vv v31, v30, v29
1:
# vaadd.vx
1:
  vaadd.vx v1, v2, a1
  vaadd.vx v24, v16, sp, v0.t
  vaadd.vx v31, v30, t6
1:
# vasubu.vv
1:
  vasubu.vv v1, v2, v3
  vasubu.vv v24, v16, v8, v0.t
  vasubu.vv v31, v30, v29
1:
# vasubu.vx
1:
  vasubu.vx v1, v2, a1
  vasubu.vx v24, v16, sp, v0.t
  vasubu.vx v31, v30, t6
1:
# vasub.vv
1:
  vasub.vv v1, v2, v3
  vasub.vv v24, v16, v8, v0.t
  vasub.vv v31, v30, v29
1:
# vasub.vx
1:
  vasub.vx v1, v2, a1
  vasub.vx v24, v16, sp, v0.t
  vasub.vx v31, v30, t6
1:
# vsmul.vv
1:
  vsmul.vv v1, v2, v3
  vsmul.vv v24, v16, v8, v0.t
  vsmul.vv v31, v30, v29
1:
# vsmul.vx
1:
  vsmul.vx v1, v2, a1
  vsmul.vx v24, v16, sp, v0.t
  vsmul.vx v31, v30, t6
1:
# vssrl.vv
1:
  vssrl.vv v1, v2, v3
  vssrl.vv v24, v16, v8, v0.t
  vssrl.vv v31, v30, v29
1:
# vssrl.vx
1:
  vssrl.vx v1, v2, a1
  vssrl.vx v24, v16, sp, v0.t
  vssrl.vx v31, v30, t6
1:
# vssrl.vi
1:
  vssrl.vi v1, v2, 0
  vssrl.vi v24, v16, 31, v0.t
  vssrl.vi v31, v30, 7
1:
# vssra.vv
1:
  vssra.vv v1, v2, v3
  vssra.vv v24, v16, v8, v0.t
  vssra.vv v31, v30, v29
1:
# vssra.vx
1:
  vssra.vx v1, v2, a1
  vssra.vx v24, v16, sp, v0.t
  vssra.vx v31, v30, t6
1:
# vssra.vi
1:
  vssra.vi v1, v2, 0
  vssra.vi v24, v16, 31, v0.t
  vssra.vi v31, v30, 7
1:
# vwredsumu.vs
1:
  vwredsumu.vs v1, v2, v3
  vwredsumu.vs v24, v16, v8, v0.t
  vwredsumu.vs v31, v30, v29
1:
# vwredsum.vs
1:
  vwredsum.vs v1, v2, v3
  vwredsum.vs v24, v16, v8, v0.t
  vwredsum.vs v31, v30, v29
1:
# vfwredusum.vs
1:
  vfwredusum.vs v1, v2, v3
  vfwredusum.vs v24, v16, v8, v0.t
  vfwredusum.vs v31, v30, v29
1:
# vfwredosum.vs
1:
  vfwredosum.vs v1, v2, v3
  vfwredosum.vs v24, v16, v8, v0.t
  vfwredosum.vs v31, v30, v29
1:
# vfwadd.vv
1:
  vfwadd.vv v1, v2, v3
  vfwadd.vv v24, v16, v8, v0.t
  vfwadd.vv v31, v30, v29
1:
# vfwadd.vf
1:
  vfwadd.vf v1, v2, fa1
  vfwadd.vf v24, v16, ft0, v0.t
  vfwadd.vf v31, v30, fs11
1:
# vfwsub.vv
1:
  vfwsub.vv v1, v2, v3
  vfwsub.vv v24, v16, v8, v0.t
  vfwsub.vv v31, v30, v29
1:
# vfwsub.vf
1:
  vfwsub.vf v1, v2, fa1
  vfwsub.vf v24, v16, ft0, v0.t
  vfwsub.vf v31, v30, fs11
1:
# vfwmul.vv
1:
  vfwmul.vv v1, v2, v3
  vfwmul.vv v24, v16, v8, v0.t
  vfwmul.vv v31, v30, v29
1:
# vfwmul.vf
1:
  vfwmul.vf v1, v2, fa1
  vfwmul.vf v24, v16, ft0, v0.t
  vfwmul.vf v31, v30, fs11
1:
# vfwadd.wv
1:
  vfwadd.wv v1, v2, v3
  vfwadd.wv v24, v16, v8, v0.t
  vfwadd.wv v31, v30, v29
1:
# vfwadd.wf
1:
  vfwadd.wf v1, v2, fa1
  vfwadd.wf v24, v16, ft0, v0.t
  vfwadd.wf v31, v30, fs11
1:
# vfwsub.wv
1:
  vfwsub.wv v1, v2, v3
  vfwsub.wv v24, v16, v8, v0.t
  vfwsub.wv v31, v30, v29
1:
# vfwsub.wf
1:
  vfwsub.wf v1, v2, fa1
  vfwsub.wf v24, v16, ft0, v0.t
  vfwsub.wf v31, v30, fs11
1:
# vfwmacc.vv
1:
  vfwmacc.vv v1, v3, v2
  vfwmacc.vv v24, v8, v16, v0.t
  vfwmacc.vv v31, v29, v30
1:
# vfwmacc.vf
1:
  vfwmacc.vf v1, fa1, v2
  vfwmacc.vf v24, ft0, v16, v0.t
  vfwmacc.vf v31, fs11, v30
1:
# vfwnmacc.vv
1:
  vfwnmacc.vv v1, v3, v2
  vfwnmacc.vv v24, v8, v16, v0.t
  vfwnmacc.vv v31, v29, v30
1:
# vfwnmacc.vf
1:
  vfwnmacc.vf v1, fa1, v2
  vfwnmacc.vf v24, ft0, v16, v0.t
  vfwnmacc.vf v31, fs11, v30
1:
# vfwmsac.vv
1:
  vfwmsac.vv v1, v3, v2
  vfwmsac.vv v24, v8, v16, v0.t
  vfwmsac.vv v31, v29, v30
1:
# vfwmsac.vf
1:
  vfwmsac.vf v1, fa1, v2
  vfwmsac.vf v24, ft0, v16, v0.t
  vfwmsac.vf v31, fs11, v30
1:
# vfwnmsac.vv
1:
  vfwnmsac.vv v1, v3, v2
  vfwnmsac.vv v24, v8, v16, v0.t
  vfwnmsac.vv v31, v29, v30
1:
# vfwnmsac.vf
1:
  vfwnmsac.vf v1, fa1, v2
  vfwnmsac.vf v24, ft0, v16, v0.t
  vfwnmsac.vf v31, fs11, v30
1:
# vfrsqrt7.v
1:
  vfrsqrt7.v v1, v2
  vfrsqrt7.v v24, v16, v0.t
  vfrsqrt7.v v31, v30
1:
# vfrec7.v
1:
  vfrec7.v v1, v2
  vfrec7.v v24, v16, v0.t
  vfrec7.v v31, v30
1:
# vfclass.v
1:
  vfclass.v v1, v2
  vfclass.v v24, v16, v0.t
  vfclass.v v31, v30
1:
# vfcvt.rtz.xu.f.v
1:
  vfcvt.rtz.xu.f.v v1, v2
  vfcvt.rtz.xu.f.v v24, v16, v0.t
  vfcvt.rtz.xu.f.v v31, v30
1:
# vfwcvt.xu.f.v
1:
  vfwcvt.xu.f.v v1, v2
  vfwcvt.xu.f.v v24, v16, v0.t
  vfwcvt.xu.f.v v31, v30
1:
# vfwcvt.x.f.v
1:
  vfwcvt.x.f.v v1, v2
  vfwcvt.x.f.v v24, v16, v0.t
  vfwcvt.x.f.v v31, v30
1:
# vfwcvt.f.xu.v
1:
  vfwcvt.f.xu.v v1, v2
  vfwcvt.f.xu.v v24, v16, v0.t
  vfwcvt.f.xu.v v31, v30
1:
# vfwcvt.f.x.v
1:
  vfwcvt.f.x.v v1, v2
  vfwcvt.f.x.v v24, v16, v0.t
  vfwcvt.f.x.v v31, v30
1:
# vfwcvt.f.f.v
1:
  vfwcvt.f.f.v v1, v2
  vfwcvt.f.f.v v24, v16, v0.t
  vfwcvt.f.f.v v31, v30
1:
# vfwcvt.rtz.xu.f.v
1:
  vfwcvt.rtz.xu.f.v v1, v2
  vfwcvt.rtz.xu.f.v v24, v16, v0.t
  vfwcvt.rtz.xu.f.v v31, v30
1:
# vfwcvt.rtz.x.f.v
1:
  vfwcvt.rtz.x.f.v v1, v2
  vfwcvt.rtz.x.f.v v24, v16, v0.t
  vfwcvt.rtz.x.f.v v31, v30
1:
# vfncvt.xu.f.w
1:
  vfncvt.xu.f.w v1, v2
  vfncvt.xu.f.w v24, v16, v0.t
  vfncvt.xu.f.w v31, v30
1:
# vfncvt.x.f.w
1:
  vfncvt.x.f.w v1, v2
  vfncvt.x.f.w v24, v16, v0.t
  vfncvt.x.f.w v31, v30
1:
# vfncvt.f.xu.w
1:
  vfncvt.f.xu.w v1, v2
  vfncvt.f.xu.w v24, v16, v0.t
  vfncvt.f.xu.w v31, v30
1:
# vfncvt.f.x.w
1:
  vfncvt.f.x.w v1, v2
  vfncvt.f.x.w v24, v16, v0.t
  vfncvt.f.x.w v31, v30
1:
# vfncvt.f.f.w
1:
  vfncvt.f.f.w v1, v2
  vfncvt.f.f.w v24, v16, v0.t
  vfncvt.f.f.w v31, v30
1:
# vfncvt.rod.f.f.w
1:
  vfncvt.rod.f.f.w v1, v2
  vfncvt.rod.f.f.w v24, v16, v0.t
  vfncvt.rod.f.f.w v31, v30
1:
# vfncvt.rtz.xu.f.w
1:
  vfncvt.rtz.xu.f.w v1, v2
  vfncvt.rtz.xu.f.w v24, v16, v0.t
  vfncvt.rtz.xu.f.w v31, v30
1:
# vfncvt.rtz.x.f.w
1:
  vfncvt.rtz.x.f.w v1, v2
  vfncvt.rtz.x.f.w v24, v16, v0.t
  vfncvt.rtz.x.f.w v31, v30
1:
# vrgatherei16.vv
1:
  vrgatherei16.vv v1, v2, v3
  vrgatherei16.vv v24, v16, v8, v0.t
  vrgatherei16.vv v31, v30, v29
1:
# vmv1r.v
1:
  vmv1r.v v1, v2
  vmv1r.v v24, v16
  vmv1r.v v31, v30
1:
# vmv2r.v
1:
  vmv2r.v v1, v2
  vmv2r.v v24, v16
  vmv2r.v v31, v30
1:
# vmv4r.v
1:
  vmv4r.v v1, v2
  vmv4r.v v24, v16
  vmv4r.v v31, v30
1:
# vmv8r.v
1:
  vmv8r.v v1, v2
  vmv8r.v v24, v16
  vmv8r.v v31, v30
1:
# vsetvli
1:
  vsetvli a0, a1, e32, m4, ta, ma
  vsetvli t0, sp, e8, mf8, tu, mu
  vsetvli x31, t6, e64, m1, ta, mu
1:
# vsetivli
1:
  vsetivli a0, 0, e32, m4, ta, ma
  vsetivli t0, 31, e8, mf8, tu, mu
  vsetivli x31, 8, e64, m1, ta, mu
1:
# vsetvl
1:
  vsetvl a0, a1, a2
  vsetvl t0, sp, s0
  vsetvl x31, t6, zero
1:
# pseudo-instructions
1:
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
  beqz a0, 1b
  bnez a1, 1f
  bgez a2, 1b
  bltz a3, 1b
  blez a4, 1b
  bgtz a5, 1b
  bgt a0, a1, 1b
  ble a0, a1, 1b
  bgtu a0, a1, 1b
  bleu a0, a1, 1b
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
  fence
  sext.w a0, a1
  zext.b a0, a1
  negw a0, a1
  not a0, a1
  seqz a0, a1
  snez a0, a1
  sltz a0, a1
  sgtz a0, a1
  fmv.s fa0, fa1
  fmv.d fa0, fa1
  fneg.s fa0, fa1
  fneg.d fa0, fa1
  fabs.s fa0, fa1
  fabs.d fa0, fa1
  csrr a0, vlenb
  csrr a1, vl
  csrr a2, vtype
  csrr a3, vxrm
  csrr a4, vxsat
  csrw vxrm, a0
  csrs vcsr, a1
  csrc vxsat, a2
  csrwi vxrm, 2
  csrsi vxsat, 1
  csrci vxsat, 1
  frrm a0
  fsrm a0
  fsrm a1, a0
  frflags a0
  fsflags a0
  frcsr a0
  fscsr a0
  fsrmi a0, 2
  fsflagsi a0, 1
  rdcycle a0
  rdinstret a1
  rdtime a2
  vwcvt.x.x.v v2, v4
  vwcvtu.x.x.v v2, v4, v0.t
  vncvt.x.x.w v2, v4
  vl1r.v v1, (a0)
  vl2r.v v2, (a0)
  vl4r.v v4, (a0)
  vl8r.v v8, (a0)
1:
fwd:
  ecall
