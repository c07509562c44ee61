/* Mixed-width integer loops: uint8 pixels scaled in 16 bits and narrowed back, int16 widened to int64, int32 to int8 truncation, unsigned widening multiply. */
#include "runtime.h"
#define N 777
unsigned char px[N], outp[N];
short s16[N];
long l64[N];
int i32[N];
signed char n8[N];
unsigned short us[N];
unsigned um[N];

__attribute__((noinline)) void scale(int n, const unsigned char *in, unsigned char *o, unsigned short k) {
  for (int i = 0; i < n; i++) o[i] = (unsigned char)((in[i] * k) >> 8);
}
__attribute__((noinline)) void widen(int n, const short *in, long *o) { for (int i = 0; i < n; i++) o[i] = (long)in[i] * 3 - 7; }
__attribute__((noinline)) void narrow(int n, const int *in, signed char *o) { for (int i = 0; i < n; i++) o[i] = (signed char)(in[i] >> 3); }
__attribute__((noinline)) void wmulu(int n, const unsigned short *a, const unsigned char *b, unsigned *o) { for (int i = 0; i < n; i++) o[i] = (unsigned)a[i] * b[i]; }

void _start(void) {
  for (int i = 0; i < N; i++) {
    px[i] = (unsigned char)rt_next();
    s16[i] = (short)rt_next();
    i32[i] = (int)rt_next();
    us[i] = (unsigned short)rt_next();
  }
  scale(N, px, outp, 181);
  widen(N, s16, l64);
  narrow(N, i32, n8);
  wmulu(N, us, px, um);
  rt_write(outp, sizeof outp);
  rt_write(l64, sizeof l64);
  rt_write(n8, sizeof n8);
  rt_write(um, sizeof um);
  rt_exit(0);
}
