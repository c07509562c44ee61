/* Complex arithmetic on interleaved (re, im) arrays: multiply in binary32 and a binary64 scale-accumulate, which compile to segment loads and stores. */
#include "runtime.h"
#define N 257
float a[2 * N], b[2 * N], c[2 * N];
double p[2 * N], q[2 * N];

__attribute__((noinline)) void cmul(int n, const float *x, const float *y, float *o) {
  for (int i = 0; i < n; i++) {
    float xr = x[2 * i], xim = x[2 * i + 1], yr = y[2 * i], yim = y[2 * i + 1];
    o[2 * i] = xr * yr - xim * yim;
    o[2 * i + 1] = xr * yim + xim * yr;
  }
}

__attribute__((noinline)) void zaxpy(int n, double ar, double ai, const double *x, double *y) {
  for (int i = 0; i < n; i++) {
    double xr = x[2 * i], xim = x[2 * i + 1];
    y[2 * i] += ar * xr - ai * xim;
    y[2 * i + 1] += ar * xim + ai * xr;
  }
}

void _start(void) {
  for (int i = 0; i < 2 * N; i++) {
    a[i] = (float)rt_real(4);
    b[i] = (float)rt_real(4);
    p[i] = rt_real(8);
    q[i] = rt_real(8);
  }
  cmul(N, a, b, c);
  zaxpy(N, 0.75, -1.5, p, q);
  rt_write(c, sizeof c);
  rt_write(q, sizeof q);
  rt_exit(0);
}
