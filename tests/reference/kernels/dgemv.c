/* BLAS-2 dgemv: y = A x + y for a row-major M x K matrix, and its transpose y2 = A^T x2 (a column walk). */
#include "runtime.h"
#define M 37
#define K 53
double A[M * K], x[K], y[M], x2[M], y2[K];

__attribute__((noinline)) void dgemv(int m, int k, const double *a, const double *xs, double *ys) {
  for (int i = 0; i < m; i++) {
    double s = ys[i];
    for (int j = 0; j < k; j++) s += a[i * k + j] * xs[j];
    ys[i] = s;
  }
}

__attribute__((noinline)) void dgemvt(int m, int k, const double *a, const double *xs, double *ys) {
  for (int i = 0; i < m; i++)
    for (int j = 0; j < k; j++) ys[j] += a[i * k + j] * xs[i];
}

void _start(void) {
  for (int i = 0; i < M * K; i++) A[i] = rt_real(4);
  for (int j = 0; j < K; j++) x[j] = rt_real(2);
  for (int i = 0; i < M; i++) {
    y[i] = rt_real(1);
    x2[i] = rt_real(2);
  }
  dgemv(M, K, A, x, y);
  dgemvt(M, K, A, x2, y2);
  rt_write(y, sizeof y);
  rt_write(y2, sizeof y2);
  rt_exit(0);
}
