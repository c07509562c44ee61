/* Gathers and scatters: y[i] = x[idx[i]] (binary64 and int32) and z[idx[i]] = w[i] with a permutation index. */
#include "runtime.h"
#define N 401
double x[N], y[N];
int xi[N], yi[N], w[N], z[N];
int idx[N];

__attribute__((noinline)) void gatherd(int n, const double *src, const int *ix, double *dst) { for (int i = 0; i < n; i++) dst[i] = src[ix[i]]; }
__attribute__((noinline)) void gatheri(int n, const int *src, const int *ix, int *dst) { for (int i = 0; i < n; i++) dst[i] = src[ix[i]] + 1; }
__attribute__((noinline)) void scatter(int n, const int *src, const int *ix, int *dst) { for (int i = 0; i < n; i++) dst[ix[i]] = src[i]; }

void _start(void) {
  for (int i = 0; i < N; i++) {
    x[i] = rt_real(50);
    xi[i] = (int)rt_next();
    w[i] = (int)rt_next();
    idx[i] = (int)((unsigned)i * 173u % N); /* 173 and 401 are coprime: a permutation */
  }
  gatherd(N, x, idx, y);
  gatheri(N, xi, idx, yi);
  scatter(N, w, idx, z);
  rt_write(y, sizeof y);
  rt_write(yi, sizeof yi);
  rt_write(z, sizeof z);
  rt_exit(0);
}
