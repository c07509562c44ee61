/* Reductions in every width: int8 to int32 and int64 sums, int16 and int32 maxima, an unsigned minimum, an int64 xor, a binary64 sum. */
#include "runtime.h"
#define N 999
signed char b8[N];
short h16[N];
int w32[N];
unsigned u32[N];
long d64[N];
double f64[N];
long out[8];

__attribute__((noinline)) int sum8(int n, const signed char *x) { int s = 0; for (int i = 0; i < n; i++) s += x[i]; return s; }
__attribute__((noinline)) long sum8l(int n, const signed char *x) { long s = 0; for (int i = 0; i < n; i++) s += x[i]; return s; }
__attribute__((noinline)) short max16(int n, const short *x) { short m = -32768; for (int i = 0; i < n; i++) m = x[i] > m ? x[i] : m; return m; }
__attribute__((noinline)) int max32(int n, const int *x) { int m = x[0]; for (int i = 1; i < n; i++) m = x[i] > m ? x[i] : m; return m; }
__attribute__((noinline)) unsigned minu(int n, const unsigned *x) { unsigned m = ~0u; for (int i = 0; i < n; i++) m = x[i] < m ? x[i] : m; return m; }
__attribute__((noinline)) long xor64(int n, const long *x) { long s = 0; for (int i = 0; i < n; i++) s ^= x[i]; return s; }
__attribute__((noinline)) double sumd(int n, const double *x) { double s = 0; for (int i = 0; i < n; i++) s += x[i]; return s; }

void _start(void) {
  for (int i = 0; i < N; i++) {
    b8[i] = (signed char)rt_next();
    h16[i] = (short)rt_next();
    w32[i] = (int)rt_next();
    u32[i] = rt_next() | 0x1000u;
    d64[i] = (long)rt_next() << 21 ^ (long)rt_next();
    f64[i] = rt_real(1000);
  }
  out[0] = sum8(N, b8);
  out[1] = sum8l(N - 3, b8 + 1);
  out[2] = max16(N, h16);
  out[3] = max32(N - 1, w32);
  out[4] = minu(N, u32);
  out[5] = xor64(N, d64);
  double s = sumd(N, f64);
  __builtin_memcpy(&out[6], &s, 8);
  out[7] = sum8(5, b8 + 7);
  rt_write(out, sizeof out);
  rt_exit(0);
}
