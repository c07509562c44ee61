/*
 * Conversions: int16 to binary32, binary64 to binary32, and a binary32 dot
 * accumulated in binary64. No float-to-int cast: C's truncating cast compiles
 * to vfcvt.rtz.x.f.v, which Debian's QEMU 7.2 aborts on ("decode_save_opc:
 * Assertion `ctx->insn_start != NULL' failed"), so it has no reference run here.
 */
#include "runtime.h"
#define N 355
short s[N];
float f[N], g[N], n32[N];
double d[N];
double acc[1];

__attribute__((noinline)) void i2f(int n, const short *a, float *o) { for (int i = 0; i < n; i++) o[i] = (float)a[i] * 0.5f; }
__attribute__((noinline)) void d2f(int n, const double *a, float *o) { for (int i = 0; i < n; i++) o[i] = (float)a[i]; }
__attribute__((noinline)) double wdot(int n, const float *a, const float *b) {
  double sum = 0;
  for (int i = 0; i < n; i++) sum += (double)a[i] * (double)b[i];
  return sum;
}

void _start(void) {
  for (int i = 0; i < N; i++) {
    s[i] = (short)rt_next();
    g[i] = (float)rt_real(100) + 0.3f;
    d[i] = rt_real(1000) / 3.0;
  }
  i2f(N, s, f);
  d2f(N, d, n32);
  acc[0] = wdot(N, f, g);
  rt_write(f, sizeof f);
  rt_write(n32, sizeof n32);
  rt_write(acc, sizeof acc);
  rt_exit(0);
}
