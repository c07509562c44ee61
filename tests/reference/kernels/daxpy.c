/* BLAS-1 daxpy: y = a x + y in binary64 (FMA contraction as the compiler chooses). */
#include "runtime.h"
#define N 203
double x[N], y[N];

__attribute__((noinline)) void daxpy(long n, double a, const double *xs, double *ys) {
  for (long i = 0; i < n; i++) ys[i] += a * xs[i];
}

void _start(void) {
  for (int i = 0; i < N; i++) {
    x[i] = rt_real(100);
    y[i] = rt_real(50);
  }
  daxpy(N, 1.25, x, y);
  daxpy(N - 7, -0.5, y + 3, x);
  rt_write(y, sizeof y);
  rt_write(x, sizeof x);
  rt_exit(0);
}
