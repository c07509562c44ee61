# Compiled Q15 filter: clang-16 output of a C kernel of our own, unchanged below this header.
# Source: tests/reference/kernels/fir.c (an 8-tap int16 FIR with rounding and saturation, and a
# saturating add) with runtime.h, compiled by clang-16 --target=riscv64-unknown-elf -march=rv64gcv -O2
# -ffreestanding -nostdlib -S. Mixed widths: vsext.vf2, vwmul.vv, vnsrl.wi, vsadd.vv.
	.text
	.attribute	4, 16
	.attribute	5, "rv64i2p0_m2p0_a2p0_f2p0_d2p0_c2p0_v1p0_zve32f1p0_zve32x1p0_zve64d1p0_zve64f1p0_zve64x1p0_zvl128b1p0_zvl32b1p0_zvl64b1p0"
	.file	"fir.c"
	.globl	fir
	.p2align	1
	.type	fir,@function
fir:
	blez	a0, .LBB0_15
	csrr	t0, vlenb
	srli	a4, t0, 1
	li	a5, 8
	bltu	a5, a4, .LBB0_3
	li	a4, 8
.LBB0_3:
	bltu	a0, a4, .LBB0_5
	slli	a4, a0, 1
	add	a5, a3, a4
	add	a4, a4, a1
	addi	a4, a4, 14
	addi	a6, a2, 16
	sltu	a7, a3, a4
	sltu	a4, a1, a5
	and	a7, a7, a4
	sltu	a4, a3, a6
	sltu	a5, a2, a5
	and	a4, a4, a5
	or	a4, a7, a4
	beqz	a4, .LBB0_12
.LBB0_5:
	li	a7, 0
.LBB0_6:
	sub	a0, a0, a7
	slli	a7, a7, 1
	add	a1, a1, a7
	add	a3, a3, a7
	lui	a4, 4
	vsetivli	zero, 8, e32, m1, ta, ma
	vmv.s.x	v8, a4
	lui	a4, 8
	addiw	a6, a4, -1
	lui	a4, 1048568
	j	.LBB0_8
.LBB0_7:
	sh	a5, 0(a3)
	addi	a0, a0, -1
	addi	a1, a1, 2
	addi	a3, a3, 2
	beqz	a0, .LBB0_15
.LBB0_8:
	vsetivli	zero, 8, e16, m1, ta, ma
	vle16.v	v9, (a1)
	vle16.v	v10, (a2)
	vwmul.vv	v12, v10, v9
	vsetvli	zero, zero, e32, m2, ta, ma
	vredsum.vs	v9, v12, v8
	vmv.x.s	a5, v9
	srai	a5, a5, 15
	blt	a4, a5, .LBB0_10
	lui	a5, 1048568
.LBB0_10:
	blt	a5, a6, .LBB0_7
	mv	a5, a6
	j	.LBB0_7
.LBB0_12:
	li	t5, 0
	srli	t3, t0, 1
	addi	a5, t3, -1
	and	a6, a0, a5
	sub	a7, a0, a6
	vsetvli	a5, zero, e32, m2, ta, ma
	vlse16.v	v10, (a2), zero
	addi	a5, a2, 2
	vlse16.v	v12, (a5), zero
	addi	a5, a2, 4
	vlse16.v	v14, (a5), zero
	addi	a5, a2, 6
	vlse16.v	v16, (a5), zero
	vsext.vf2	v8, v10
	vsext.vf2	v10, v12
	vsext.vf2	v12, v14
	vsext.vf2	v14, v16
	addi	a5, a2, 8
	vlse16.v	v18, (a5), zero
	addi	a5, a2, 10
	vlse16.v	v20, (a5), zero
	addi	a5, a2, 12
	vlse16.v	v22, (a5), zero
	addi	a5, a2, 14
	vlse16.v	v24, (a5), zero
	vsext.vf2	v16, v18
	vsext.vf2	v18, v20
	vsext.vf2	v20, v22
	vsext.vf2	v22, v24
	lui	t1, 4
	lui	t2, 1048568
	lui	t4, 8
	addiw	t4, t4, -1
	mv	t6, a7
.LBB0_13:
	add	a5, a1, t5
	vl1re16.v	v24, (a5)
	vsetvli	zero, zero, e32, m2, ta, ma
	addi	a4, a5, 2
	vl1re16.v	v25, (a4)
	vsext.vf2	v26, v24
	vmul.vv	v26, v8, v26
	vsext.vf2	v28, v25
	addi	a4, a5, 4
	vl1re16.v	v24, (a4)
	addi	a4, a5, 6
	vl1re16.v	v25, (a4)
	vmadd.vv	v28, v10, v26
	vsext.vf2	v26, v24
	vmadd.vv	v26, v12, v28
	vsext.vf2	v28, v25
	addi	a4, a5, 8
	vl1re16.v	v24, (a4)
	addi	a4, a5, 10
	vl1re16.v	v25, (a4)
	vmadd.vv	v28, v14, v26
	vsext.vf2	v26, v24
	vmadd.vv	v26, v16, v28
	vsext.vf2	v28, v25
	addi	a4, a5, 12
	vl1re16.v	v24, (a4)
	addi	a5, a5, 14
	vl1re16.v	v25, (a5)
	vmadd.vv	v28, v18, v26
	vsext.vf2	v26, v24
	vmadd.vv	v26, v20, v28
	vsext.vf2	v28, v25
	vmadd.vv	v28, v22, v26
	vadd.vx	v24, v28, t1
	vsra.vi	v24, v24, 15
	vmax.vx	v24, v24, t2
	vmin.vx	v24, v24, t4
	vsetvli	zero, zero, e16, m1, ta, ma
	vnsrl.wi	v26, v24, 0
	add	a4, a3, t5
	vs1r.v	v26, (a4)
	sub	t6, t6, t3
	add	t5, t5, t0
	bnez	t6, .LBB0_13
	bnez	a6, .LBB0_6
.LBB0_15:
	ret
.Lfunc_end0:
	.size	fir, .Lfunc_end0-fir

	.globl	addsat
	.p2align	1
	.type	addsat,@function
addsat:
	blez	a0, .LBB1_13
	csrr	t1, vlenb
	bltu	a0, t1, .LBB1_3
	slli	t0, t1, 1
	sub	a4, a3, a1
	sltu	a4, a4, t0
	sub	a5, a3, a2
	sltu	a5, a5, t0
	or	a4, a4, a5
	beqz	a4, .LBB1_10
.LBB1_3:
	li	a6, 0
.LBB1_4:
	slli	a4, a6, 1
	add	a3, a3, a4
	add	a2, a2, a4
	add	a1, a1, a4
	sub	a0, a0, a6
	lui	a4, 8
	addiw	a6, a4, -1
	j	.LBB1_6
.LBB1_5:
	sh	a5, 0(a3)
	addi	a3, a3, 2
	addi	a2, a2, 2
	addi	a0, a0, -1
	addi	a1, a1, 2
	beqz	a0, .LBB1_13
.LBB1_6:
	lh	a4, 0(a1)
	lh	a5, 0(a2)
	add	a5, a5, a4
	blt	a5, a6, .LBB1_8
	mv	a5, a6
.LBB1_8:
	lui	a4, 1048568
	blt	a4, a5, .LBB1_5
	lui	a5, 1048568
	j	.LBB1_5
.LBB1_10:
	addi	a4, t1, -1
	and	a7, a0, a4
	sub	a6, a0, a7
	vsetvli	a4, zero, e16, m1, ta, ma
	mv	t2, a6
	mv	t3, a3
	mv	t4, a2
	mv	a4, a1
.LBB1_11:
	vl1re16.v	v8, (a4)
	add	a5, a4, t1
	vl1re16.v	v9, (a5)
	vl1re16.v	v10, (t4)
	add	a5, t4, t1
	vl1re16.v	v11, (a5)
	vsadd.vv	v8, v8, v10
	vsadd.vv	v9, v9, v11
	vs1r.v	v8, (t3)
	add	a5, t3, t1
	vs1r.v	v9, (a5)
	add	a4, a4, t0
	add	t4, t4, t0
	sub	t2, t2, t1
	add	t3, t3, t0
	bnez	t2, .LBB1_11
	bnez	a7, .LBB1_4
.LBB1_13:
	ret
.Lfunc_end1:
	.size	addsat, .Lfunc_end1-addsat

	.section	.sdata,"aw",@progbits
	.p2align	3
.LCPI2_0:
	.quad	6364136223846793005
.LCPI2_1:
	.quad	1442695040888963407
	.text
	.globl	_start
	.p2align	1
	.type	_start,@function
_start:
	addi	sp, sp, -32
	sd	ra, 24(sp)
	sd	s0, 16(sp)
	sd	s1, 8(sp)
	lui	a0, %hi(.LCPI2_0)
	ld	a0, %lo(.LCPI2_0)(a0)
	lui	a1, %hi(.LCPI2_1)
	ld	s1, %lo(.LCPI2_1)(a1)
	lui	a2, %hi(rt_state)
	ld	a2, %lo(rt_state)(a2)
	lui	a3, %hi(in)
	addi	a3, a3, %lo(in)
	li	a4, 488
.LBB2_1:
	mul	a2, a2, a0
	add	a2, a2, s1
	srli	a5, a2, 32
	sh	a5, 0(a3)
	addi	a4, a4, -1
	addi	a3, a3, 2
	bnez	a4, .LBB2_1
	lui	a3, %hi(s2)
	addi	a3, a3, %lo(s2)
	lui	a4, %hi(s1)
	addi	a4, a4, %lo(s1)
	li	a5, 480
.LBB2_3:
	mul	a2, a2, a0
	add	a1, a2, s1
	srli	a2, a1, 32
	sh	a2, 0(a4)
	mul	a2, a1, a0
	add	a2, a2, s1
	srli	a1, a2, 32
	sh	a1, 0(a3)
	addi	a3, a3, 2
	addi	a5, a5, -1
	addi	a4, a4, 2
	bnez	a5, .LBB2_3
	lui	a0, %hi(rt_state)
	sd	a2, %lo(rt_state)(a0)
	lui	a0, %hi(in)
	addi	a1, a0, %lo(in)
	lui	a0, %hi(taps)
	addi	a2, a0, %lo(taps)
	lui	a0, %hi(out)
	addi	s0, a0, %lo(out)
	li	a0, 480
	mv	a3, s0
	call	fir
	lui	a0, %hi(s1)
	addi	a1, a0, %lo(s1)
	lui	a0, %hi(s2)
	addi	a2, a0, %lo(s2)
	lui	a0, %hi(sat)
	addi	s1, a0, %lo(sat)
	li	a0, 480
	mv	a3, s1
	call	addsat
	li	a2, 960
	li	a7, 64
	li	a0, 1
	mv	a1, s0
	#APP
	ecall	
	#NO_APP
	li	a2, 960
	li	a7, 64
	li	a0, 1
	mv	a1, s1
	#APP
	ecall	
	#NO_APP
	li	a7, 93
	li	a0, 0
	#APP
	ecall	
	#NO_APP
.LBB2_5:
	j	.LBB2_5
.Lfunc_end2:
	.size	_start, .Lfunc_end2-_start

	.type	in,@object
	.bss
	.globl	in
	.p2align	1, 0x0
in:
	.zero	976
	.size	in, 976

	.type	s1,@object
	.globl	s1
	.p2align	1, 0x0
s1:
	.zero	960
	.size	s1, 960

	.type	s2,@object
	.globl	s2
	.p2align	1, 0x0
s2:
	.zero	960
	.size	s2, 960

	.type	taps,@object
	.section	.rodata,"a",@progbits
	.p2align	1, 0x0
taps:
	.half	1024
	.half	63488
	.half	4096
	.half	12000
	.half	12000
	.half	4096
	.half	63488
	.half	1024
	.size	taps, 16

	.type	out,@object
	.bss
	.globl	out
	.p2align	1, 0x0
out:
	.zero	960
	.size	out, 960

	.type	sat,@object
	.globl	sat
	.p2align	1, 0x0
sat:
	.zero	960
	.size	sat, 960

	.type	rt_state,@object
	.section	.sdata,"aw",@progbits
	.p2align	3
rt_state:
	.quad	2685821657736338717
	.size	rt_state, 8

	.ident	"Debian clang version 16.0.6 (15~deb12u1)"
	.section	".note.GNU-stack","",@progbits
	.addrsig
	.addrsig_sym in
	.addrsig_sym s1
	.addrsig_sym s2
	.addrsig_sym taps
	.addrsig_sym out
	.addrsig_sym sat
