/* Scalar code a compiler emits around loops: integer division and remainder in 32 and 64 bits, shifts, float division, min/max, and a recurrence that cannot vectorise. */
#include "runtime.h"
#define N 64
long r64[N];
int r32[N];
double rd[N];
float rf[N];

__attribute__((noinline)) void scalars(int n, long *a, int *b, double *c, float *f) {
  long acc = 12345;
  double x = 1.0;
  for (int i = 0; i < n; i++) {
    acc = acc * 31 + (acc >> 7) - (long)i * 1000003L;
    a[i] = acc / (i + 3) + acc % 977;
    b[i] = (int)acc / (i - 17 ? i - 17 : 1) + (int)((unsigned)acc % 1013u) + ((int)acc << (i & 15));
    x = x * 1.0625 + (double)(i + 1) / 7.0;
    c[i] = x / 3.0 - (double)b[i] * 1e-6;
    f[i] = __builtin_fminf((float)x, 40.0f) + __builtin_fmaxf((float)c[i], -2.5f);
  }
}

void _start(void) {
  scalars(N, r64, r32, rd, rf);
  rt_write(r64, sizeof r64);
  rt_write(r32, sizeof r32);
  rt_write(rd, sizeof rd);
  rt_write(rf, sizeof rf);
  rt_exit(0);
}
