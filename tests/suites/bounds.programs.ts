/** Kernels whose bound is known by construction, for tests/suites/figures.test.ts. */

/** Eight independent accumulating FMAs on register data, 16 times over: only the FPUs work. */
export const COMPUTE = `  li a0, 128
  vsetvli t0, a0, e64, m1, ta, ma
  vid.v v1
  vfcvt.f.xu.v v1, v1
  vfadd.vv v2, v1, v1
  li t1, 16
loop:
${[8, 9, 10, 11, 12, 13, 14, 15].map((r) => `  vfmacc.vv v${r}, v1, v2`).join('\n')}
  addi t1, t1, -1
  bnez t1, loop
`

/** Sixteen loads of 1 KiB into distinct registers that nothing reads: only the load bus works. */
export const LOADS = `  .data
  .balign 8
buf: .zero 1024
  .text
  la a1, buf
  li a0, 128
  vsetvli t0, a0, e64, m1, ta, ma
${Array.from({ length: 16 }, (_, i) => `  vle64.v v${i + 8}, (a1)`).join('\n')}
`

/** A chain of 64 dependent vfadd.vv at one element a lane: each waits for the one before. */
export const CHAIN = `  li a0, 8
  vsetvli t0, a0, e64, m1, ta, ma
  vid.v v1
  vfcvt.f.xu.v v1, v1
${Array.from({ length: 64 }, () => '  vfadd.vv v1, v1, v1').join('\n')}
`

/** Eight independent ordered sums of 256 elements: each walks its elements from lane to lane on the ring. */
export const ORDERED = `  li a0, 256
  vsetvli t0, a0, e32, m1, ta, ma
  vid.v v1
  vfcvt.f.xu.v v1, v1
  vmv.v.i v2, 0
${Array.from({ length: 8 }, (_, i) => `  vfredosum.vs v${i + 8}, v1, v2`).join('\n')}
`
