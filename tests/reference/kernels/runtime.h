/*
 * Chimeline's kernel runtime: the few lines a freestanding RISC-V program needs
 * to report its results. Results leave through the Linux write system call
 * (a7 = 64, fd 1) and the program ends with exit (a7 = 93), the RISC-V Linux
 * syscall numbers QEMU user mode implements. Inputs come from a small linear
 * congruential generator (Knuth's MMIX constants, from memory) so that the
 * compiler cannot fold the kernels away.
 */
#ifndef CHIMELINE_RUNTIME_H
#define CHIMELINE_RUNTIME_H

typedef unsigned long size_t;

static inline void rt_write(const void *buf, size_t len) {
  register long a0 __asm__("a0") = 1;
  register long a1 __asm__("a1") = (long)buf;
  register long a2 __asm__("a2") = (long)len;
  register long a7 __asm__("a7") = 64;
  __asm__ volatile("ecall" : "+r"(a0) : "r"(a1), "r"(a2), "r"(a7) : "memory");
}

__attribute__((noreturn)) static inline void rt_exit(int code) {
  register long a0 __asm__("a0") = code;
  register long a7 __asm__("a7") = 93;
  __asm__ volatile("ecall" : : "r"(a0), "r"(a7) : "memory");
  for (;;) {
  }
}

static unsigned long rt_state = 0x2545f4914f6cdd1dUL;

/** The next 32 pseudo-random bits. */
static inline unsigned rt_next(void) {
  rt_state = rt_state * 6364136223846793005UL + 1442695040888963407UL;
  return (unsigned)(rt_state >> 32);
}

/** A value in [-range, range) with 1/64 steps: exact in binary32 and binary64. */
static inline double rt_real(int range) {
  return (double)((int)(rt_next() % (unsigned)(128 * range)) - 64 * range) / 64.0;
}

#endif
