/* BLAS-1 dot products: binary32 in source order (an ordered reduction) and int16 widened to int32. */
#include "runtime.h"
#define N 301
float a[N], b[N];
short p[N], q[N];
float fr[2];
int ir[2];

__attribute__((noinline)) float sdot(int n, const float *x, const float *y) {
  float s = 0;
  for (int i = 0; i < n; i++) s += x[i] * y[i];
  return s;
}

__attribute__((noinline)) int idot(int n, const short *x, const short *y) {
  int s = 0;
  for (int i = 0; i < n; i++) s += x[i] * y[i];
  return s;
}

void _start(void) {
  for (int i = 0; i < N; i++) {
    a[i] = (float)rt_real(8);
    b[i] = (float)rt_real(3);
    p[i] = (short)rt_next();
    q[i] = (short)(rt_next() >> 7);
  }
  fr[0] = sdot(N, a, b);
  fr[1] = sdot(N / 3, b, a + 5);
  ir[0] = idot(N, p, q);
  ir[1] = idot(17, q, p);
  rt_write(fr, sizeof fr);
  rt_write(ir, sizeof ir);
  rt_exit(0);
}
