# Compiled daxpy: clang-16 output of a C kernel of our own, unchanged below this header.
# Source: tests/reference/kernels/daxpy.c (y += a x in binary64, N = 203, two calls) with runtime.h,
# compiled by clang-16 --target=riscv64-unknown-elf -march=rv64gcv -O2 -ffreestanding -nostdlib -S.
# It starts at _start, fills x and y, calls daxpy twice and writes y and x with the write system call;
# the vector loop uses whole-register loads and stores (vl1re64.v, vs1r.v) sized by csrr vlenb.
	.text
	.attribute	4, 16
	.attribute	5, "rv64i2p0_m2p0_a2p0_f2p0_d2p0_c2p0_v1p0_zve32f1p0_zve32x1p0_zve64d1p0_zve64f1p0_zve64x1p0_zvl128b1p0_zvl32b1p0_zvl64b1p0"
	.file	"daxpy.c"
	.globl	daxpy
	.p2align	1
	.type	daxpy,@function
daxpy:
	blez	a0, .LBB0_8
	csrr	t1, vlenb
	srli	a3, t1, 3
	li	a4, 8
	bltu	a4, a3, .LBB0_3
	li	a3, 8
.LBB0_3:
	bltu	a0, a3, .LBB0_5
	slli	a3, a0, 3
	add	a4, a2, a3
	add	a3, a3, a1
	sltu	a3, a2, a3
	sltu	a4, a1, a4
	and	a3, a3, a4
	beqz	a3, .LBB0_9
.LBB0_5:
	li	a7, 0
.LBB0_6:
	sub	a0, a0, a7
	slli	a7, a7, 3
	add	a2, a2, a7
	add	a1, a1, a7
.LBB0_7:
	fld	ft0, 0(a1)
	fld	ft1, 0(a2)
	fmadd.d	ft0, fa0, ft0, ft1
	fsd	ft0, 0(a2)
	addi	a0, a0, -1
	addi	a2, a2, 8
	addi	a1, a1, 8
	bnez	a0, .LBB0_7
.LBB0_8:
	ret
.LBB0_9:
	srli	t0, t1, 3
	addi	a3, t0, -1
	and	a6, a0, a3
	sub	a7, a0, a6
	vsetvli	a3, zero, e64, m1, ta, ma
	vfmv.v.f	v8, fa0
	mv	a4, a7
	mv	a3, a2
	mv	a5, a1
.LBB0_10:
	vl1re64.v	v9, (a5)
	vl1re64.v	v10, (a3)
	vfmacc.vv	v10, v8, v9
	vs1r.v	v10, (a3)
	add	a5, a5, t1
	sub	a4, a4, t0
	add	a3, a3, t1
	bnez	a4, .LBB0_10
	bnez	a6, .LBB0_6
	j	.LBB0_8
.Lfunc_end0:
	.size	daxpy, .Lfunc_end0-daxpy

	.section	.sdata,"aw",@progbits
	.p2align	3
.LCPI1_0:
	.quad	6364136223846793005
.LCPI1_1:
	.quad	1442695040888963407
.LCPI1_2:
	.quad	0x3f90000000000000
.LCPI1_3:
	.quad	0x3ff4000000000000
.LCPI1_4:
	.quad	0xbfe0000000000000
	.text
	.globl	_start
	.p2align	1
	.type	_start,@function
_start:
	addi	sp, sp, -32
	sd	ra, 24(sp)
	sd	s0, 16(sp)
	sd	s1, 8(sp)
	lui	a0, %hi(.LCPI1_0)
	ld	t1, %lo(.LCPI1_0)(a0)
	lui	a1, %hi(.LCPI1_1)
	ld	a0, %lo(.LCPI1_1)(a1)
	lui	a1, %hi(y)
	addi	a2, a1, %lo(y)
	lui	a1, %hi(x)
	addi	a3, a1, %lo(x)
	lui	a1, %hi(rt_state)
	ld	s1, %lo(rt_state)(a1)
	li	a4, 203
	lui	a5, 335544
	addiw	a5, a5, 1311
	li	t0, 25
	slli	a6, t0, 9
	lui	s0, %hi(.LCPI1_2)
	fld	ft0, %lo(.LCPI1_2)(s0)
	li	a7, -25
	slli	a7, a7, 8
	slli	t0, t0, 8
.LBB1_1:
	mul	a1, s1, t1
	add	s1, a1, a0
	srli	a1, s1, 32
	mul	s0, a1, a5
	srli	s0, s0, 44
	mulw	s0, s0, a6
	add	a1, a1, a7
	subw	a1, a1, s0
	fcvt.d.w	ft1, a1
	fmul.d	ft1, ft1, ft0
	fsd	ft1, 0(a3)
	mul	a1, s1, t1
	add	s1, a1, a0
	srli	a1, s1, 32
	mul	s0, a1, a5
	srli	s0, s0, 43
	mulw	s0, s0, t0
	subw	a1, a1, s0
	addiw	a1, a1, -2048
	addiw	a1, a1, -1152
	fcvt.d.w	ft1, a1
	fmul.d	ft1, ft1, ft0
	fsd	ft1, 0(a2)
	addi	a2, a2, 8
	addi	a4, a4, -1
	addi	a3, a3, 8
	bnez	a4, .LBB1_1
	lui	a0, %hi(rt_state)
	sd	s1, %lo(rt_state)(a0)
	lui	a0, %hi(x)
	addi	s0, a0, %lo(x)
	lui	a0, %hi(.LCPI1_3)
	fld	fa0, %lo(.LCPI1_3)(a0)
	lui	a0, %hi(y)
	addi	s1, a0, %lo(y)
	li	a0, 203
	mv	a1, s0
	mv	a2, s1
	call	daxpy
	lui	a0, %hi(.LCPI1_4)
	fld	fa0, %lo(.LCPI1_4)(a0)
	addi	a1, s1, 24
	li	a0, 196
	mv	a2, s0
	call	daxpy
	li	a2, 1624
	li	a7, 64
	li	a0, 1
	mv	a1, s1
	#APP
	ecall	
	#NO_APP
	li	a2, 1624
	li	a7, 64
	li	a0, 1
	mv	a1, s0
	#APP
	ecall	
	#NO_APP
	li	a7, 93
	li	a0, 0
	#APP
	ecall	
	#NO_APP
.LBB1_3:
	j	.LBB1_3
.Lfunc_end1:
	.size	_start, .Lfunc_end1-_start

	.type	x,@object
	.bss
	.globl	x
	.p2align	3, 0x0
x:
	.zero	1624
	.size	x, 1624

	.type	y,@object
	.globl	y
	.p2align	3, 0x0
y:
	.zero	1624
	.size	y, 1624

	.type	rt_state,@object
	.section	.sdata,"aw",@progbits
	.p2align	3
rt_state:
	.quad	2685821657736338717
	.size	rt_state, 8

	.ident	"Debian clang version 16.0.6 (15~deb12u1)"
	.section	".note.GNU-stack","",@progbits
	.addrsig
	.addrsig_sym x
	.addrsig_sym y
