/* Strided accesses: column sums of a row-major int32 matrix and a binary64 copy with stride 3. */
#include "runtime.h"
#define R 29
#define C 67
int A[R * C];
long colsum[C];
double src[3 * 300], dst[300];

__attribute__((noinline)) void colsums(int rows, int cols, const int *a, long *o) {
  for (int c = 0; c < cols; c++) {
    long s = 0;
    for (int r = 0; r < rows; r++) s += a[r * cols + c];
    o[c] = s;
  }
}
__attribute__((noinline)) void stride3(int n, const double *a, double *o) { for (int i = 0; i < n; i++) o[i] = a[3 * i + 1] * 2.0; }

void _start(void) {
  for (int i = 0; i < R * C; i++) A[i] = (int)rt_next();
  for (int i = 0; i < 900; i++) src[i] = rt_real(20);
  colsums(R, C, A, colsum);
  stride3(300, src, dst);
  rt_write(colsum, sizeof colsum);
  rt_write(dst, sizeof dst);
  rt_exit(0);
}
