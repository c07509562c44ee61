/* A fixed-point Q15 filter: 8-tap FIR with rounding and saturation to int16, and a saturating int16 add. */
#include "runtime.h"
#define N 480
#define T 8
short in[N + T], out[N], s1[N], s2[N], sat[N];
static const short taps[T] = {1024, -2048, 4096, 12000, 12000, 4096, -2048, 1024};

__attribute__((noinline)) void fir(int n, const short *x, const short *h, short *y) {
  for (int i = 0; i < n; i++) {
    int acc = 1 << 14;
    for (int t = 0; t < T; t++) acc += x[i + t] * h[t];
    acc >>= 15;
    y[i] = (short)(acc > 32767 ? 32767 : acc < -32768 ? -32768 : acc);
  }
}

__attribute__((noinline)) void addsat(int n, const short *a, const short *b, short *y) {
  for (int i = 0; i < n; i++) {
    int s = a[i] + b[i];
    y[i] = (short)(s > 32767 ? 32767 : s < -32768 ? -32768 : s);
  }
}

void _start(void) {
  for (int i = 0; i < N + T; i++) in[i] = (short)rt_next();
  for (int i = 0; i < N; i++) {
    s1[i] = (short)rt_next();
    s2[i] = (short)rt_next();
  }
  fir(N, in, taps, out);
  addsat(N, s1, s2, sat);
  rt_write(out, sizeof out);
  rt_write(sat, sizeof sat);
  rt_exit(0);
}
