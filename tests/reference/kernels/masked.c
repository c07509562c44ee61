/* Conditional loops that compile to masks: a clamp-and-scale, a conditional store and a count. */
#include "runtime.h"
#define N 613
float x[N], y[N];
int k[N], m[N];
int cnt[2];

__attribute__((noinline)) void relu(int n, const float *in, float *o) {
  for (int i = 0; i < n; i++) o[i] = in[i] > 0.0f ? in[i] * 2.0f : in[i] * 0.125f;
}
__attribute__((noinline)) void condset(int n, const int *in, int *o) {
  for (int i = 0; i < n; i++)
    if (in[i] & 4) o[i] = in[i] - 100;
}
__attribute__((noinline)) int countpos(int n, const int *in) {
  int c = 0;
  for (int i = 0; i < n; i++) c += in[i] > 1000;
  return c;
}

void _start(void) {
  for (int i = 0; i < N; i++) {
    x[i] = (float)rt_real(10);
    k[i] = (int)(rt_next() % 5000) - 2000;
    m[i] = 7;
  }
  relu(N, x, y);
  condset(N, k, m);
  cnt[0] = countpos(N, k);
  cnt[1] = countpos(N - 11, k + 11);
  rt_write(y, sizeof y);
  rt_write(m, sizeof m);
  rt_write(cnt, sizeof cnt);
  rt_exit(0);
}
